package kitwright.cli;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.spares.SparesStage;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;

/**
 * Where {@code kitwright pack} gets its bundles from: the stages before crating. {@link #STAGES} runs them as
 * {@code plan} does: cutting (no spares from offcuts), then nesting of every cut piece with the kit's fit rule.
 * Tests may hand {@link PackCommand} another source.
 */
@FunctionalInterface
public interface PackUpstream {

    /**
     * The bundles of a kit, and why some bars are missing from them or break a limit.
     *
     * @param shortfalls one sentence per section that could not be cut or nesting limit that could not be met;
     *                   empty when every bar of the kit is in a bundle within the limits
     */
    record Bundles(NestPlan plan, List<String> shortfalls) {
        public Bundles {
            shortfalls = List.copyOf(shortfalls);
        }
    }

    /** The bundles of a kit. */
    Bundles bundles(Kit kit);

    /** Cutting, then nesting, with the kit's settings and time limit. */
    PackUpstream STAGES = kit -> {
        CutPlan cutting = SparesStage.cut(kit, false, null, CutProgress.NONE).plan();
        NestResult nesting = Nester.run(kit, cutting,
                NestingOptions.DEFAULT.withWallSeconds(kit.settings().timeLimitSeconds()));
        List<String> shortfalls = new ArrayList<>();
        for (SectionCutPlan section : cutting.sections()) {
            if (section.status() == Status.INFEASIBLE) {
                shortfalls.add("section " + section.section() + " could not be cut, its bars are not packed: "
                        + section.reason());
            }
        }
        if (nesting.reason() != null) {
            shortfalls.add("no feasible nesting plan: " + nesting.reason());
        }
        return new Bundles(nesting.plan(), shortfalls);
    };
}
