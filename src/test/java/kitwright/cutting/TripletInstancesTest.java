package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;

import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Triplet instances built as in Falkenauer (1996), "A hybrid grouping genetic algorithm for bin packing", Journal
 * of Heuristics 2(1): every bin is filled exactly by three items, so the optimum is the number of triplets.
 */
class TripletInstancesTest {

    @ParameterizedTest(name = "{0} triplets, seed {1}: optimum = number of triplets (Falkenauer 1996)")
    @CsvSource({"20, 1", "20, 2", "40, 3"})
    void reachesAndProvesTheNumberOfTriplets(int triplets, long seed) {
        SectionProblem problem = Instances.triplets(triplets, seed, TestSections.LIMITS);
        CuttingStockOptimizer.Outcome outcome = new CuttingStockOptimizer().optimize(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, outcome.plan());
        assertThat(outcome.plan().stockPieces()).isEqualTo(triplets); // Falkenauer 1996 construction
        assertThat(outcome.plan().status()).isEqualTo(Status.OPTIMAL);
        assertThat(outcome.firstFitValue()).isGreaterThan(triplets); // first-fit decreasing misses it
    }
}
