package kitwright.cli;

import java.nio.file.Path;
import java.util.function.Consumer;
import kitwright.compare.OptionPlanner;
import kitwright.compare.OptionSummaries;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.plan.PlanProgress;
import kitwright.plan.Planner;

/**
 * The planners {@code compare} uses: {@link #pipeline} reads each kit folder and runs the whole chain
 * ({@link Planner#run}) exactly as {@code plan} does with its defaults, then sums the result up
 * ({@link OptionSummaries#of}).
 */
final class OptionPlanners {
    private OptionPlanners() {
    }

    /**
     * @param progress receives one line per stage of each option ("compare: cinema-6: cutting: 5 sections")
     */
    static OptionPlanner pipeline(Consumer<String> progress) {
        return kitDir -> {
            Kit kit = KitReader.read(kitDir);
            return OptionSummaries.of(Planner.run(kit, Planner.Options.DEFAULT.withoutTourLegs(),
                    stages(kitDir, progress)));
        };
    }

    /** Stage lines only: the optimiser's bound reports would interleave unreadably across parallel options. */
    private static PlanProgress stages(Path kitDir, Consumer<String> progress) {
        return new PlanProgress() {
            @Override
            public void stage(String stage, String detail) {
                progress.accept("compare: " + kitDir.getFileName() + ": " + stage + ": " + detail);
            }

            @Override
            public void report(String stage, String section, double lowerBound, Double bestValue) {
            }
        };
    }
}
