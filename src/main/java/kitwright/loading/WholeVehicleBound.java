package kitwright.loading;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.VehicleType;
import kitwright.natives.SolverLibraries;

/**
 * A tighter fleet-cost bound than {@link FleetCostBound}: whole vehicles, crates assigned to vehicle types
 * fractionally, and what the stacking rules imply for the floor. Solved by SCIP through MPSolver; the solver's
 * proven bound is used, so a stop at the limit still gives a valid bound.
 * <pre>
 *   minimise  sum_v cost_v y_v,   y_v integer >= 0,   x_cv >= 0 (crates of class c on type v; 0 where c does not fit)
 *   sum_v x_cv >= n_c                                            every crate rides
 *   sum_c m_c x_cv <= payload_v y_v,  sum_c vol_c x_cv <= volume_v y_v
 *   sum_{c in T} l_c w_c x_cv <= L_v W_v y_v                      T: classes that always top their stack
 *   sum_{c in G} l_c w_c x_cv <= L_v W_v y_v                      G: classes that always stand on the floor
 *   sum_c f(m_c / payload_v) x_cv <= y_v                           f dual feasible (Fekete &amp; Schepers 2001)
 *   x_cv <= sideBySide_cv y_v                                      c in T or G
 *   sum_{c in S} along_cv x_cv <= floor(W_v / minAcross_S) L_v y_v   S = T or G, fixed orientation on v
 *   sum_q z_vq <= floor(W_v / minAcross_S) y_v,  x_cv <= sum_q a_cq z_vq   lanes of S as patterns q, z_vq >= 0
 * </pre>
 * The crates of T (or of G) never overlap when seen from above, so their footprints share the floor; those that
 * fit only one way stand side by side at most floor(W / narrowest) deep at any point along the deck, so they split
 * into that many lanes, each a set of crates end to end ({@link LanePatterns}).
 */
final class WholeVehicleBound {
    /** Deterministic work limit: SCIP branch-and-bound nodes (the sample kits need 0 or 1). */
    private static final int MAX_NODES = 10_000;
    /** The lambdas of the payload cuts ({@link #massCuts}). */
    private static final double[] LAMBDAS = {0.5, 0.4, 0.3, 0.2, 0.1};

    private WholeVehicleBound() {
    }

    /** The lanes of the fixed-orientation crates of one set on vehicle type v ({@link FloorLanes}). */
    private static void lanePatterns(MPSolver solver, List<CrateClass> classes, boolean[] set, VehicleType t, int v,
                                     double k, MPVariable[][] x, MPVariable y) {
        List<CrateClass> fixed = classes.stream().filter(c -> set[c.index()] && StackingRules.fixedOrientation(c, t)
                && DeckFiller.fitsVehicle(c, t)).toList();
        MPVariable[] onV = fixed.stream().map(c -> x[c.index()][v]).toArray(MPVariable[]::new);
        FloorLanes.add(solver, fixed, onV, t, k, y, "v" + v + "_");
    }

