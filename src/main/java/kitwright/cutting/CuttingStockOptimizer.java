package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Status;

/**
 * Minimum-cost cutting of one section, with a proof of optimality or a stated gap.
 *
 * <p>Problem: choose how many pieces of each stock length to cut (rack offcuts and limited mill stock included)
 * and how to saw each, so that every mark is cut and the total price (or, without prices, the total stock length)
 * is least.
 *
 * <p>Method, each step only while the best plan is not proven optimal:
 * <ol>
 *   <li>first-fit decreasing ({@link FirstFitDecreasing}), the baseline the result is never worse than;</li>
 *   <li>column generation over all stock types ({@link ColumnGeneration}: GLOP master, knapsack pricing) for the
 *       linear-programming lower bound, or a proof that the stock cannot cover the marks;</li>
 *   <li>a dive of residual rounding ({@link DivingHeuristic});</li>
 *   <li>the stock-count bound ({@link StockCountBound}): the cheapest whole stock counts whose relaxation covers
 *       the demand, which raises the bound for several stock lengths;</li>
 *   <li>with one stock length, the complete waste-bounded pattern model ({@link WasteBoundedPatterns}) for a plan
 *       at the rounded-up bound, or a proof that none exists;</li>
 *   <li>a dive with backtracking within those cheapest stock counts;</li>
 *   <li>CP-SAT over all generated patterns ({@link PatternSelection});</li>
 *   <li>for small sections, the complete arc-flow model ({@link ArcFlowModel}).</li>
 * </ol>
 * Every plan found loses its surplus pieces, has its waste gathered into fewer, longer remnants
 * ({@link RemnantConsolidation}) and each stock piece moved to the cheapest stock that holds it
 * ({@link StockReassignment}) before it is compared with the best so far.
 *
 * <p>Guarantee: the status is OPTIMAL only when proven: when no achievable cost lies between the lower bound and
 * the plan's cost ({@link AchievableValues}; for one stock length and price, value = ceil(LP bound)), or when a
 * complete model proves it. When the section's lengths had to be rounded ({@link LengthScale}), the bounds above
 * hold for the rounded sizes only, and the bound claimed is the one of sizes rounded the other way
 * ({@link AchievableValues#trueLengthBound}). The reported lower bound is the best proven one;
 * gap = (value - lowerBound) / value,
 * so OPTIMAL has gap 0. Deterministic for given limits: one CP-SAT worker, deterministic work limits; the
 * wall-clock limit is only a safety net, and when it strikes the best plan so far is returned with its gap.
 *
 * <p>Sources: Gilmore and Gomory (1961, 1963); Valério de Carvalho (1999); Wäscher and Gau (1996); on how seldom the
 * optimum exceeds the rounded-up LP bound, Scheithauer and Terno (1995), "The modified integer round-up property
 * of the one-dimensional cutting stock problem", EJOR 84.
 */
public final class CuttingStockOptimizer implements SectionSolver {
    /**
     * Sections with more bars than this skip the stock-count bound and the backtracking dive: each relaxation costs
     * too much there, and the LP bound is already within a fraction of a percent.
     */
    private static final int BACKTRACKING_PIECES = 5_000;
    /** Most relaxations the stock-count bound solves. */
    private static final int COUNT_TESTS = 150;
    /** Most patterns the waste-bounded model enumerates. */
    private static final int WASTE_BOUNDED_PATTERNS = 30_000;

    /**
     * The plan with what the solve learnt on the way, for tests and benchmarks.
     *
     * @param linearBound   the LP relaxation's bound in the objective unit (NaN when not computed)
     * @param firstFitValue first-fit decreasing's value, or null when it could not place every piece
     */
    public record Outcome(SectionCutPlan plan, double linearBound, Double firstFitValue) {
    }

    @Override
    public SectionCutPlan solve(SectionProblem problem, CutProgress progress) {
        return optimize(problem, progress).plan();
    }

    public Outcome optimize(SectionProblem problem, CutProgress progress) {
        return new Search(problem, progress).run();
    }

    /** The state of one solve: best plan and best bound so far. */
    private static final class Search {
        private final SectionProblem problem;
        private final IntegerInstance instance;
        private final CutProgress progress;
        private final SearchLimits limits;
        private final Deadline deadline;
        private final int[] demand;
        private final int[] available;
        private Packing incumbent;
        private long incumbentCost = Long.MAX_VALUE / 4;
        private double bound;
        private boolean provenByModel;
        private double linearBound = Double.NaN;
        private Double firstFitValue;
        /** Whether the wall-clock deadline cut a step short or left one out. */
        private boolean timedOut;

