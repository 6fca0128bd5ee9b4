package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.SparesPolicy;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import org.junit.jupiter.api.Test;

class SparesCuttingTest {
    private static final String CHS = "CHS 48.3x3.2";

    /** A 2900 (4 bars) and B 900 (5 bars) on 6 m stock at 60 each; kerf 2, trim 5 (invented). */
    private static Kit kit(Integer available) {
        TubeCatalog catalog = new TubeCatalog(Path.of("tubes.csv"),
                Map.of(CHS, new Section(CHS, "steel", 48.3, 3.2, null, null, null)),
                List.of(new StockLength(CHS, 6000, 60.0, available, Origin.MILL)));
        return new Kit(null, KitSettings.defaults("spares"),
                List.of(new Bar("A", CHS, 2900, 4, 4, null, null, ""), new Bar("B", CHS, 900, 5, 5, null, null, "")),
                List.of(), List.of(), catalog, Map.of(), List.of(), List.of());
    }

    /** A spares plan asking for the given spares per mark (built directly, to fix the demand of the test). */
    private static SparesPlan asking(int a, int b) {
        return new SparesPlan(new SparesPolicy(0.02, 5, 0.9), List.of(
                new MarkSpares("A", 4, 20, 0.02, a, 0.95, 0, 0.95),
                new MarkSpares("B", 5, 25, 0.02, b, 0.95, 0, 0.95)),
                a + b, a + b, 0.9, 0.9);
    }

    /** Validator for this test: every section feasible, every piece fits with kerf and trim, demand + spares cut. */
    private static void validate(Kit kit, CutPlan plan, Map<String, Integer> atLeast) {
        Map<String, Integer> cut = new LinkedHashMap<>();
        for (SectionCutPlan s : plan.sections()) {
            for (CutPattern p : s.patterns()) {
                double used = p.cuts().stream().mapToDouble(c -> c.lengthMm() + 2).sum();
                assertThat(used).isLessThanOrEqualTo(p.stockLengthMm() - 2 * 5 + 2);
                for (Cut c : p.cuts()) {
                    cut.merge(c.mark(), p.count(), Integer::sum);
                }
            }
        }
        for (Bar bar : kit.bars()) {
            assertThat(cut.getOrDefault(bar.mark(), 0)).as("bars of " + bar.mark())
                    .isGreaterThanOrEqualTo(bar.quantity() + atLeast.getOrDefault(bar.mark(), 0));
        }
    }

    @Test
    void aSpareThatFitsAnOffcutCostsNothing() {
        // FFD: [A A] x2 (186 mm offcut each), [B B B B B] with 1482 mm room: one more B fits.
        Kit kit = kit(null);
        SparesCuttingResult r = SparesCutting.apply(kit, asking(0, 1), new SimpleCutting());
        validate(kit, r.plan(), Map.of("B", 1));
        assertThat(r.marks()).extracting(SparesSupply::fromOffcuts).containsExactly(0, 1);
        assertThat(r.bought()).isZero();
        assertThat(r.extraCost()).isZero();
        assertThat(r.rounds()).isZero();
    }

    @Test
    void sparesThatDoNotFitAreAddedToTheDemandAndReplanned() {
        Kit kit = kit(null);
        SparesCuttingResult r = SparesCutting.apply(kit, asking(1, 1), new SimpleCutting());
        validate(kit, r.plan(), Map.of("A", 1, "B", 1));
        SparesSupply a = r.marks().get(0);
        SparesSupply b = r.marks().get(1);
        assertThat(a.bought()).isEqualTo(1);
        assertThat(a.fromOffcuts()).isZero();
        assertThat(b.bought()).isZero();
        assertThat(b.fromOffcuts()).isEqualTo(1);
        assertThat(r.rounds()).isEqualTo(1);
        // 3 pieces of 6 m without spares, 4 with: one more piece at 60.
        assertThat(r.extraCost()).isEqualTo(60.0);
        assertThat(a.expectedLosses()).isEqualTo(0.4);
    }

    @Test
    void limitedStockReportsTheSparesMissing() {
        Kit kit = kit(3);
        SparesCuttingResult r = SparesCutting.apply(kit, asking(1, 1), new SimpleCutting());
        validate(kit, r.plan(), Map.of("B", 1));
        assertThat(r.marks().get(0).missing()).isEqualTo(1);
        assertThat(r.marks().get(1).fromOffcuts()).isEqualTo(1);
        assertThat(r.missing()).isEqualTo(1);
        assertThat(r.extraCost()).isZero();
    }

    @Test
    void noSparesLeavesThePlanAlone() {
        Kit kit = kit(null);
        SimpleCutting cutting = new SimpleCutting();
        SparesCuttingResult r = SparesCutting.apply(kit, asking(0, 0), cutting);
        assertThat(r.plan()).isEqualTo(cutting.plan(kit));
        assertThat(r.fromOffcuts() + r.bought() + r.missing()).isZero();
    }

    @Test
    void sizedSparesFromTheBinomialModelAreAllCut() {
        Kit kit = kit(null);
        SparesPlan sized = ServiceLifeSpares.plan(kit.bars(), new SparesPolicy(0.05, 10, 0.95));
        SparesCuttingResult r = SparesCutting.apply(kit, sized, new SimpleCutting());
        Map<String, Integer> needed = new LinkedHashMap<>();
        sized.marks().forEach(m -> needed.put(m.mark(), m.toMake()));
        validate(kit, r.plan(), needed);
        for (SparesSupply s : r.marks()) {
            assertThat(s.cut()).isGreaterThanOrEqualTo(s.needed());
            assertThat(s.missing()).isZero();
        }
    }

    @Test
    void aReplanForSparesTakesTheAllowanceOnceNotOfTheLargerQuantity() {
        // 50 % of A's 4 bars is 2 allowance pieces, of B's 5 bars 3 (2.5 rounded up); 3 bought spares of A must
        // raise A's demand to 4 + 2 + 3 = 9, not to 7 + 50 % of 7 rounded up = 11
        Kit kit = kit(null);
        Kit withAllowance = kit.withSettings(kit.settings().withMiscutAllowance(
                new kitwright.model.MiscutAllowance(0, 50)));

        Kit more = SparesCutting.withExtraDemand(withAllowance, Map.of("A", 3));

        assertThat(kitwright.cutting.KitCutter.problem(more, CHS, kitwright.cutting.SearchLimits.defaults(1))
                .demands()).extracting(kitwright.cutting.Demand::quantity).containsExactly(9, 8);
        assertThat(more.bars()).extracting(Bar::requiredQuantity).containsExactly(4, 5);
    }
}
