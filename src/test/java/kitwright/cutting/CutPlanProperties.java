package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.report.cutting.CutListCsv;
import kitwright.validate.CutPlanValidator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/**
 * Random kits through the cutting stage and the shared plan validator (exact decimals), with fractional kerf
 * (0.01-4 mm) and trim (0-12 mm) besides the kits' own whole-millimetre settings. Fixed seeds.
 */
class CutPlanProperties {
    static final KitCutter.Options OPTIONS = new KitCutter.Options(false, TestSections.LIMITS);

    /** The random kit with a kerf and trim in hundredths of a millimetre (0 keeps the kit's own). */
    static Kit fractional(long seed, int kerfHundredths, int trimHundredths) {
        Kit kit = KitFixtures.random(seed);
        if (kerfHundredths == 0) {
            return kit;
        }
        return kit.withSettings(kit.settings().withKerfMm(BigDecimal.valueOf(kerfHundredths, 2).doubleValue())
                .withTrimMm(BigDecimal.valueOf(trimHundredths, 2).doubleValue()));
    }

    @Property(tries = 40, seed = "20261203")
    void everyPlanOfARandomKitPassesTheValidator(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                 @ForAll @IntRange(min = 0, max = 400) int kerfHundredths,
                                                 @ForAll @IntRange(min = 0, max = 1200) int trimHundredths) {
        Kit kit = fractional(seed, kerfHundredths, trimHundredths);
        CutPlan plan = KitCutter.cut(kit, OPTIONS, CutProgress.NONE);
        CutPlanValidator.validate(kit, plan);
        CutPlanValidator.validateCutList(plan, CutListCsv.format(kit, plan));
        assertThat(plan.sections()).noneMatch(s -> s.status() == Status.INFEASIBLE); // mill stock is unlimited
    }

    @Property(tries = 15, seed = "20261203")
    void sparesFromOffcutsKeepEveryPlanValidAndBuyNothingMore(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                              @ForAll @IntRange(min = 0, max = 400) int kerf,
                                                              @ForAll @IntRange(min = 0, max = 1200) int trim) {
        Kit kit = fractional(seed, kerf, trim);
        CutPlan plain = KitCutter.cut(kit, OPTIONS, CutProgress.NONE);
        CutPlanValidator.validate(kit, plain);
        CutPlan filled = KitCutter.cut(kit, new KitCutter.Options(true, TestSections.LIMITS), CutProgress.NONE);
        CutPlanValidator.validate(kit, filled);
        CutPlanValidator.validateCutList(filled, CutListCsv.format(kit, filled));
        for (int s = 0; s < plain.sections().size(); s++) {
            assertThat(filled.sections().get(s).stockPieces()).isEqualTo(plain.sections().get(s).stockPieces());
            assertThat(filled.sections().get(s).value()).isEqualTo(plain.sections().get(s).value());
        }
    }

    /**
     * A random miscut allowance (0-3 pieces per mark, 0-100 % in hundredths, the edges 0 and 100 % included) with
     * spares filled from offcuts: the validator finds every mark cut quantity + allowance times plus its spares,
     * and the saw sheet's kinds in the order cut, allowance, spare.
     */
    @Property(tries = 20, seed = "20261203", edgeCases = net.jqwik.api.EdgeCasesMode.FIRST)
    void aMiscutAllowanceIsCutOnTopOfEveryMark(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                               @ForAll @IntRange(min = 0, max = 3) int pieces,
                                               @ForAll @IntRange(min = 0, max = 10_000) int percentHundredths,
                                               @ForAll boolean sparesFromOffcuts) {
        Kit random = fractional(seed, 0, 0);
        Kit kit = random.withSettings(random.settings().withMiscutAllowance(new kitwright.model.MiscutAllowance(
                pieces, BigDecimal.valueOf(percentHundredths, 2).doubleValue())));
        CutPlan plan = KitCutter.cut(kit, new KitCutter.Options(sparesFromOffcuts, TestSections.LIMITS),
                CutProgress.NONE);
        CutPlanValidator.validate(kit, plan);
        String csv = CutListCsv.format(kit, plan);
        CutPlanValidator.validateCutList(plan, csv);
        CutPlanValidator.validateKinds(kit, plan, csv);
        assertThat(plan.sections()).noneMatch(s -> s.status() == Status.INFEASIBLE);
    }
}
