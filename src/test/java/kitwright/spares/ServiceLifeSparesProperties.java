package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.ForAll;
import net.jqwik.api.Label;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import kitwright.model.SparesPolicy;
import org.apache.commons.math3.distribution.BinomialDistribution;

class ServiceLifeSparesProperties {

    @Property(tries = 200, seed = "20240607")
    @Label("More cycles never need fewer spares")
    void moreCyclesNeverFewerSpares(@ForAll @IntRange(min = 1, max = 800) int bars,
                                    @ForAll @DoubleRange(min = 0.0, max = 0.2) @net.jqwik.api.constraints.Scale(6) double lossRate,
                                    @ForAll @IntRange(min = 0, max = 30) int cycles,
                                    @ForAll @DoubleRange(min = 0.5, max = 0.999) @net.jqwik.api.constraints.Scale(6) double level) {
        int fewer = ServiceLifeSpares.forMark("A", bars, 0, new SparesPolicy(lossRate, cycles, level), level).spares();
        int more = ServiceLifeSpares.forMark("A", bars, 0, new SparesPolicy(lossRate, cycles + 1, level), level)
                .spares();
        assertThat(more).isGreaterThanOrEqualTo(fewer);
    }

    @Property(tries = 200, seed = "20240608")
    @Label("Quantile equals commons-math3's BinomialDistribution.inverseCumulativeProbability (independent reference)")
    void quantileMatchesCommonsMath(@ForAll @IntRange(min = 1, max = 2000) int n,
                                    @ForAll @DoubleRange(min = 0.0005, max = 0.6) @net.jqwik.api.constraints.Scale(6) double q,
                                    @ForAll @DoubleRange(min = 0.05, max = 0.9999) @net.jqwik.api.constraints.Scale(6) double level) {
        int expected = new BinomialDistribution(null, n, q).inverseCumulativeProbability(level);
        assertThat(ServiceLifeSpares.quantile(n, q, level)).isEqualTo(expected);
    }
}
