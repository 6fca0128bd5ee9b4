package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

class PatternCoverTest {
    private final PatternCover cover = new PatternCover(5, 10);

    /** Least cost, then fewest uses, by trying every use vector up to the bounds (exhaustive search). */
    private static double[] exhaustive(int[][] counts, double[] cost, int[] demand, int maxUse) {
        int patterns = counts.length;
        int[] uses = new int[patterns];
        double[] best = {Double.MAX_VALUE, Double.MAX_VALUE};
        while (true) {
            boolean covers = true;
            for (int i = 0; i < demand.length && covers; i++) {
                int got = 0;
                for (int p = 0; p < patterns; p++) {
                    got += counts[p][i] * uses[p];
                }
                covers = got >= demand[i];
            }
            if (covers) {
                double c = 0;
                int n = 0;
                for (int p = 0; p < patterns; p++) {
                    c += cost[p] * uses[p];
                    n += uses[p];
                }
                if (c < best[0] - 1e-9 || (Math.abs(c - best[0]) <= 1e-9 && n < best[1])) {
                    best[0] = c;
                    best[1] = n;
                }
            }
            int k = 0;
            while (k < patterns && uses[k] == maxUse) {
                uses[k++] = 0;
            }
            if (k == patterns) {
                return best;
            }
            uses[k]++;
        }
    }

    @RepeatedTest(12)
    @DisplayName("random small covers: CP-SAT's cover costs what an exhaustive search finds")
    void agreesWithExhaustiveSearch(RepetitionInfo repetition) {
        Random random = new Random(repetition.getCurrentRepetition());
        int types = 3;
        int patterns = 5;
        int[][] counts = new int[patterns][types];
        double[] cost = new double[patterns];
        for (int p = 0; p < patterns; p++) {
            for (int i = 0; i < types; i++) {
                counts[p][i] = random.nextInt(4);
            }
            counts[p][p % types] = Math.max(1, counts[p][p % types]);
            cost[p] = 10 + random.nextInt(40);
        }
        int[] demand = {1 + random.nextInt(6), 1 + random.nextInt(6), 1 + random.nextInt(6)};
        PatternCover.Result result = cover.solve(counts, cost, demand, null);
        double c = 0;
        int n = 0;
        for (int p = 0; p < patterns; p++) {
            c += cost[p] * result.uses()[p];
            n += result.uses()[p];
        }
        for (int i = 0; i < types; i++) {
            int got = 0;
            for (int p = 0; p < patterns; p++) {
                got += counts[p][i] * result.uses()[p];
            }
            assertThat(got).isGreaterThanOrEqualTo(demand[i]);
        }
        double[] best = exhaustive(counts, cost, demand, 6);
        assertThat(c).isEqualTo(best[0]);
        assertThat((double) n).isEqualTo(best[1]);
        assertThat(result.provenOverPatterns()).isTrue();
    }

    @Test
    @DisplayName("never worse than the hint it starts from")
    void keepsTheHint() {
        int[][] counts = {{2, 0}, {0, 2}, {1, 1}};
        double[] cost = {10, 10, 12};
        int[] demand = {3, 3};
        int[] hint = {2, 2, 0};
        PatternCover.Result result = new PatternCover(0.001, 10).solve(counts, cost, demand, hint);
        double c = 0;
        for (int p = 0; p < 3; p++) {
            c += cost[p] * result.uses()[p];
        }
        assertThat(c).isLessThanOrEqualTo(40);
    }
}
