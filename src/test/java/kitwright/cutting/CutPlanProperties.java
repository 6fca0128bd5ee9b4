package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;

import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.LongRange;

/** Random kits through the cutting stage and the shared plan validator. */
class CutPlanProperties {
    static final KitCutter.Options OPTIONS = new KitCutter.Options(false, TestSections.LIMITS);

    @Property(tries = 25)
    void everyPlanOfARandomKitPassesTheValidator(@ForAll @LongRange(min = 1, max = 1_000_000) long seed) {
        Kit kit = KitFixtures.random(seed);
        CutPlan plan = KitCutter.cut(kit, OPTIONS, CutProgress.NONE);
        CutPlanValidator.validate(kit, plan);
        assertThat(plan.sections()).noneMatch(s -> s.status() == Status.INFEASIBLE); // mill stock is unlimited
    }

    @Property(tries = 10)
    void sparesFromOffcutsKeepEveryPlanValidAndBuyNothingMore(@ForAll @LongRange(min = 1, max = 1_000_000) long seed) {
        Kit kit = KitFixtures.random(seed);
        CutPlan plain = KitCutter.cut(kit, OPTIONS, CutProgress.NONE);
        CutPlan filled = KitCutter.cut(kit, new KitCutter.Options(true, TestSections.LIMITS), CutProgress.NONE);
        CutPlanValidator.validate(kit, filled);
        for (int s = 0; s < plain.sections().size(); s++) {
            assertThat(filled.sections().get(s).stockPieces()).isEqualTo(plain.sections().get(s).stockPieces());
            assertThat(filled.sections().get(s).value()).isEqualTo(plain.sections().get(s).value());
        }
    }
}
