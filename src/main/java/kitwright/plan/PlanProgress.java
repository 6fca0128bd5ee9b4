package kitwright.plan;

import kitwright.cutting.CutProgress;

/** Progress of the whole chain, for a command line to show on stderr. Stages report as they start and end. */
public interface PlanProgress extends CutProgress {
    /** Ignores every report. */
    PlanProgress NONE = new PlanProgress() {
        @Override
        public void stage(String stage, String detail) {
        }

        @Override
        public void report(String stage, String section, double lowerBound, Double bestValue) {
        }
    };

    /** A stage of the chain starts or ends ("cutting", "nesting", "crating and loading"), with a short detail. */
    void stage(String stage, String detail);
}
