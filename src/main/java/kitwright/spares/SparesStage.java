package kitwright.spares;

import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.cutting.SearchLimits;
import kitwright.model.Kit;
import kitwright.model.SparesPolicy;

/**
 * The cutting stage with the kit's service-life spares: without a {@code spares} policy in kit.json it is
 * {@link KitCutter#cut} as it is; with one, the spares are sized ({@link ServiceLifeSpares}) and cut from offcuts
 * first, bought only for the rest ({@link SparesCutting}). Pure: no files, no console.
 */
public final class SparesStage {
    private SparesStage() {
    }

    /**
     * The cutting plan and, when the kit has a spares policy, how its spares were sized and where they came from.
     *
     * @param sizing null without a spares policy
     * @param supply null without a spares policy
     */
    public record Result(CutPlan plan, SparesPlan sizing, SparesCuttingResult supply) {
        /** The spares' sizing, supply and extra cost without the plan, or null without a spares policy. */
        public SparesOutcome outcome() {
            return sizing == null || supply == null ? null : SparesOutcome.of(sizing, supply);
        }
    }

    /**
     * The spares the kit's policy asks for, as {@link #cut} sizes them (and so as {@code plan} makes them and
     * {@code check} states them), or null when kit.json sets no {@code spares} policy.
     */
    public static SparesPlan sizing(Kit kit) {
        SparesPolicy policy = kit.settings().spares();
        return policy == null ? null : ServiceLifeSpares.plan(kit.bars(), policy);
    }

    /**
     * @param sparesFromOffcuts without a spares policy: fill offcuts with unlimited spares ({@code --spares-from-offcuts});
     *                          with a policy the policy decides how many spares are cut
     * @param limits            work and time limits per section, or null for the defaults
     */
    public static Result cut(Kit kit, boolean sparesFromOffcuts, SearchLimits limits, CutProgress progress) {
        if (kit.settings().spares() == null) {
            return new Result(KitCutter.cut(kit, new KitCutter.Options(sparesFromOffcuts, limits), progress), null,
                    null);
        }
        SparesPlan sizing = sizing(kit);
        SparesCuttingResult supply = SparesCutting.apply(kit, sizing, new KitCuttingSteps(limits, progress));
        return new Result(supply.plan(), sizing, supply);
    }
}