    /**
     * Bin-packing cuts on the payload of vehicle type v: sum_c f(m_c / payload_v) x_cv <= y_v for the dual feasible
     * functions f = f_0^lambda of Fekete &amp; Schepers (2001): 1 above 1 - lambda, the share itself from lambda to
     * 1 - lambda, 0 below lambda. Any vehicle's crates have shares summing to at most 1, so their f values do too;
     * summed over the vehicles of type v this is at most y_v. With lambda = 1/2 it says that no two crates heavier
     * than half the payload share a vehicle (the idea behind Martello &amp; Toth's bound L2).
     */
    // shares are taken of payload + the loader's tolerance, so any load it makes has shares summing to at most 1
    private static void massCuts(MPSolver solver, List<CrateClass> classes, VehicleType t, int v, MPVariable[][] x,
                                 MPVariable y) {
        for (double lambda : LAMBDAS) {
            MPConstraint cut = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "mass_dff_" + v + "_" + lambda);
            cut.setCoefficient(y, -1);
            for (CrateClass c : classes) {
                double share = c.massKg() / (t.payloadKg() + DeckFiller.PAYLOAD_TOLERANCE_KG);
                cut.setCoefficient(x[c.index()][v], dualFeasible(share, lambda));
            }
        }
    }

    /** Fekete &amp; Schepers' f_0^lambda, 0 &lt; lambda &lt;= 1/2. */
    static double dualFeasible(double share, double lambda) {
        if (share > 1 - lambda + 1e-12) {
            return 1;
        }
        return share < lambda - 1e-12 ? 0 : share;
    }

    /** As below, with the default time limit (kit.json's default timeLimitSeconds) as the safety net. */
    static double compute(List<CrateClass> classes, List<VehicleType> vehicles, double[] cost) {
        return compute(classes, vehicles, cost, Deadline.in(kitwright.model.KitSettings.DEFAULT_TIME_LIMIT_SECONDS));
    }

    /**
     * The bound, or NaN when no MIP solver is at hand or it proved nothing. The node limit ends the search the
     * same way on every machine; what is left of the loading stage's deadline is only a safety net.
     */
    static double compute(List<CrateClass> classes, List<VehicleType> vehicles, double[] cost, Deadline deadline) {
        if (deadline.passed()) {
            return Double.NaN; // the clock has stopped the stage: how far SCIP would get depends on the machine
        }
        SolverLibraries.load();
        MPSolver solver = MPSolver.createSolver("SCIP");
        if (solver == null) {
            return Double.NaN;
        }
        try {
            double maxDeckHeight = vehicles.stream().mapToDouble(VehicleType::loadHeightMm).max().orElse(0);
            boolean[] top = new boolean[classes.size()];
            boolean[] floor = new boolean[classes.size()];
            for (CrateClass c : classes) {
                top[c.index()] = StackingRules.alwaysTop(c, classes, maxDeckHeight);
                floor[c.index()] = StackingRules.alwaysFloor(c, classes, maxDeckHeight);
            }
            MPObjective objective = solver.objective();
            MPVariable[] y = new MPVariable[vehicles.size()];
            MPVariable[][] x = new MPVariable[classes.size()][vehicles.size()];
            for (int v = 0; v < vehicles.size(); v++) {
                y[v] = solver.makeIntVar(0, Double.POSITIVE_INFINITY, "trips_" + v);
                objective.setCoefficient(y[v], cost[v]);
                for (CrateClass c : classes) {
                    boolean fits = DeckFiller.fitsVehicle(c, vehicles.get(v));
                    x[c.index()][v] = solver.makeNumVar(0, fits ? c.demand() : 0, "crates_" + c.index() + "_" + v);
                }
            }
            objective.setMinimization();
            for (CrateClass c : classes) {
                MPConstraint rides = solver.makeConstraint(c.demand(), Double.POSITIVE_INFINITY, "rides_" + c.index());
                for (int v = 0; v < vehicles.size(); v++) {
                    rides.setCoefficient(x[c.index()][v], 1);
                }
            }
            for (int v = 0; v < vehicles.size(); v++) {
                VehicleType t = vehicles.get(v);
                double area = t.deckLengthMm() * t.deckWidthMm() / 1e6;
                MPConstraint mass = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "payload_" + v);
                MPConstraint volume = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "volume_" + v);
                mass.setCoefficient(y[v], -t.payloadKg());
                volume.setCoefficient(y[v], -t.deckLengthMm() * t.deckWidthMm() * t.loadHeightMm() / 1e9);
                for (CrateClass c : classes) {
                    mass.setCoefficient(x[c.index()][v], c.massKg());
                    volume.setCoefficient(x[c.index()][v], c.volume() / 1e9);
                    if (top[c.index()] || floor[c.index()]) {
                        // x_cv <= sideBySide_cv y_v
                        MPConstraint cap = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "side_" + c.index());
                        cap.setCoefficient(x[c.index()][v], 1);
                        cap.setCoefficient(y[v], -StackingRules.sideBySide(c, t));
                    }
                }
                massCuts(solver, classes, t, v, x, y[v]);
                for (boolean[] set : new boolean[][] {top, floor}) {
                    MPConstraint floorArea = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "area_" + v);
                    floorArea.setCoefficient(y[v], -area);
                    MPConstraint lanes = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "lanes_" + v);
                    double narrowest = Double.POSITIVE_INFINITY;
                    for (CrateClass c : classes) {
                        if (set[c.index()]) {
                            floorArea.setCoefficient(x[c.index()][v], c.footprint() / 1e6);
                            if (StackingRules.fixedOrientation(c, t)) {
                                boolean turned = StackingRules.turned(c, t);
                                lanes.setCoefficient(x[c.index()][v], c.alongDeck(turned));
                                narrowest = Math.min(narrowest, c.acrossDeck(turned));
                            }
                        }
                    }
                    if (narrowest < Double.POSITIVE_INFINITY) {
                        double k = Math.floor(t.deckWidthMm() / narrowest + 1e-9);
                        lanes.setCoefficient(y[v], -k * t.deckLengthMm());
                        lanePatterns(solver, classes, set, t, v, k, x, y[v]);
                    }
                }
            }
            solver.setSolverSpecificParametersAsString("limits/nodes = " + MAX_NODES + "\n");
            solver.setTimeLimit((long) Math.ceil(deadline.remainingSeconds() * 1000));
            MPSolver.ResultStatus status = solver.solve();
            if (status != MPSolver.ResultStatus.OPTIMAL) {
                deadline.passed(); // remembers whether the clock rather than the node limit stopped it
            }
            if (status != MPSolver.ResultStatus.OPTIMAL && status != MPSolver.ResultStatus.FEASIBLE) {
                return Double.NaN;
            }
            return Math.max(0, objective.bestBound());
        } finally {
            solver.delete();
        }
    }
}
