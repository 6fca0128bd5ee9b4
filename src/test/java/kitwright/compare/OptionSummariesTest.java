package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.CutPlanValidator;
import kitwright.validate.LoadPlanValidator;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The summary of a real chain run agrees with what each stage reports about itself. */
class OptionSummariesTest {
    @TempDir
    Path tmp;

    @Test
    void summaryAgreesWithTheStagesOwnFigures() throws Exception {
        Kit kit = KitReader.read(TinyKits.write(tmp, "tiny", false, null));
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        CutPlanValidator.validate(kit, result.cutting());
        NestPlanValidator.validate(kit, result.cutting(), result.nesting().plan());
        CratePlanValidator.check(result.crates(), result.nesting().plan().bundles(), kit.joints(), kit.crates(),
                kit.settings().jointBox());
        LoadPlanValidator.check(result.loads(), result.crates(), kit.crates(), kit.vehicles());

        OptionSummary s = OptionSummaries.of(result);
        assertThat(s.kit()).isEqualTo("tiny");
        // The kit summary (KitSummary's own count): marks, bars, members, reuse ratio and kit mass.
        assertThat(s.marks()).isEqualTo(result.summary().marks());
        assertThat(s.bars()).isEqualTo(result.summary().bars()).isEqualTo(6 + 9 + 10);
        assertThat(s.members()).isEqualTo(result.summary().members()).isEqualTo(24 + 19);
        assertThat(s.reuseRatio()).isCloseTo(result.summary().reuseRatio(), within(0.0005));
        assertThat(s.kitMassKg()).isCloseTo(result.summary().kitMassKg(), within(0.05));
        // The cutting stage's own figures: stock pieces and, with a cost objective, the value is the price paid.
        int pieces = result.cutting().sections().stream().mapToInt(SectionCutPlan::stockPieces).sum();
        double value = result.cutting().sections().stream().mapToDouble(SectionCutPlan::value).sum();
        assertThat(result.cutting().sections()).allSatisfy(x -> assertThat(x.objective()).isEqualTo("cost"));
        assertThat(s.stockPieces()).isEqualTo(pieces);
        assertThat(s.cost()).isCloseTo(value, within(0.006));
        // Logistics as the later stages report them.
        assertThat(s.bundles()).isEqualTo(result.nesting().plan().bundles().size());
        assertThat(s.crates()).isEqualTo(result.crates().crates().size());
        assertThat(s.vehicles()).isEqualTo(result.loads().vehicles().size()).isPositive();
        assertThat(s.tripCost()).isCloseTo(result.loads().tripCost(), within(0.006));
        assertThat(s.status()).isNotEqualTo(Status.INFEASIBLE);
        assertThat(s.co2eKg()).isCloseTo(s.boughtMassKg() * kit.materials().get("steel").co2eKgPerKg(),
                within(0.2));
    }
}
