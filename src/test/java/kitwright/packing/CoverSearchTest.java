package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The shared cover steps on one item type and two container types, every figure by hand (invented values). */
class CoverSearchTest {
    /** A container holding n items of the one item type. */
    private record Load(int containerType, int n) implements CoverPattern {
        @Override
        public int[] counts() {
            return new int[] {n};
        }

        @Override
        public boolean isEmpty() {
            return n == 0;
        }
    }

    // type 0: 10 a container, holds 2; type 1: 15 a container, holds 4
    private static final int[] HOLDS = {2, 4};
    private static final double[] COST = {10, 15};
    private static final CoverSearch.Filling<Load> FILL = (t, left) -> List.of(new Load(t, Math.min(HOLDS[t],
            left[0])));
    private static final CoverSearch.Share<Load> SHARE = (load, left) -> load.n() / (double) left[0];

    @Test
    @DisplayName("greedy, 5 items: 4 in type 1 (15 / 0.8 = 18.75 beats 10 / 0.4 = 25), then 1 in type 0 (10 / 1)")
    void greedyByCostPerShare() {
        Map<String, Load> patterns = new LinkedHashMap<>();
        List<Load> cover = CoverSearch.greedy(new int[] {5}, new int[] {0, 1}, COST, FILL, SHARE, patterns);
        assertThat(cover).containsExactly(new Load(1, 4), new Load(0, 1));
        assertThat(CoverSearch.total(cover, COST)).isEqualTo(25.0);
        assertThat(patterns.keySet()).containsExactly("0:[2]", "1:[4]", "0:[1]", "1:[1]");
    }

    @Test
    @DisplayName("greedy with type 0 alone covers 5 items with 3 containers (2 + 2 + 1), 30")
    void greedyOneType() {
        List<Load> cover = CoverSearch.greedy(new int[] {5}, new int[] {0}, COST, FILL, SHARE,
                new LinkedHashMap<>());
        assertThat(cover).extracting(Load::n).containsExactly(2, 2, 1);
    }

    @Test
    @DisplayName("choose, 6 items from 2 / 4 / 1-item patterns: 4 + 2 for 25 (other covers: 30 or more)")
    void chooseCheapestCover() {
        Map<String, Load> patterns = new LinkedHashMap<>();
        for (Load l : List.of(new Load(0, 2), new Load(1, 4), new Load(0, 1), new Load(1, 1))) {
            CoverSearch.add(patterns, l);
        }
        CoverSearch.add(patterns, new Load(1, 0));
        assertThat(patterns).hasSize(4);
        List<Load> start = List.of(new Load(0, 2), new Load(0, 2), new Load(0, 2));
        List<Load> chosen = CoverSearch.choose(new PatternCover(1.0, 10.0), patterns, COST, new int[] {6}, start);
        assertThat(chosen).containsExactly(new Load(0, 2), new Load(1, 4));
    }
}
