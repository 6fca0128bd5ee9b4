package kitwright.cutting;

import static kitwright.cutting.TestSections.demand;
import static kitwright.cutting.TestSections.mill;
import static kitwright.cutting.TestSections.rack;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The small proof devices: achievable costs, stock reassignment, the arc-flow and waste-bounded models. */
class BoundsAndModelsTest {

    @Test
    void achievableCostsSkipValuesNoStockMixReaches() {
        // prices 50 (6 m) and 90 (12 m): from 101 the next reachable cost is 140 = 50 + 90 (100 < 101, 150 > 140)
        SectionProblem problem = TestSections.section(List.of(demand("A", 1000, 1)),
                List.of(mill(6000, 50.0), mill(12000, 90.0)), 0, 0, 500);
        IntegerInstance instance = new IntegerInstance(problem);
        assertThat(AchievableValues.nextAchievable(instance, 101, 1000)).isEqualTo(140);
        assertThat(AchievableValues.nextAchievable(instance, 179.5, 1000)).isEqualTo(180);
        assertThat(AchievableValues.nextAchievable(instance, 181, 200)).isEqualTo(190); // 50 + 50 + 90
    }

    @Test
    void aHalfEmptyLongPieceMovesToTheShorterCheaperLength() {
        SectionProblem problem = TestSections.section(List.of(demand("A", 2000, 2)),
                List.of(mill(6000, 50.0), mill(12000, 90.0), rack(2500, 1.0, 1)), 0, 0, 500);
        IntegerInstance instance = new IntegerInstance(problem);
        Packing twelve = new Packing(List.of(new Pattern(1, new int[] {2})));
        Packing moved = StockReassignment.cheapest(instance, twelve, instance.limits());
        assertThat(moved.pieces()).singleElement().satisfies(p -> assertThat(p.stock()).isZero());
        Packing twoPieces = new Packing(List.of(new Pattern(0, new int[] {1}), new Pattern(0, new int[] {1})));
        assertThat(StockReassignment.cheapest(instance, twoPieces, instance.limits()).used(3))
                .containsExactly(1, 0, 1); // one bar goes to the single rack offcut
    }

    @Test
    void arcFlowProvesTheOptimumAndThatTooFewOffcutsCannotHoldTheBars() {
        SectionProblem problem = TestSections.section(List.of(demand("A", 500, 1), demand("B", 400, 1),
                demand("C", 300, 3), demand("D", 200, 1)), List.of(rack(1000, 5.0, 2)), 0, 0, 100);
        IntegerInstance instance = new IntegerInstance(problem);
        ArcFlowModel.Outcome two = ArcFlowModel.solve(instance, instance.demands(), instance.limits(), null, 0,
                1000, 1.0, 10_000, Deadline.in(30));
        assertThat(two.optimal()).isTrue();
        assertThat(two.packing().cost(instance)).isEqualTo(10); // two offcuts at 5
        int[] one = {1};
        ArcFlowModel.Outcome none = ArcFlowModel.solve(instance, instance.demands(), one, null, 0, 1000, 1.0,
                10_000, Deadline.in(30));
        assertThat(none.infeasible()).isTrue();
    }

    @Test
    void wasteBoundedModelFindsAPerfectPackingOrProvesThereIsNone() {
        // 6+4, 5+5, 7+3 fill three bins of 10 exactly
        SectionProblem problem = TestSections.section(List.of(demand("A", 700, 1), demand("B", 600, 1),
                demand("C", 500, 2), demand("D", 400, 1), demand("E", 300, 1)), List.of(mill(1000, 1.0)), 0, 0, 100);
        IntegerInstance instance = new IntegerInstance(problem);
        WasteBoundedPatterns.Outcome three = WasteBoundedPatterns.solve(instance, 0, instance.demands(), 3, 1000,
                1.0, Deadline.in(30));
        assertThat(three.found()).isNotNull();
        assertThat(three.found().pieces()).hasSize(3);
        assertThat(three.found().covers(instance, instance.demands(), instance.limits())).isTrue();
        WasteBoundedPatterns.Outcome two = WasteBoundedPatterns.solve(instance, 0, instance.demands(), 2, 1000,
                1.0, Deadline.in(30));
        assertThat(two.infeasible()).isTrue(); // 3000 mm of bars do not fit 2000 mm of stock
    }
}
