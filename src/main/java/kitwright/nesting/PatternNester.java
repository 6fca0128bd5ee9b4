package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.Status;

/**
 * The nesting optimiser: fewest bundles, then the smallest total envelope volume.
 *
 * <ol>
 *   <li>Best-fit decreasing ({@link BestFitDecreasingNester}) gives a first plan.
 *   <li>Small kits: every pattern is enumerated ({@link PatternEnumeration}) and CP-SAT solves the exact pattern
 *       model ({@link PatternIntegerPhase}); OPTIMAL there is a proof.
 *   <li>Otherwise column generation ({@link PatternColumnGeneration}) solves the LP relaxation and proves a lower
 *       bound; diving ({@link PatternDiving}) rounds it into whole patterns and, while a gap to the bound is left,
 *       CP-SAT picks from every column generated ({@link PatternIntegerPhase}).
 *   <li>Each pattern plan is built ({@link PatternRealisation}), brought within the mass limit ({@link MassRepair})
 *       and completed by best-fit decreasing over what is left. The best plan wins (fewer bundles, then less volume;
 *       earlier on a tie).
 * </ol>
 * Status OPTIMAL when the bundles equal the lower bound rounded up (the largest of the counting, mass, LP and exact
 * bounds), FEASIBLE otherwise (with the reason "stopped by the time limit" when the stage's deadline, not a work
 * limit, cut a step short), INFEASIBLE when a single tube is heavier than the bundle mass limit (the plan is
 * complete all the same). Deterministic: fixed orders, one CP-SAT worker, deterministic limits; one wall-clock
 * deadline ({@link NestingOptions#wallSeconds()}) for the whole solve is the safety net.
 */
public final class PatternNester implements NestingAlgorithm {
    private final NestingOptions options;

    public PatternNester(NestingOptions options) {
        this.options = options;
    }

    @Override
    public NestingSolution solve(NestingProblem problem) {
        Deadline deadline = Deadline.in(options.wallSeconds());
        List<TubeType> types = TubeType.of(problem);
        double bound = LowerBounds.counting(problem).bundles();
        NestForest best = new NestForest(problem);
        BestFitDecreasingNester.fill(best);
        int tubes = problem.tubes().size();
        double unit = Math.max(1.0, Math.ceil(PatternPricing.workWithMillimetres(problem, types)
                / options.maxPricingWork()));
        PatternPricing pricing = new PatternPricing(problem, types, unit, options.maxPricingCells());
        if (!pricing.hostTypes().isEmpty()) {
            List<Pattern> all = unit == 1.0 ? PatternEnumeration.all(problem, types, pricing,
                    options.maxExactPatterns(), options.maxExactGuests(),
                    new LayoutSearchWork(options.maxExactNodes(), deadline)) : null;
            List<NestForest> candidates = new ArrayList<>();
            boolean proven = false;
            if (all != null && !deadline.passed()) {
                PatternIntegerPhase.Result exact = PatternIntegerPhase.solve(types, all, null,
                        options.deterministicSeconds(), deadline);
                if (exact != null) {
                    bound = Math.max(bound, tubes - exact.nestedUpperBound());
                    proven = exact.proven();
                    candidates.add(PatternRealisation.realise(problem, types, all, exact.counts()));
                }
            }
            if (!proven && !deadline.passed()) {
                try (PatternColumnGeneration cg = new PatternColumnGeneration(types, pricing)) {
                    cg.generate(PatternColumnGeneration.unitWeights(types.size()), options.maxColumnIterations(),
                            deadline);
                    bound = Math.max(bound, tubes - cg.lagrangianBound());
                    PatternDiving.Dive dive = PatternDiving.dive(cg, types, options.maxColumnIterations(),
                            options.maxDives(), deadline);
                    candidates.add(PatternRealisation.realise(problem, types, dive.patterns(), dive.counts()));
                    if (Math.ceil(bound - 1e-6) < candidates.get(candidates.size() - 1).bundles()
                            && !deadline.passed()) {
                        List<Pattern> columns = new ArrayList<>();
                        int[] everyTube = pricing.supplyOfAll();
                        for (int c = 0; c < cg.size(); c++) {
                            columns.add(cg.realisable(c, everyTube));
                        }
                        PatternIntegerPhase.Result integer = PatternIntegerPhase.solve(types, columns, null,
                                options.deterministicSeconds(), deadline);
                        if (integer != null) {
                            candidates.add(PatternRealisation.realise(problem, types, columns, integer.counts()));
                        }
                    }
                }
            }
            for (NestForest candidate : candidates) {
                MassRepair.repair(candidate);
                BestFitDecreasingNester.fill(candidate);
                if (better(candidate, best)) {
                    best = candidate;
                }
            }
        }
        return finish(problem, best, bound, deadline.struck());
    }

    private static boolean better(NestForest a, NestForest b) {
        if (a.bundles() != b.bundles()) {
            return a.bundles() < b.bundles();
        }
        return a.envelopeVolumeMm3() < b.envelopeVolumeMm3() * (1 - 1e-12);
    }

    private static NestingSolution finish(NestingProblem problem, NestForest forest, double rawBound,
                                          boolean stoppedByClock) {
        double bound = Math.round(rawBound * 1e6) / 1e6; // LP round-off, e.g. 3.0000000000000036
        Double limit = problem.maxBundleMassKg();
        if (limit != null) {
            List<String> heavy = new ArrayList<>();
            for (Tube t : problem.tubes()) {
                if (!problem.massAllowed(t.massKg()) && !heavy.contains(t.mark())) {
                    heavy.add(t.mark());
                }
            }
            if (!heavy.isEmpty()) {
                return new NestingSolution(forest.placements(), Status.INFEASIBLE, bound, "mark(s) "
                        + String.join(", ", heavy) + ": a single bar is heavier than the bundle mass limit of "
                        + limit + " kg");
            }
        }
        Status status = forest.bundles() <= Math.ceil(bound - 1e-6) ? Status.OPTIMAL : Status.FEASIBLE;
        // a step the deadline cut short makes the plan depend on the machine's speed: say so, as cutting does
        String reason = status == Status.FEASIBLE && stoppedByClock ? Deadline.STOPPED_BY_TIME_LIMIT : null;
        return new NestingSolution(forest.placements(), status, bound, reason);
    }
}
