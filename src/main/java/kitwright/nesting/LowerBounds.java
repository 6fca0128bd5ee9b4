package kitwright.nesting;

/**
 * Simple lower bounds on the number of bundles, valid for every plan.
 *
 * <ul>
 *   <li>Counting: a tube that fits in no other tube (too wide or too long for every bore) is a bundle's host.
 *   <li>Mass: with a bundle mass limit, at least total mass / limit bundles, rounded up (when no single tube is
 *       above the limit: such a plan is infeasible anyway).
 * </ul>
 * The column-generation bound ({@link PatternColumnGeneration}) is usually stronger; the plan reports the largest.
 *
 * @param bundles the bound, a whole number here
 */
record LowerBounds(double bundles) {

    static LowerBounds counting(NestingProblem problem) {
        int lonely = 0;
        double mass = 0;
        boolean eachWithinLimit = true;
        java.util.List<TubeType> types = TubeType.of(problem);
        for (TubeType guest : types) {
            boolean fitsSomewhere = false;
            for (TubeType host : types) {
                if (problem.fits(guest.sample(), host.sample())) {
                    fitsSomewhere = true;
                    break;
                }
            }
            if (!fitsSomewhere) {
                lonely += guest.count();
            }
            mass += guest.sample().massKg() * guest.count();
            eachWithinLimit &= problem.massAllowed(guest.sample().massKg());
        }
        double bound = lonely;
        if (problem.maxBundleMassKg() != null && mass > 0 && eachWithinLimit) {
            bound = Math.max(bound, Math.ceil(mass / problem.maxBundleMassKg() - 1e-9));
        }
        return new LowerBounds(bound);
    }
}
