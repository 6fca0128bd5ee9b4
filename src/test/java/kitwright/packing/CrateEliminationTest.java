package kitwright.packing;

import static kitwright.packing.Fixtures.crate;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.CrateType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class CrateEliminationTest {
    // 1000 x 200 x 100 inside: one square row of floor(200/100) = 2 cells, 2 bundles of 500 end to end in each
    // (hand count: 4 bundles a crate, by geometry alone)
    private static final CrateType CRATE = crate("small", 1000, 200, 100, 10, 1000, 10.0);
    private static final List<ItemType> TYPES = List.of(new ItemType(0, ItemKind.BUNDLE, 500, 100, 100, 5, 8));
    private final CrateFiller filler = new CrateFiller();

    private CrateLayout holding(int n) {
        CrateLayout layout = filler.fill(0, CRATE, TYPES, new int[] {n});
        assertThat(layout.counts()).containsExactly(n);
        return layout;
    }

    @Test
    @DisplayName("a crate with 1 bundle empties into one with 3 (4 fit, hand count): one crate is left with all 4")
    void emptiesACrate() {
        List<CrateLayout> result = new CrateElimination(100).improve(List.of(holding(3), holding(1)),
                List.of(CRATE), new double[] {10}, TYPES);
        assertThat(result).hasSize(1);
        assertThat(result.get(0).counts()).containsExactly(4);
        assertThat(Fixtures.unsupported(result.get(0).slots(), TYPES, 200)).isEmpty();
    }

    @Test
    @DisplayName("3 + 2 bundles do not fit one crate of 4: both crates stay as they were, nothing is lost")
    void keepsWhatCannotMove() {
        List<CrateLayout> before = List.of(holding(3), holding(2));
        List<CrateLayout> result = new CrateElimination(100).improve(before, List.of(CRATE), new double[] {10},
                TYPES);
        assertThat(result).hasSize(2);
        assertThat(result.stream().mapToInt(l -> l.counts()[0]).sum()).isEqualTo(5);
    }

    @Test
    @DisplayName("a budget of no fillings changes nothing")
    void budget() {
        List<CrateLayout> before = List.of(holding(3), holding(1));
        assertThat(new CrateElimination(0).improve(before, List.of(CRATE), new double[] {10}, TYPES))
                .isEqualTo(before);
    }

    @Test
    @DisplayName("two half-full small crates (cost 10 each) merge into one large crate that costs 15")
    void mergesIntoALargerType() {
        CrateType large = crate("large", 1000, 400, 100, 10, 1000, 15.0);
        List<CrateLayout> result = new CrateElimination(100).improve(List.of(holding(3), holding(3)),
                List.of(CRATE, large), new double[] {10, 15}, TYPES);
        assertThat(result).hasSize(1);
        assertThat(result.get(0).crateType()).isEqualTo(1);
        assertThat(result.get(0).counts()).containsExactly(6);
    }

    @Test
    @DisplayName("two large crates (15 each) with 6 + 5 bundles become a large and a small one (25): 8 + 4 places"
            + " hold the 11 (hand count), no single crate does")
    void repacksAPairCheaper() {
        // large: 1000 x 400 x 100 inside, floor(400/100) = 4 cells, 2 bundles of 500 each: 8 places
        CrateType large = crate("large", 1000, 400, 100, 10, 1000, 15.0);
        List<CrateType> catalog = List.of(CRATE, large);
        CrateLayout six = filler.fill(1, large, TYPES, new int[] {6});
        CrateLayout five = filler.fill(1, large, TYPES, new int[] {5});
        assertThat(six.counts()).containsExactly(6);
        assertThat(five.counts()).containsExactly(5);
        List<CrateLayout> result = new CrateElimination(100).improve(List.of(six, five), catalog,
                new double[] {10, 15}, TYPES);
        assertThat(result).hasSize(2);
        assertThat(result.stream().mapToInt(l -> l.counts()[0]).sum()).isEqualTo(11);
        assertThat(result.stream().mapToInt(CrateLayout::crateType).sorted().toArray()).containsExactly(0, 1);
        for (CrateLayout l : result) {
            assertThat(Fixtures.unsupported(l.slots(), TYPES, catalog.get(l.crateType()).innerWidthMm()))
                    .isEmpty();
        }
    }
}
