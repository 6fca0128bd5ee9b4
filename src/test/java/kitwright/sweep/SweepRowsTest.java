package kitwright.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.Status;
import org.junit.jupiter.api.Test;

/** The Pareto front over total cost and largest change, on literal rows (the definition of Pareto dominance). */
class SweepRowsTest {
    private static SweepRow row(int k, double change, Double total, Status status) {
        return new SweepRow(k, "k0" + k, change, 1, 2.0, total, 0.0, 0.0, total, 5, 1, 1, 1, 1.0, status, null,
                false);
    }

    @Test
    void dominatedAndInfeasibleOptionsAreOffTheFront() {
        List<SweepRow> rows = SweepRows.pareto(List.of(
                row(2, 40, 1000.0, Status.OPTIMAL),   // cheapest: front
                row(3, 30, 1200.0, Status.OPTIMAL),   // front
                row(4, 30, 1300.0, Status.FEASIBLE),  // dominated by k3 (same change, dearer)
                row(5, 20, 1200.0, Status.OPTIMAL),   // dominates k3: same cost, smaller change
                row(6, 10, 900.0, Status.INFEASIBLE), // would dominate all, but has no plan
                row(7, 5, null, Status.OPTIMAL),      // total cost unknown: not ranked
                row(8, 20, 1200.0, Status.OPTIMAL))); // equal to k5: both on the front
        assertThat(rows.stream().filter(SweepRow::pareto).map(SweepRow::marks)).containsExactly(2, 5, 8);
    }
}
