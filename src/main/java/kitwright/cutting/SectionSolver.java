package kitwright.cutting;

/** Plans the cutting of one section. */
public interface SectionSolver {
    /**
     * @param problem  the section's marks, stock and saw
     * @param progress where to report progress ({@link CutProgress#NONE} for none)
     * @return the plan, with status, value, lower bound and gap; never null
     */
    SectionCutPlan solve(SectionProblem problem, CutProgress progress);
}
