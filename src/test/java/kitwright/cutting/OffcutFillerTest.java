package kitwright.cutting;

import static kitwright.cutting.TestSections.demand;
import static kitwright.cutting.TestSections.mill;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

class OffcutFillerTest {

    static final SectionProblem PROBLEM = TestSections.section(List.of(demand("A", 2500, 2), demand("B", 800, 1)),
            List.of(mill(6000, 50.0)), 0, 0, 300);

    @Test
    void cutsSparesIntoTheShortestOffcutThatHoldsThemAndKeepsTheCost() {
        SectionCutPlan plan = new CuttingStockOptimizer().solve(PROBLEM, CutProgress.NONE);
        CutPlanValidator.validate(PROBLEM, plan);
        // one 6000 mm piece: A A B, offcut 200 mm; B fits no more, so no spare of B; nothing else fits
        SectionCutPlan filled = OffcutFiller.fill(plan, List.of(new OffcutFiller.Candidate("A", 2500, 5),
                new OffcutFiller.Candidate("B", 800, 5)));
        CutPlanValidator.validate(PROBLEM, filled);
        assertThat(filled).isEqualTo(plan);
    }

    @Test
    void respectsTheCountPerMarkAndTakesTurnsInTheOrderGiven() {
        SectionProblem problem = TestSections.section(List.of(demand("A", 1000, 1)), List.of(mill(6000, 50.0)),
                0, 0, 300);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        // offcut 5000 mm: turns A, B, A, B ... with at most 2 of A and 3 of B: A B A B B = 1000+500+1000+500+500
        SectionCutPlan filled = OffcutFiller.fill(plan, List.of(new OffcutFiller.Candidate("A", 1000, 2),
                new OffcutFiller.Candidate("B", 500, 3)));
        SectionProblem withB = TestSections.section(List.of(demand("A", 1000, 1), demand("B", 500, 1)),
                List.of(mill(6000, 50.0)), 0, 0, 300);
        SectionCutPlan asDemand = new SectionCutPlan(filled.section(), 0, 0, 300, filled.objective(),
                filled.status(), null, filled.value(), filled.lowerBound(), filled.gap(), filled.stockPieces(),
                filled.patterns(), List.of(new Spare("A", 2), new Spare("B", 2)));
        CutPlanValidator.validate(withB, asDemand); // B cut 3 times = 1 "demanded" here + 2 spares
        assertThat(filled.spares()).containsExactly(new Spare("A", 2), new Spare("B", 3));
        assertThat(filled.stockPieces()).isEqualTo(1);
        assertThat(filled.patterns()).singleElement().satisfies(p -> {
            assertThat(p.cuts()).extracting(Cut::mark).containsExactly("A", "A", "B", "A", "B", "B");
            assertThat(p.offcutMm()).isEqualTo(1500.0);
            assertThat(p.offcutKind()).isEqualTo("remnant");
        });
    }
}
