package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import kitwright.io.KitReader;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.SparesPolicy;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The demo's spares policy (sample-kits/alu-kiosk, invented data) is read and sized as the report shows it. */
class SampleKitSparesTest {

    @Test
    @DisplayName("alu-kiosk sets p = 0.02, c = 20, level 0.95; its spares per mark agree with commons-math3")
    void aluKioskSizesItsSpares() throws Exception {
        Kit kit = KitReader.read(Path.of("sample-kits", "alu-kiosk"));
        assertThat(kit.settings().spares()).isEqualTo(new SparesPolicy(0.02, 20, 0.95));
        SparesPlan plan = ServiceLifeSpares.plan(kit.bars(), kit.settings().spares());

        long inService = kit.bars().stream().filter(b -> b.requiredQuantity() > 0).count();
        assertThat(inService).isEqualTo(5);
        double perMark = Math.pow(0.95, 1.0 / inService);
        double kitLevel = 1;
        for (Bar bar : kit.bars()) {
            MarkSpares m = plan.mark(bar.mark());
            // Reference: org.apache.commons.math3.distribution.BinomialDistribution (commons-math3 3.6.1)
            // n bars in service over 20 cycles, lost bars replaced: Binomial(20 n, 0.02)
            BinomialDistribution reference = new BinomialDistribution(null, bar.requiredQuantity() * 20, 0.02);
            int spares = reference.inverseCumulativeProbability(perMark);
            assertThat(m.spares()).as(bar.mark()).isEqualTo(spares).isPositive();
            assertThat(m.alreadyInKit()).as(bar.mark()).isEqualTo(bar.surplus());
            kitLevel *= reference.cumulativeProbability(spares);
        }
        assertThat(plan.kitLevel()).isCloseTo(kitLevel, org.assertj.core.api.Assertions.within(1e-9))
                .isGreaterThanOrEqualTo(0.95);
        assertThat(plan.totalToMake()).as("alu-kiosk's spares, as the sample README states them").isEqualTo(54);
    }
}
