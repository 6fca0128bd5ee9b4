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
import kitwright.validate.CutPlanValidator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Label;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;

class SparesCuttingProperties {
    private static final String CHS = "CHS 48.3x3.2";

    /**
     * Lengths to 0.01 mm (some set so that k pieces fill a 6000 mm piece exactly, or miss by 0.01 mm), kerf
     * 0.01-4 mm and trim 0-12 mm in hundredths; every plan passes the shared cut validator first.
     */
    @Property(tries = 300, seed = "7")
    @Label("With unlimited stock every spare is cut, and from offcuts + bought adds up to what was cut")
    void everySpareIsCut(@ForAll @Size(min = 1, max = 4)
                         List<@IntRange(min = 30_000, max = 590_000) Integer> hundredths,
                         @ForAll @IntRange(min = 1, max = 12) int quantity,
                         @ForAll @IntRange(min = 1, max = 12) int cycles,
                         @ForAll @IntRange(min = 1, max = 400) int kerfHundredths,
                         @ForAll @IntRange(min = 0, max = 1200) int trimHundredths,
                         @ForAll @IntRange(min = 0, max = 5) int fill,
                         @ForAll boolean justOver) {
        double kerf = kerfHundredths / 100.0;
        double trim = trimHundredths / 100.0;
        List<Bar> bars = new ArrayList<>();
        for (int i = 0; i < hundredths.size(); i++) {
            double length = hundredths.get(i) / 100.0;
            if (i == 0 && fill >= 2) {
                // fill pieces of (6000 - 2 trim + kerf) / fill - kerf, in whole hundredths: an exact fill when it
                // divides, else just under; 0.01 mm more: just over
                long capacity = 600_000 - 2L * trimHundredths + kerfHundredths;
                length = (capacity / fill - kerfHundredths + (justOver ? 1 : 0)) / 100.0;
            }
            bars.add(new Bar("M" + i, CHS, length, quantity + i, quantity + i, null, null, ""));
        }
        TubeCatalog catalog = new TubeCatalog(Path.of("tubes.csv"),
                Map.of(CHS, new Section(CHS, "steel", 48.3, 3.2, null, null, null)),
                List.of(new StockLength(CHS, 6000, 60.0, null, Origin.MILL),
                        new StockLength(CHS, 12000, 110.0, null, Origin.MILL)));
        Kit kit = new Kit(null, KitSettings.defaults("random").withKerfMm(kerf).withTrimMm(trim), bars, List.of(),
                List.of(), catalog, Map.of(), List.of(), List.of());
        SparesPlan sized = ServiceLifeSpares.plan(bars, new SparesPolicy(0.03, cycles, 0.95));
        SparesCuttingResult r = SparesCutting.apply(kit, sized, new SimpleCutting());
        CutPlanValidator.validate(kit, r.plan());

        Map<String, Integer> beyond = SparesCutting.produced(r.plan(), kit);
        for (SectionCutPlan s : r.plan().sections()) {
            for (CutPattern p : s.patterns()) {
                // the saw model in whole hundredths of a millimetre, exact
                long used = p.cuts().stream().mapToLong(c -> Math.round(c.lengthMm() * 100) + kerfHundredths).sum();
                assertThat(used).isLessThanOrEqualTo(Math.round(p.stockLengthMm() * 100) - 2L * trimHundredths
                        + kerfHundredths);
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
