package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.packing.CratePlan;
import kitwright.validate.LoadPlanValidator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/** Random crate plans on the fixture fleet: every load plan passes the validator and respects its bound. */
class LoadingProperties {
    private static final RowLoadPlanner PLANNER = new RowLoadPlanner(new RowLoadPlanner.Limits(0.2, 5, 3));

    /**
     * Crate lengths: whole 100 mm steps, fractions to 0.01 mm, or exact fills of a deck (13 600 mm semi-trailer,
     * 6200 mm box truck, 12 032 mm 40 ft container) by 1 to 4 crates, and (2 to 4 crates) 0.01 mm over.
     */
    private static double crateLength(Random random) {
        return switch (random.nextInt(4)) {
            case 0 -> 1000 + random.nextInt(52) * 100;
            case 1 -> 1000 + random.nextInt(520_000) / 100.0;
            default -> {
                double[] decks = {13_600, 6200, 12_032};
                int crates = 1 + random.nextInt(4);
                double fill = Math.floor(decks[random.nextInt(decks.length)] / crates * 100) / 100;
                yield fill + (crates > 1 && random.nextInt(3) == 0 ? 0.01 : 0);
            }
        };
    }

    @Property(tries = 100, seed = "20261203")
    void everyPlanIsValid(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                          @ForAll @IntRange(min = 1, max = 40) int crateCount) {
        Random random = new Random(seed);
        List<CrateType> types = new ArrayList<>();
        for (int t = 0; t < 1 + random.nextInt(3); t++) {
            double width = random.nextBoolean() ? 700 + random.nextInt(6) * 100 : 2480 / (1 + random.nextInt(3));
            types.add(LoadFixtures.crateType("t" + t, crateLength(random), width,
                    500 + random.nextInt(8) * 100, random.nextBoolean(), 200 + random.nextInt(20) * 100));
        }
        CratePlan crates = LoadFixtures.plan(types.get(0), 1 + random.nextInt(crateCount), 100 + random.nextInt(2000));
        for (int t = 1; t < types.size(); t++) {
            crates = LoadFixtures.join(crates, LoadFixtures.plan(types.get(t), 1 + random.nextInt(crateCount),
                    100 + random.nextInt(2000)));
        }
        LoadPlan plan = PLANNER.load(crates, types, LoadFixtures.FLEET);
        LoadPlanValidator.check(plan, crates, types, LoadFixtures.FLEET);
        assertThat(plan.status()).isNotEqualTo(Status.INFEASIBLE);
        assertThat(plan.lowerBound()).isLessThanOrEqualTo(plan.tripCost() + 1e-6);
    }
}
