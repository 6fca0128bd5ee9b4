package kitwright.nesting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.Size;
import org.junit.jupiter.api.Test;

/**
 * The sparse counts of a pattern read as the dense list of one count per type did (the representation the nesting
 * models were built from before): same count per type, same total, the same weighted sum to the last bit, and
 * equal exactly when the dense lists are equal.
 */
class TypeCountsTest {

    @Property(tries = 400, seed = "20260101")
    void readsAsTheDenseList(@ForAll @Size(min = 0, max = 60) int[] raw, @ForAll("weights") double[] weights) {
        int[] dense = Arrays.stream(raw).map(c -> Math.floorMod(c, 7) < 4 ? 0 : Math.floorMod(c, 5)).toArray();
        TypeCounts sparse = TypeCounts.of(dense);
        double denseSum = 0;
        int total = 0;
        int nonzero = 0;
        for (int t = 0; t < dense.length; t++) {
            assertThat(sparse.get(t)).isEqualTo(dense[t]);
            denseSum += weights[t % weights.length] * dense[t];
            total += dense[t];
            nonzero += dense[t] > 0 ? 1 : 0;
        }
        double[] weight = new double[dense.length];
        for (int t = 0; t < dense.length; t++) {
            weight[t] = weights[t % weights.length];
        }
        assertThat(sparse.size()).isEqualTo(nonzero);
        assertThat(sparse.total()).isEqualTo(total);
        // zeros add +0.0 or -0.0 to the dense sum, which leaves it unchanged: the sums agree bit for bit
        assertThat(Double.doubleToLongBits(sparse.value(weight))).isEqualTo(Double.doubleToLongBits(denseSum));
        for (int i = 1; i < sparse.size(); i++) {
            assertThat(sparse.type(i)).isGreaterThan(sparse.type(i - 1));
        }
        int[] other = dense.clone();
        if (other.length > 0) {
            other[other.length / 2] = (other[other.length / 2] + 1) % 3;
        }
        assertThat(TypeCounts.of(other).equals(sparse)).isEqualTo(Arrays.equals(other, dense));
        assertThat(TypeCounts.of(dense.clone())).isEqualTo(sparse).hasSameHashCodeAs(sparse);
    }

    @Provide
    Arbitrary<double[]> weights() {
        // reduced costs: fractional, negative, zero and ties
        return Arbitraries.of(-1.5, -0.1, 0.0, 1e-9, 0.3333333333333333, 1.0, 1.001, 7.25)
                .array(double[].class).ofMinSize(1).ofMaxSize(8);
    }

    @Test
    void refusesNegativeCounts() {
        assertThatThrownBy(() -> TypeCounts.of(new int[] {0, -1})).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void absentTypesCountZero() {
        TypeCounts counts = TypeCounts.of(new int[] {0, 3, 0, 0, 2});
        assertThat(counts.get(0)).isZero();
        assertThat(counts.get(1)).isEqualTo(3);
        assertThat(counts.get(4)).isEqualTo(2);
        assertThat(counts.get(9)).isZero();
        assertThat(counts).hasToString("{1=3, 4=2}");
    }
}
