package kitwright.packing;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.CrateType;
import kitwright.natives.SolverLibraries;

/**
 * Lower bounds on the crating of a set of items, from volume and mass alone (src/docs/sources.md: "lower bounds
 * that any packing must meet").
 * <ul>
 *   <li>count by volume: ceil(sum of the bundles' cylinder volumes pi/4 d^2 L and the boxes' volumes / the largest
 *   crate inner volume). The bounding-box figure (d^2 L per bundle) is reported too, for the benchmark
 *   target, but it is no proof: staggered rows put more circles in a cross-section than their squares allow;</li>
 *   <li>count by mass: ceil(total mass / the largest net capacity, max gross - tare);</li>
 *   <li>price: the linear relaxation, over crate types, of "enough inner volume and net capacity", written once
 *   per length class (items longer than a crate's inner length can only go in longer crates):
 *   <pre>
 *   minimise sum_t price_t y_t
 *   subject to, for every crate inner length l_k (ascending, l_0 = 0):
 *       sum_{t: L_t >= l_k} V_t y_t   >= volume of the items longer than l_{k-1}
 *       sum_{t: L_t >= l_k} net_t y_t >= mass of the items longer than l_{k-1}
 *   y_t >= 0
 *   </pre>
 *   solved by GLOP; then the same with whole crates (y_t integer, SCIP through MPSolver, its proven bound), which
 *   is tighter and still a relaxation; and at least (count bound) x (cheapest price).</li>
 * </ul>
 */
final class CrateLowerBounds {
    private static final double EPS = 1e-9;
    /** The LP works in cubic metres to keep its coefficients near 1. */
    private static final double CUBIC_MM_PER_M3 = 1e9;
    /**
     * Deterministic work limit of the whole-crate model: SCIP branch-and-bound nodes (the sample kits need 0 or 1);
     * its proven bound at the limit is the same on every machine. The crating stage's deadline (kit.json
     * timeLimitSeconds) is only a safety net.
     */
    private static final int MAX_NODES = 10_000;

    private CrateLowerBounds() {
    }

    /** With the default time limit (kit.json's default timeLimitSeconds) as the safety net. */
    static CrateBounds compute(List<ItemType> types, List<CrateType> crates, int crateCount, Double totalPrice) {
        return compute(types, crates, crateCount, totalPrice,
                Deadline.in(kitwright.model.KitSettings.DEFAULT_TIME_LIMIT_SECONDS));
    }

    /** The bounds; the whole-crate model gets what is left of the crating stage's deadline. */
    static CrateBounds compute(List<ItemType> types, List<CrateType> crates, int crateCount, Double totalPrice,
                               Deadline deadline) {
        double boxVolume = 0;
        double solidVolume = 0;
        double mass = 0;
        int items = 0;
        for (ItemType t : types) {
            boxVolume += t.demand() * t.boxVolume();
            solidVolume += t.demand() * t.solidVolume();
            mass += t.demand() * t.massKg();
            items += t.demand();
        }
        if (items == 0 || crates.isEmpty()) {
            return new CrateBounds(0, 0, 0, 0, totalPrice == null ? null : 0.0, totalPrice == null ? null : 0.0, 0);
        }
        double largestVolume = crates.stream()
                .mapToDouble(c -> c.innerLengthMm() * c.innerWidthMm() * c.innerHeightMm()).max().orElseThrow();
        double largestNet = crates.stream().mapToDouble(c -> c.maxGrossKg() - c.tareKg()).max().orElseThrow();
        int byBox = ceil(boxVolume / largestVolume);
        int bySolid = ceil(solidVolume / largestVolume);
        int byMass = largestNet > 0 ? ceil(mass / largestNet) : 0;
        int count = Math.max(1, Math.max(bySolid, byMass));
        Double price = null;
        Double relaxation = null;
        double gap;
        if (totalPrice != null) {
            double cheapest = crates.stream().mapToDouble(CrateType::price).min().orElseThrow();
            relaxation = priceRelaxation(types, crates, false, deadline);
            double whole = priceRelaxation(types, crates, true, deadline);
            price = Math.max(count * cheapest, Double.isNaN(whole) ? relaxation : Math.max(relaxation, whole));
            gap = totalPrice <= 0 ? 0 : Math.max(0, (totalPrice - price) / totalPrice);
        } else {
            gap = crateCount <= 0 ? 0 : Math.max(0, (crateCount - count) / (double) crateCount);
        }
        return new CrateBounds(byBox, bySolid, byMass, count, relaxation, price, gap);
    }