        Search(SectionProblem problem, CutProgress progress) {
            this.problem = problem;
            this.instance = new IntegerInstance(problem);
            this.progress = progress;
            this.limits = problem.limits();
            this.deadline = Deadline.in(limits.timeLimitSeconds());
            this.demand = instance.demands();
            this.available = instance.limits();
        }

        Outcome run() {
            if (problem.stock().stream().allMatch(s -> s.available() != null && s.available() == 0)) {
                return done(PlanAssembler.infeasible(problem, "no stock for section " + problem.section()
                        + ": the catalog offers no length of it (or none is available)"));
            }
            List<String> tooLong = new ArrayList<>();
            for (int i = 0; i < instance.types(); i++) {
                if (instance.size[i] > instance.maxCapacity) {
                    for (int d : instance.marks[i]) {
                        tooLong.add(problem.demands().get(d).mark());
                    }
                }
            }
            if (!tooLong.isEmpty()) {
                double usable = problem.stock().stream().mapToDouble(StockOption::lengthMm).max().orElse(0)
                        - 2 * problem.trimMm();
                return done(PlanAssembler.infeasible(problem, Shortage.tooLong(instance, tooLong, usable)));
            }
            FirstFitDecreasing.Result ffd = FirstFitDecreasing.pack(instance, demand, available);
            if (ffd.complete()) {
                firstFitValue = PlanAssembler.value(problem, ffd.packing());
                offer(ffd.packing());
            }
            bound = AchievableValues.materialBound(instance, demand);
            report("first-fit decreasing");
            if (proven()) {
                return finish(ffd);
            }
            try (ColumnGeneration generation = new ColumnGeneration(instance, limits.columnIterations(), deadline)) {
                seed(generation);
                ColumnGeneration.Relaxation root = generation.solve(demand, available);
                if (root.kind() == ColumnGeneration.Kind.INFEASIBLE) {
                    int[] missing = new int[instance.types()];
                    for (int i = 0; i < missing.length; i++) {
                        missing[i] = (int) Math.ceil(root.shortage()[i] - 1e-6);
                    }
                    return done(PlanAssembler.infeasible(problem,
                            Shortage.reason(instance, missing, "not enough stock for")));
                }
                if (root.kind() == ColumnGeneration.Kind.OPTIMAL || root.kind() == ColumnGeneration.Kind.STOPPED) {
                    bound = Math.max(bound, safe(root.bound()));
                }
                if (root.kind() == ColumnGeneration.Kind.OPTIMAL) {
                    linearBound = root.value() / instance.scale;
                }
                report("lower bound");
                if (!proven() && !deadline.passed()) {
                    // one dive for any better plan
                    new DivingHeuristic(instance, generation, limits, deadline, incumbentCost - 1, 1,
                            instance.totalPieces(demand) > BACKTRACKING_PIECES, this::offer)
                            .run(root, limits.divingNodes());
                    report("integer");
                }
                int[] counts = null;
                if (!proven() && !deadline.passed() && incumbent != null
                        && instance.totalPieces(demand) <= BACKTRACKING_PIECES) {
                    StockCountBound.Result whole = StockCountBound.raise(instance, generation, lowerCost(),
                            incumbentCost, COUNT_TESTS, limits.stockCountSteps(), deadline);
                    bound = Math.max(bound, whole.bound());
                    counts = whole.counts();
                    timedOut |= whole.timedOut();
                    report("lower bound");
                }
                if (!proven() && !deadline.passed()) {
                    decideWithOneStockLength();
                }
                if (!proven() && !deadline.passed() && counts != null
                        && instance.totalPieces(demand) <= BACKTRACKING_PIECES) {
                    // a plan within the cheapest stock counts that can cover the demand would be optimal:
                    // search for one with backtracking
                    long goal = 0;
                    for (int k = 0; k < counts.length; k++) {
                        goal += instance.cost[k] * counts[k];
                    }
                    new DivingHeuristic(instance, generation, limits, deadline, goal, 3, false, this::offer)
                            .run(generation.solve(demand, counts), counts, limits.divingNodes());
                    report("integer");
                }
                if (!proven() && !deadline.passed()) {
                    offer(PatternSelection.solve(instance, generation.columns(), demand, available, incumbent,
                            lowerCost(), incumbentCost, limits.integerDeterministicTime(), deadline));
                    report("integer");
                }
                if (!proven() && !deadline.passed()) {
                    ArcFlowModel.Outcome exact = ArcFlowModel.solve(instance, demand, available, incumbent,
                            lowerCost(), incumbentCost, limits.exactDeterministicTime(), limits.exactMaxArcs(),
                            deadline);
                    if (exact != null) {
                        offer(exact.packing());
                        bound = Math.max(bound, exact.infeasible() ? incumbentCost : exact.bound());
                        provenByModel = exact.optimal() || (exact.infeasible() && incumbent == null);
                        report("exact");
                    }
                }
            }
            return finish(ffd);
        }

