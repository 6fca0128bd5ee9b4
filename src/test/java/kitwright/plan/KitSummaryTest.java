package kitwright.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockLength;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;
import kitwright.plan.KitSummary.SectionTotal;
import kitwright.plan.KitSummary.SpareCount;
import kitwright.plan.KitSummary.StructureMembers;
import org.junit.jupiter.api.Test;

class KitSummaryTest {
    private static final Section CHS_48 = new Section("CHS 48.3x3.2", "steel", 48.3, 3.2, 1.0, null, null);
    private static final Section CHS_33 = new Section("CHS 33.7x2.6", "steel", 33.7, 2.6, 1.0, null, null);
    private static final Material STEEL = new Material("steel", 7850, 1.55, "EN 1993-1-1 §3.2.6");

    /**
     * Three structures built one after another from marks A and B: 200 + 100, 180 + 70 and 120 + 80 members, 750
     * in all. The kit holds the largest count of each mark, 200 A and 100 B, 300 bars: reuse ratio 750 / 300 = 2.5
     * (the worked figure of the domain notes, section 6: 300 bars serving 750 members).
     */
    private static Kit reuseKit(Map<String, Material> materials) {
        List<Bar> bars = List.of(
                new Bar("A", "CHS 48.3x3.2", 1000, 200, 200, null, null, ""),
                new Bar("B", "CHS 48.3x3.2", 2000, 100, 100, null, null, ""));
        List<StructureCount> structures = List.of(
                new StructureCount("pavilion", "A", 200), new StructureCount("pavilion", "B", 100),
                new StructureCount("stage", "A", 180), new StructureCount("stage", "B", 70),
                new StructureCount("tower", "A", 120), new StructureCount("tower", "B", 80));
        return new Kit(null, KitSettings.defaults("reuse"), bars, structures,
                List.of(new Joint("N90", 90, 1.6, 10)), catalog(), materials, List.of(), List.of());
    }

    private static TubeCatalog catalog() {
        Map<String, Section> sections = new LinkedHashMap<>();
        sections.put(CHS_33.name(), CHS_33);
        sections.put(CHS_48.name(), CHS_48);
        return new TubeCatalog(null, sections, List.of(
                new StockLength(CHS_33.name(), 6000, 17.0, null, Origin.MILL),
                new StockLength(CHS_48.name(), 6000, 31.0, null, Origin.MILL)));
    }

    @Test
    void reuseRatioIsMembersInAllStructuresOverBarsInTheKit() {
        KitSummary summary = KitSummary.of(reuseKit(Map.of("steel", STEEL)));

        assertThat(summary.marks()).isEqualTo(2);
        assertThat(summary.bars()).isEqualTo(300);
        assertThat(summary.members()).isEqualTo(750);
        assertThat(summary.reuseRatio()).as("domain notes §6: 750 members / 300 bars").isEqualTo(2.5);
        assertThat(summary.structures()).containsExactly(new StructureMembers("pavilion", 300),
                new StructureMembers("stage", 250), new StructureMembers("tower", 200));
    }

    @Test
    void sectionTotalsAddCutLengthAndMassPerSection() {
        KitSummary summary = KitSummary.of(reuseKit(Map.of("steel", STEEL)));

        // 200 x 1000 mm + 100 x 2000 mm = 400 m of CHS 48.3x3.2; only sections in use are listed
        assertThat(summary.sections()).hasSize(1);
        SectionTotal total = summary.sections().get(0);
        assertThat(total.section()).isEqualTo("CHS 48.3x3.2");
        assertThat(total.bars()).isEqualTo(300);
        assertThat(total.cutLengthMm()).isEqualTo(400_000.0);
        // by hand: pi x (48.3 - 3.2) x 3.2 x 7850e-6 = 3.55915 kg/m, x 400 m = 1423.659 kg
        assertThat(total.massKg()).isCloseTo(1423.659, within(0.001));
        assertThat(summary.barsMassKg()).isCloseTo(1423.659, within(0.001));
        assertThat(summary.jointsMassKg()).isEqualTo(16.0);
        assertThat(summary.kitMassKg()).isCloseTo(1439.659, within(0.001));
        assertThat(summary.joints().count()).isEqualTo(10);
    }

    @Test
    void massesAreUnknownWithoutMaterials() {
        KitSummary summary = KitSummary.of(reuseKit(Map.of()));

        assertThat(summary.barsMassKg()).isNull();
        assertThat(summary.kitMassKg()).isNull();
        assertThat(summary.sections().get(0).massKg()).isNull();
        assertThat(summary.jointsMassKg()).isEqualTo(16.0);
    }

    @Test
    void sparesAreBarsBeyondWhatTheStructuresNeed() {
        Kit kit = new Kit(null, KitSettings.defaults("spares"), List.of(
                new Bar("A", "CHS 48.3x3.2", 1000, 12, 10, null, null, ""),
                new Bar("B", "CHS 33.7x2.6", 800, 5, 5, null, null, "")),
                List.of(new StructureCount("stage", "A", 10), new StructureCount("stage", "B", 5)),
                List.of(), catalog(), Map.of(), List.of(), List.of());

        KitSummary summary = KitSummary.of(kit);

        assertThat(summary.spares()).containsExactly(new SpareCount("A", 2));
        assertThat(summary.markList().get(0).surplus()).isEqualTo(2);
        assertThat(summary.reuseRatio()).isCloseTo(15.0 / 17.0, within(0.0005));
        assertThat(summary.sections()).extracting(SectionTotal::section)
                .as("catalog order").containsExactly("CHS 33.7x2.6", "CHS 48.3x3.2");
    }

    @Test
    void withoutStructuresThereIsNoReuseRatio() {
        Kit kit = new Kit(null, KitSettings.defaults("loose"),
                List.of(new Bar("A", "CHS 48.3x3.2", 1000, 4, 4, null, null, "")),
                List.of(), List.of(), catalog(), Map.of(), List.of(), List.of());

        KitSummary summary = KitSummary.of(kit);

        assertThat(summary.members()).isNull();
        assertThat(summary.reuseRatio()).isNull();
        assertThat(summary.spares()).isEmpty();
        assertThat(summary.joints().types()).isZero();
    }
}
