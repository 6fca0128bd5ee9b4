package kitwright.cli;

import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.model.Kit;
import kitwright.nesting.NestPlan;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;

/**
 * Where {@code kitwright pack} gets its bundles from: the stages before crating. {@link #STAGES} runs them as
 * {@code plan} does: cutting (no spares from offcuts), then nesting of every cut piece with the kit's fit rule.
 * Tests may hand {@link PackCommand} another source.
 */
@FunctionalInterface
public interface PackUpstream {

    /** The bundles of a kit. */
    NestPlan bundles(Kit kit);

    /** Cutting, then nesting, with the kit's settings and time limit. */
    PackUpstream STAGES = kit -> {
        CutPlan cutting = KitCutter.cut(kit, KitCutter.Options.DEFAULT, CutProgress.NONE);
        return Nester.run(kit, cutting, NestingOptions.DEFAULT.withWallSeconds(kit.settings().timeLimitSeconds()))
                .plan();
    };
}