        private Outcome finish(FirstFitDecreasing.Result ffd) {
            if (incumbent == null) {
                String lead = provenByModel ? "not enough stock (proven by the exact model) for"
                        : "no plan found within the work and time limits (not proven impossible); "
                        + "first-fit decreasing found no stock for";
                return done(PlanAssembler.infeasible(problem, Shortage.reason(instance, ffd.unplaced(), lead)));
            }
            Packing plan = RemnantConsolidation.consolidate(instance, incumbent);
            long cost = plan.cost(instance);
            long lower = provenByModel ? cost : AchievableValues.nextAchievable(instance, bound, cost);
            lower = Math.min(lower, AchievableValues.trueLengthBound(instance, lower, cost));
            Status status = cost <= lower ? Status.OPTIMAL : Status.FEASIBLE;
            SectionCutPlan assembled = PlanAssembler.plan(instance, plan, status, Math.min(lower, cost));
            // a step the deadline cut short makes the plan depend on the machine's speed: say so
            boolean stoppedByClock = status == Status.FEASIBLE && (timedOut || deadline.passed());
            return done(stoppedByClock ? assembled.withReason(SectionCutPlan.STOPPED_BY_TIME_LIMIT) : assembled);
        }

        private Outcome done(SectionCutPlan plan) {
            return new Outcome(plan, linearBound, firstFitValue);
        }

        /** Every item type alone on every stock type it fits: a start that makes most masters feasible. */
        private void seed(ColumnGeneration generation) {
            if (incumbent != null) {
                for (Pattern p : incumbent.pieces()) {
                    generation.add(p);
                }
            }
            for (int k = 0; k < instance.stocks(); k++) {
                for (int i = 0; i < instance.types(); i++) {
                    int copies = Math.min(demand[i], instance.capacity[k] / instance.size[i]);
                    if (copies > 0 && available[k] != 0) {
                        int[] counts = new int[instance.types()];
                        counts[i] = copies;
                        generation.add(new Pattern(k, counts));
                    }
                }
            }
        }

        /** Takes a plan when it covers the demand and costs less than the best so far. */
        private void offer(Packing candidate) {
            if (candidate == null || !candidate.covers(instance, demand, available)) {
                return;
            }
            Packing exact = StockReassignment.cheapest(instance, RemnantConsolidation.consolidate(instance,
                    candidate.withoutSurplus(instance, demand)), available);
            long cost = exact.cost(instance);
            if (cost < incumbentCost) {
                incumbent = exact;
                incumbentCost = cost;
            }
        }

        /**
         * With one usable stock type, asks the waste-bounded model for a plan of ceil(bound / cost) pieces: found,
         * it is optimal; impossible, the bound rises by one piece.
         */
        private void decideWithOneStockLength() {
            int stock = -1;
            for (int k = 0; k < instance.stocks(); k++) {
                if (available[k] != 0) {
                    if (stock >= 0) {
                        return;
                    }
                    stock = k;
                }
            }
            if (stock < 0 || instance.cost[stock] == 0) {
                return;
            }
            long cost = instance.cost[stock];
            long pieces = AchievableValues.nextAchievable(instance, bound, incumbentCost) / cost;
            if (pieces * cost >= incumbentCost || (available[stock] > 0 && pieces > available[stock])) {
                return;
            }
            WasteBoundedPatterns.Outcome outcome = WasteBoundedPatterns.solve(instance, stock, demand, pieces,
                    WASTE_BOUNDED_PATTERNS, limits.exactDeterministicTime(), deadline);
            if (outcome == null) {
                return;
            }
            offer(outcome.found());
            if (outcome.infeasible()) {
                bound = Math.max(bound, (pieces + 1) * cost);
            }
            report("exact");
        }

        private boolean proven() {
            return incumbent != null && (provenByModel
                    || incumbentCost <= AchievableValues.nextAchievable(instance, bound, incumbentCost));
        }

        private long lowerCost() {
            return (long) Math.max(0, Math.ceil(bound - 1e-9 * Math.max(1, bound)));
        }

        /** A bound lowered by the floating-point error of its own sum. */
        private static double safe(double value) {
            return value - 1e-9 * Math.max(1, Math.abs(value));
        }

        private void report(String stage) {
            Double best = incumbent == null ? null : instance.value(incumbentCost);
            progress.report(stage, problem.section(), bound / instance.scale, best);
        }
    }
}
