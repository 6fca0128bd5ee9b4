package kitwright.loading;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.List;
import kitwright.model.VehicleType;

/**
 * The lanes of crates that never overlap seen from above and fit a vehicle type one way only, as constraints of a
 * bound's programme: such crates stand at most k = floor(W / narrowest) side by side at any point along the deck,
 * so on y vehicles they fill at most k y lanes, each a maximal set of crates end to end ({@link LanePatterns}):
 * <pre>
 *   sum_q z_q &lt;= k y,   x_c &lt;= sum_q a_cq z_q,   z_q &gt;= 0
 * </pre>
 * Skipped when there are more than {@value #MAX_PATTERNS} patterns (the bound stays valid, only weaker).
 */
final class FloorLanes {
    static final int MAX_PATTERNS = 2000;

    private FloorLanes() {
    }

    /**
     * @param fixed  the crates, each fitting {@code vehicle} one way only
     * @param x      crates of each of {@code fixed} on vehicles of this type (same order)
     * @param trips  vehicles of this type
     * @param k      the most of them side by side across the deck
     * @param name   a prefix for the constraint names
     */
    static void add(MPSolver solver, List<CrateClass> fixed, MPVariable[] x, VehicleType vehicle, double k,
                    MPVariable trips, String name) {
        if (fixed.isEmpty()) {
            return;
        }
        double[] lengths = fixed.stream().mapToDouble(c -> c.alongDeck(StackingRules.turned(c, vehicle))).toArray();
        List<int[]> patterns = LanePatterns.maximal(lengths, vehicle.deckLengthMm(), MAX_PATTERNS);
        if (patterns == null) {
            return;
        }
        MPConstraint lanes = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, name + "lane_count");
        lanes.setCoefficient(trips, -k);
        MPConstraint[] covers = new MPConstraint[fixed.size()];
        for (int i = 0; i < fixed.size(); i++) {
            covers[i] = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, name + "lane_cover_" + i);
            covers[i].setCoefficient(x[i], 1);
        }
        for (int q = 0; q < patterns.size(); q++) {
            MPVariable z = solver.makeNumVar(0, Double.POSITIVE_INFINITY, name + "lane_" + q);
            lanes.setCoefficient(z, 1);
            for (int i = 0; i < fixed.size(); i++) {
                if (patterns.get(q)[i] > 0) {
                    covers[i].setCoefficient(z, -patterns.get(q)[i]);
                }
            }
        }
    }
}
