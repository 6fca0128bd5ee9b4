package kitwright.cli;

import kitwright.compare.OptionPlanner;

/**
 * The planners {@code compare} can use. {@link #pipeline()} is the hook for the whole-chain pipeline
 * ({@code kitwright.plan}): read the kit, run cutting with spares, nesting, crating and loading, and sum the
 * result up with {@code OptionSummary.of(kit name, KitMetricsCalculator.of(kit, cutPlan), logistics, statuses)}.
 */
final class OptionPlanners {
    private OptionPlanners() {
    }

    static OptionPlanner pipeline() {
        return kitDir -> {
            throw new UnsupportedOperationException("the whole-chain pipeline (kitwright.plan) is not wired into "
                    + "compare yet");
        };
    }
}
