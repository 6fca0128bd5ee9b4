package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.SparesPolicy;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/**
 * The re-plan loop of {@link SparesCutting} obeys its round budget: an adversarial cutting stage whose offcuts
 * always hold one spare fewer than asked would make the loop re-plan once per spare (each round re-solving every
 * changed section up to its time limit); with the budget the last round buys what is short and every spare is cut.
 */
class SparesRoundLimitTest {
    private static final String CHS = "CHS 48.3x3.2";
    private static final int SPARES = 10;

    /** One bar B of 900 mm on unlimited 12 m stock at 120 (invented): one piece holds 12 such bars. */
    private static Kit kit() {
        TubeCatalog catalog = new TubeCatalog(Path.of("tubes.csv"),
                Map.of(CHS, new Section(CHS, "steel", 48.3, 3.2, null, null, null)),
                List.of(new StockLength(CHS, 12000, 120.0, null, Origin.MILL)));
        return new Kit(null, KitSettings.defaults("rounds"), List.of(new Bar("B", CHS, 900, 1, 1, null, null, "")),
                List.of(), List.of(), catalog, Map.of(), List.of(), List.of());
    }

    private static SparesPlan asking(int b) {
        return new SparesPlan(new SparesPolicy(0.02, 5, 0.9), List.of(new MarkSpares("B", 1, 5, 0.02, b, 0.95, 0,
                0.95)), b, b, 0.9, 0.9);
    }

    /** The test stand-in, except that the offcuts take one spare fewer than asked of each mark. */
    private static final class StingyOffcuts implements CuttingSteps {
        private final SimpleCutting cutting = new SimpleCutting();
        private int plans;

        @Override
        public CutPlan plan(Kit kit) {
            plans++;
            return cutting.plan(kit);
        }

        @Override
        public CutPlan fillOffcuts(Kit kit, CutPlan plan, Map<String, Integer> maxExtra) {
            Map<String, Integer> fewer = new LinkedHashMap<>();
            maxExtra.forEach((mark, n) -> fewer.put(mark, Math.max(0, n - 1)));
            return cutting.fillOffcuts(kit, plan, fewer);
        }
    }

    @Test
    void theRoundBudgetEndsTheLoopWithEverySpareCut() {
        Kit kit = kit();
        StingyOffcuts cutting = new StingyOffcuts();
        SparesCuttingResult r = SparesCutting.apply(kit, asking(SPARES), cutting);
        CutPlanValidator.validate(kit, r.plan());
        assertThat(r.rounds()).isEqualTo(SparesCutting.MAX_ROUNDS);
        assertThat(cutting.plans).isEqualTo(SparesCutting.MAX_ROUNDS + 1);
        assertThat(r.missing()).isZero();
        assertThat(r.marks().get(0).cut()).isGreaterThanOrEqualTo(SPARES);
    }

    @Test
    void withoutTheBudgetTheSameInputReplansOncePerSpare() {
        // the step count the budget cuts: one re-plan per spare (what the loop did before it had a budget)
        Kit kit = kit();
        SparesCuttingResult r = SparesCutting.apply(kit, asking(SPARES), new StingyOffcuts(), Integer.MAX_VALUE);
        CutPlanValidator.validate(kit, r.plan());
        assertThat(r.rounds()).isEqualTo(SPARES).isGreaterThan(SparesCutting.MAX_ROUNDS);
        assertThat(r.missing()).isZero();
    }
}
