package kitwright.loading;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import kitwright.model.VehicleType;
import kitwright.natives.SolverLibraries;

/**
 * The fleet-cost lower bound of the issue: the linear relaxation over vehicle types of "enough payload, floor area
 * and load volume" (src/docs/sources.md; Bortfeldt &amp; Wäscher 2013 survey such limits), solved by GLOP:
 * <pre>
 *   minimise  sum_v cost_v y_v
 *   subject to, for every set F of vehicle types that is the set some crate fits (and F = all types):
 *     sum_{v in F} payload_v          y_v >= mass of the crates that fit only types in F
 *     sum_{v in F} deckLength*Width_v y_v >= footprint of those crates that must stand at the top of a stack
 *     sum_{v in F} deck volume_v      y_v >= outer volume of those crates
 *   y_v >= 0
 * </pre>
 * A crate "must stand at the top" when it is not stackable, or no other crate fits on it by size, top load or
 * height; each such crate tops its own stack, whose base covers at least its footprint. Every load plan gives a
 * feasible y (its vehicle counts), so the LP value bounds the trip cost from below. Areas and volumes in m2, m3.
 * {@link WholeVehicleBound} tightens it.
 */
final class FleetCostBound {
    private static final double EPS = 1e-9;

    private FleetCostBound() {
    }

    /** The LP value; 0 when there is nothing to load or GLOP stops without an optimum. */
    static double compute(List<CrateClass> classes, List<VehicleType> vehicles, double[] cost) {
        SolverLibraries.load();
        boolean[][] fit = new boolean[classes.size()][vehicles.size()];
        Set<List<Integer>> sets = new LinkedHashSet<>();
        List<Integer> all = new ArrayList<>();
        for (int v = 0; v < vehicles.size(); v++) {
            all.add(v);
        }
        sets.add(all);
        for (CrateClass c : classes) {
            List<Integer> set = new ArrayList<>();
            for (int v = 0; v < vehicles.size(); v++) {
                fit[c.index()][v] = DeckFiller.fitsVehicle(c, vehicles.get(v));
                if (fit[c.index()][v]) {
                    set.add(v);
                }
            }
            sets.add(set);
        }
        double maxDeckHeight = vehicles.stream().mapToDouble(VehicleType::loadHeightMm).max().orElse(0);
        MPSolver solver = MPSolver.createSolver("GLOP");
        try {
            MPVariable[] y = new MPVariable[vehicles.size()];
            MPObjective objective = solver.objective();
            for (int v = 0; v < vehicles.size(); v++) {
                y[v] = solver.makeNumVar(0, Double.POSITIVE_INFINITY, "trips_" + v);
                objective.setCoefficient(y[v], cost[v]);
            }
            objective.setMinimization();
            int k = 0;
            for (List<Integer> set : sets) {
                double mass = 0;
                double area = 0;
                double volume = 0;
                for (CrateClass c : classes) {
                    boolean inside = true;
                    for (int v = 0; v < vehicles.size(); v++) {
                        inside &= !fit[c.index()][v] || set.contains(v);
                    }
                    if (inside) {
                        mass += c.demand() * c.massKg();
                        volume += c.demand() * c.volume() / 1e9;
                        if (StackingRules.alwaysTop(c, classes, maxDeckHeight)) {
                            area += c.demand() * c.footprint() / 1e6;
                        }
                    }
                }
                MPConstraint byMass = solver.makeConstraint(mass, Double.POSITIVE_INFINITY, "mass_" + k);
                MPConstraint byArea = solver.makeConstraint(area, Double.POSITIVE_INFINITY, "floor_" + k);
                MPConstraint byVolume = solver.makeConstraint(volume, Double.POSITIVE_INFINITY, "volume_" + k);
                for (int v : set) {
                    VehicleType t = vehicles.get(v);
                    byMass.setCoefficient(y[v], t.payloadKg());
                    byArea.setCoefficient(y[v], t.deckLengthMm() * t.deckWidthMm() / 1e6);
                    byVolume.setCoefficient(y[v], t.deckLengthMm() * t.deckWidthMm() * t.loadHeightMm() / 1e9);
                }
                k++;
            }
            return solver.solve() == MPSolver.ResultStatus.OPTIMAL ? Math.max(0, objective.value()) : 0;
        } finally {
            solver.delete();
        }
    }
}
