package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import kitwright.cutting.CutPattern;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.SparesPolicy;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import net.jqwik.api.ForAll;
import net.jqwik.api.Label;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;

class SparesCuttingProperties {
    private static final String CHS = "CHS 48.3x3.2";

    @Property(tries = 60, seed = "7")
    @Label("With unlimited stock every spare is cut, and from offcuts + bought adds up to what was cut")
    void everySpareIsCut(@ForAll @Size(min = 1, max = 4) List<@IntRange(min = 300, max = 5900) Integer> lengths,
                         @ForAll @IntRange(min = 1, max = 12) int quantity,
                         @ForAll @IntRange(min = 1, max = 12) int cycles) {
        List<Bar> bars = new ArrayList<>();
        for (int i = 0; i < lengths.size(); i++) {
            bars.add(new Bar("M" + i, CHS, lengths.get(i), quantity + i, quantity + i, null, null, ""));
        }
        TubeCatalog catalog = new TubeCatalog(Path.of("tubes.csv"),
                Map.of(CHS, new Section(CHS, "steel", 48.3, 3.2, null, null, null)),
                List.of(new StockLength(CHS, 6000, 60.0, null, Origin.MILL),
                        new StockLength(CHS, 12000, 110.0, null, Origin.MILL)));
        Kit kit = new Kit(null, KitSettings.defaults("random"), bars, List.of(), List.of(), catalog, Map.of(),
                List.of(), List.of());
        SparesPlan sized = ServiceLifeSpares.plan(bars, new SparesPolicy(0.03, cycles, 0.95));
        SparesCuttingResult r = SparesCutting.apply(kit, sized, new SimpleCutting());

        Map<String, Integer> beyond = SparesCutting.produced(r.plan(), kit);
        for (SectionCutPlan s : r.plan().sections()) {
            for (CutPattern p : s.patterns()) {
                double used = p.cuts().stream().mapToDouble(c -> c.lengthMm() + 2).sum();
                assertThat(used).isLessThanOrEqualTo(p.stockLengthMm() - 10 + 2 + 1e-9);
            }
        }
        for (SparesSupply s : r.marks()) {
            assertThat(s.missing()).isZero();
            assertThat(beyond.get(s.mark())).isGreaterThanOrEqualTo(s.needed());
            assertThat(s.cut()).isEqualTo(beyond.get(s.mark()));
            assertThat(s.needed()).isEqualTo(sized.mark(s.mark()).toMake());
        }
    }
}
