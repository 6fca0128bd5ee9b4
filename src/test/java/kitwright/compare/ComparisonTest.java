package kitwright.compare;

import static kitwright.compare.CompareFixtures.option;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.metrics.KitMetrics;
import kitwright.model.Status;
import org.junit.jupiter.api.Test;

class ComparisonTest {

    private static Comparison.Row row(Comparison c, CompareMetric m) {
        return c.rows().stream().filter(r -> r.metric() == m).findFirst().orElseThrow();
    }

    @Test
    void onlyTheLowestCostIsBestAndOthersShowTheirDifference() {
        Comparison c = Comparison.of(CompareFixtures.three());
        Comparison.Row cost = row(c, CompareMetric.COST);
        assertThat(cost.best()).isEqualTo(4800.0);
        assertThat(cost.cells()).extracting(Comparison.Cell::isBest).containsExactly(false, true, false);
        assertThat(cost.cells().get(0).difference()).isEqualTo(400.0);
        assertThat(cost.cells().get(0).relativePct()).isCloseTo(100.0 * 400 / 4800, within(1e-12));
        assertThat(cost.cells().get(2).difference()).isCloseTo(300.5, within(1e-9));
        assertThat(cost.cells().get(1).difference()).isZero();
    }

    @Test
    void reuseRatioIsBestWhenHighest() {
        Comparison.Row reuse = row(Comparison.of(CompareFixtures.three()), CompareMetric.REUSE_RATIO);
        assertThat(reuse.best()).isEqualTo(2.5);
        assertThat(reuse.cells()).extracting(Comparison.Cell::isBest).containsExactly(true, false, false);
        assertThat(reuse.cells().get(2).difference()).isCloseTo(-0.7, within(1e-12));
    }

    @Test
    void tiesAreAllBest() {
        Comparison.Row vehicles = row(Comparison.of(CompareFixtures.three()), CompareMetric.VEHICLES);
        assertThat(vehicles.cells()).extracting(Comparison.Cell::isBest).containsExactly(true, true, false);
        assertThat(vehicles.cells().get(2).difference()).isEqualTo(1.0);
        assertThat(vehicles.cells().get(2).relativePct()).isEqualTo(50.0);
    }

    @Test
    void membersAreShownButNotRanked() {
        Comparison.Row members = row(Comparison.of(CompareFixtures.three()), CompareMetric.MEMBERS);
        assertThat(members.best()).isNull();
        assertThat(members.cells()).allSatisfy(cell -> {
            assertThat(cell.value()).isEqualTo(750.0);
            assertThat(cell.isBest()).isFalse();
            assertThat(cell.difference()).isNull();
        });
    }

    @Test
    void unknownValuesAndInfeasibleOptionsAreNotRanked() {
        List<OptionSummary> options = List.of(
                option("a", 6, 2.5, null, 9.5, null, Status.OPTIMAL),
                option("b", 12, 2.1, 4800.0, 4.0, 2, Status.OPTIMAL),
                option("broken", 3, 9.0, 10.0, 0.5, 1, Status.INFEASIBLE));
        Comparison c = Comparison.of(options);
        Comparison.Row cost = row(c, CompareMetric.COST);
        assertThat(cost.best()).isEqualTo(4800.0);
        assertThat(cost.cells().get(0).value()).isNull();
        assertThat(cost.cells().get(0).isBest()).isFalse();
        assertThat(cost.cells().get(2).value()).isEqualTo(10.0);
        assertThat(cost.cells().get(2).isBest()).isFalse();
        assertThat(cost.cells().get(2).difference()).isNull();
        assertThat(row(c, CompareMetric.REUSE_RATIO).best()).isEqualTo(2.5);
        assertThat(row(c, CompareMetric.VEHICLES).best()).isEqualTo(2.0);
    }

    @Test
    void stockLengthIsComparedInMetres() {
        Comparison.Row length = row(Comparison.of(CompareFixtures.three()), CompareMetric.STOCK_LENGTH);
        assertThat(length.cells().get(0).value()).isEqualTo(480.0);
    }

    @Test
    void summaryRoundsForReadingAndTakesTheWorstStatus() {
        KitMetrics metrics = new KitMetrics(6, 300, 750, 2.5, 80, 78, 480123.456, 468000, 5200.004, 5100.006,
                9.87654, 3.33333, 6.54321, 1500.06, 1700.04, 1750.04, 2635.06, List.of());
        OptionSummary s = OptionSummary.of("k", metrics, new Logistics(40, 4, 2, 1800.005, null),
                List.of(Status.OPTIMAL, Status.FEASIBLE, Status.OPTIMAL));
        assertThat(s.stockLengthMm()).isEqualTo(480123.5);
        assertThat(s.cost()).isEqualTo(5200.0);
        assertThat(s.payableCost()).as("money to 0.01").isEqualTo(5100.01);
        assertThat(s.offcutPct()).isEqualTo(9.88);
        assertThat(s.kitMassKg()).isEqualTo(1500.1);
        assertThat(s.tripCost()).isEqualTo(1800.0);
        assertThat(s.status()).isEqualTo(Status.FEASIBLE);
        assertThat(OptionSummary.worst(List.of(Status.FEASIBLE, Status.INFEASIBLE))).isEqualTo(Status.INFEASIBLE);
        assertThat(OptionSummary.worst(List.of())).isEqualTo(Status.OPTIMAL);
        assertThat(s.totalCost()).as("no crate price, no total").isNull();
        OptionSummary priced = OptionSummary.of("k", metrics, new Logistics(40, 4, 2, 1800.005, 420.0),
                List.of(Status.FEASIBLE), List.of(new StageStatus("crates", Status.FEASIBLE, 0.125),
                        new StageStatus("loads", Status.OPTIMAL, 0.0)));
        // 5200.004 + 420 + 1800.005 = 7420.009, to the cent
        assertThat(priced.totalCost()).isEqualTo(7420.01);
        assertThat(priced.crateCost()).isEqualTo(420.0);
        assertThat(priced.statusReason()).isEqualTo("crates 12.5 % above the bound");
        assertThat(OptionSummary.of("k", metrics, Logistics.UNKNOWN, List.of()).vehicles()).isNull();
    }
}
