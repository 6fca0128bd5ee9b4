package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.validate.CratePlanValidator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/** Random bundles, joints and crate catalogs: every plan passes the validator and respects its bound. */
class CratingProperties {
    private static final LaneCratePacker PACKER = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 5, 3));

    @Property(tries = 50, seed = "20261203")
    void everyPlanIsValid(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                          @ForAll @IntRange(min = 0, max = 80) int bundleCount) {
        Random random = new Random(seed);
        double[] diameters = {33.7, 42.4, 48.3, 60.3, 76.1, 88.9, 114.3};
        List<Bundle> bundles = new ArrayList<>();
        for (int i = 0; i < bundleCount; i++) {
            double d = diameters[random.nextInt(diameters.length)];
            // whole 100 mm steps, fractions to 0.01 mm, or exact fills of the 6200 / 3200 mm crates by one or two
            // bundles end to end (two 0.01 mm too long to share a lane)
            int fill = 1 + random.nextInt(2);
            double length = switch (random.nextInt(3)) {
                case 0 -> 500 + random.nextInt(56) * 100;
                case 1 -> 500 + random.nextInt(570_000) / 100.0;
                default -> (random.nextBoolean() ? 6200 : 3200) / fill
                        + (fill == 2 && random.nextInt(3) == 0 ? 0.01 : 0);
            };
            bundles.add(Fixtures.bundle("B" + i, "M" + random.nextInt(4), length, d, 1 + random.nextInt(60)));
        }
        List<Joint> joints = new ArrayList<>();
        for (int j = 0; j < random.nextInt(3); j++) {
            joints.add(new Joint("N" + j, 60 + random.nextInt(100), 0.3 + random.nextInt(30) / 10.0,
                    1 + random.nextInt(80)));
        }
        List<CrateType> crates = new ArrayList<>();
        crates.add(Fixtures.crate("long", 6200, 800 + random.nextInt(5) * 100, 500 + random.nextInt(5) * 100,
                100, 1500 + random.nextInt(2000), 150.0 + random.nextInt(50)));
        if (random.nextBoolean()) {
            crates.add(Fixtures.crate("short", 3200, 700, 600, 60, 1000, 80.0 + random.nextInt(30)));
        }
        JointBox box = new JointBox(500 + random.nextInt(200), 400, 300, 20 + random.nextInt(10));
        CratePlan plan = PACKER.pack(bundles, joints, crates, box);
        CratePlanValidator.check(plan, bundles, joints, crates, box);
        assertThat(plan.status()).isNotEqualTo(Status.INFEASIBLE);
        assertThat(plan.lowerBound()).isLessThanOrEqualTo(plan.crates().size());
    }
}