    private static int ceil(double x) {
        return (int) Math.ceil(x - EPS);
    }

    /** The model's optimum (its proven bound for whole crates); 0 or NaN when the solver proves nothing. */
    private static double priceRelaxation(List<ItemType> types, List<CrateType> crates, boolean whole,
                                          Deadline deadline) {
        if (whole && deadline.passed()) {
            return Double.NaN; // the clock has stopped the stage: how far SCIP would get depends on the machine
        }
        SolverLibraries.load();
        double[] lengths = crates.stream().mapToDouble(CrateType::innerLengthMm).distinct().sorted().toArray();
        MPSolver solver = MPSolver.createSolver(whole ? "SCIP" : "GLOP");
        if (solver == null) {
            return Double.NaN;
        }
        try {
            MPVariable[] y = new MPVariable[crates.size()];
            MPObjective objective = solver.objective();
            for (int t = 0; t < crates.size(); t++) {
                y[t] = whole ? solver.makeIntVar(0, Double.POSITIVE_INFINITY, "crates_" + t)
                        : solver.makeNumVar(0, Double.POSITIVE_INFINITY, "crates_" + t);
                objective.setCoefficient(y[t], crates.get(t).price());
            }
            objective.setMinimization();
            double previous = 0;
            for (int k = 0; k < lengths.length; k++) {
                double volume = 0;
                double mass = 0;
                for (ItemType it : types) {
                    boolean longer = it.kind() == ItemKind.BUNDLE ? it.lengthMm() > previous + EPS : k == 0;
                    if (longer) {
                        volume += it.demand() * it.solidVolume() / CUBIC_MM_PER_M3;
                        mass += it.demand() * it.massKg();
                    }
                }
                MPConstraint byVolume = solver.makeConstraint(volume, Double.POSITIVE_INFINITY, "volume_" + k);
                MPConstraint byMass = solver.makeConstraint(mass, Double.POSITIVE_INFINITY, "mass_" + k);
                for (int t = 0; t < crates.size(); t++) {
                    CrateType c = crates.get(t);
                    if (c.innerLengthMm() >= lengths[k] - EPS) {
                        byVolume.setCoefficient(y[t], c.innerLengthMm() * c.innerWidthMm() * c.innerHeightMm()
                                / CUBIC_MM_PER_M3);
                        byMass.setCoefficient(y[t], Math.max(0, c.maxGrossKg() - c.tareKg()));
                    }
                }
                previous = lengths[k];
            }
            if (whole) {
                solver.setSolverSpecificParametersAsString("limits/nodes = " + MAX_NODES + "\n");
                solver.setTimeLimit((long) Math.ceil(deadline.remainingSeconds() * 1000));
            }
            MPSolver.ResultStatus status = solver.solve();
            if (whole) {
                if (status != MPSolver.ResultStatus.OPTIMAL) {
                    deadline.passed(); // remembers whether the clock rather than the node limit stopped it
                }
                boolean solved = status == MPSolver.ResultStatus.OPTIMAL || status == MPSolver.ResultStatus.FEASIBLE;
                return solved ? objective.bestBound() : Double.NaN;
            }
            return status == MPSolver.ResultStatus.OPTIMAL ? objective.value() : 0;
        } finally {
            solver.delete();
        }
    }
}
