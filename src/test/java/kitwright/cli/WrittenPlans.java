package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Map;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.LogisticsCsv;
import kitwright.report.PlanFiles;
import kitwright.report.SavedPlanReport;
import kitwright.validate.CutPlanValidator;
import kitwright.validate.PlanValidator;

/**
 * What a command wrote, put through the shared validators: the plan is made again in memory with the command's
 * defaults and validated whole ({@link PlanValidator}), the files the command wrote must be that plan's files, and
 * the cutting plan read back from the written {@code plan.json} must pass the cut validator on its own.
 */
final class WrittenPlans {
    private WrittenPlans() {
    }

    /** The plan {@code plan KIT_DIR} makes by default, validated. */
    static PlanResult validated(Path kitDir) throws Exception {
        PlanResult result = Planner.run(KitReader.read(kitDir), Planner.Options.DEFAULT, PlanProgress.NONE);
        PlanValidator.validate(result);
        return result;
    }

    /** The plan folder {@code plan} wrote for the kit with {@code --date date}: a valid plan, read back. */
    static void planFolder(Path kitDir, Path out, LocalDate date) throws Exception {
        PlanResult result = validated(kitDir);
        Kit kit = result.kit();
        CutPlanValidator.validate(kit, SavedPlanReport.readCutting(out.resolve(PlanFiles.PLAN_JSON)));
        Map<String, String> files = PlanFiles.of(result, date);
        assertThat(Files.readString(out.resolve(PlanFiles.PLAN_JSON))).as("plan.json is the validated plan's")
                .isEqualTo(files.get(PlanFiles.PLAN_JSON));
        logistics(result, out);
    }

    /** The packing lists and manifests a command wrote into out, checked against the validated plan of the kit. */
    static void logisticsFolder(Path kitDir, Path out) throws Exception {
        logistics(validated(kitDir), out);
    }

    private static void logistics(PlanResult result, Path out) throws Exception {
        if (Files.exists(out.resolve(LogisticsCsv.PACKING_LISTS))) {
            PlanValidator.validate(result, Map.of(
                    LogisticsCsv.PACKING_LISTS, Files.readString(out.resolve(LogisticsCsv.PACKING_LISTS)),
                    LogisticsCsv.MANIFESTS, Files.readString(out.resolve(LogisticsCsv.MANIFESTS))));
        }
    }
}
