package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Collectors;
import kitwright.compare.TinyKits;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.cutting.SearchLimits;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.io.KitReader;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Kit;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Service-life spares through the real cutting stage (optimizer and offcut filler). */
class SparesStageTest {
    private static final SearchLimits LIMITS = SearchLimits.defaults(5);

    @TempDir
    Path tmp;

    @Test
    void everySpareIsCutFromOffcutsFirstThenBought() throws Exception {
        Kit kit = KitReader.read(TinyKits.write(tmp, "spares", false,
                "{\"lossRatePerCycle\": 0.03, \"cycles\": 8, \"serviceLevel\": 0.95}"));
        SparesStage.Result r = SparesStage.cut(kit, false, LIMITS, CutProgress.NONE);
        // The plan is checked against the kit's own quantities: demand + the spares it lists, nothing else.
        CutPlanValidator.validate(kit, r.plan());

        Map<String, Integer> listed = r.plan().sections().stream().flatMap(s -> s.spares().stream())
                .collect(Collectors.toMap(Spare::mark, Spare::count));
        assertThat(r.supply().missing()).isZero();
        for (SparesSupply s : r.supply().marks()) {
            MarkSpares sized = r.sizing().mark(s.mark());
            assertThat(s.needed()).isEqualTo(sized.toMake()).isPositive();
            assertThat(s.cut()).isGreaterThanOrEqualTo(s.needed());
            assertThat(listed.getOrDefault(s.mark(), 0)).isEqualTo(s.cut());
            assertThat(s.expectedLosses()).isCloseTo(sized.bars() * 8 * 0.03, within(1e-12));
        }
        // Spares bought only when the offcuts could not hold them, and their cost is the plan's cost difference.
        double before = KitMetricsCalculator.stockCost(kit,
                KitCutter.cut(kit, new KitCutter.Options(false, LIMITS), CutProgress.NONE));
        assertThat(r.supply().extraCost()).isCloseTo(KitMetricsCalculator.stockCost(kit, r.plan()) - before,
                within(1e-9));
        if (r.supply().bought() == 0) {
            assertThat(r.supply().extraCost()).isCloseTo(0.0, within(1e-9));
        }
    }

    @Test
    void withoutAPolicyItIsTheCuttingStageAsItIs() throws Exception {
        Kit kit = KitReader.read(TinyKits.write(tmp, "plain", true, null));
        SparesStage.Result r = SparesStage.cut(kit, false, LIMITS, CutProgress.NONE);
        CutPlanValidator.validate(kit, r.plan());
        assertThat(r.sizing()).isNull();
        assertThat(r.supply()).isNull();
        assertThat(r.plan()).isEqualTo(KitCutter.cut(kit, new KitCutter.Options(false, LIMITS), CutProgress.NONE));
        assertThat(r.plan().sections()).allSatisfy((SectionCutPlan s) -> assertThat(s.spares()).isEmpty());
    }

    @Test
    void theWholeChainCutsTheKitsServiceLifeSpares() throws Exception {
        Kit kit = KitReader.read(TinyKits.write(tmp, "chain", false,
                "{\"lossRatePerCycle\": 0.02, \"cycles\": 6, \"serviceLevel\": 0.9}"));
        kitwright.plan.PlanResult result = kitwright.plan.Planner.run(kit, kitwright.plan.Planner.Options.DEFAULT,
                kitwright.plan.PlanProgress.NONE);
        CutPlanValidator.validate(kit, result.cutting());
        SparesPlan sized = ServiceLifeSpares.plan(kit.bars(), kit.settings().spares());
        Map<String, Integer> listed = result.cutting().sections().stream().flatMap(s -> s.spares().stream())
                .collect(Collectors.toMap(Spare::mark, Spare::count));
        for (MarkSpares m : sized.marks()) {
            assertThat(listed.getOrDefault(m.mark(), 0)).as(m.mark()).isGreaterThanOrEqualTo(m.toMake());
        }
    }
}
