package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SavedPlanReportTest {
    @Test
    void aSavedPlanGivesTheSameReportAsThePlanItself(@TempDir Path dir) throws Exception {
        Kit kit = ReportFixtures.sampleKit();
        CutPlan plan = ReportFixtures.samplePlan(kit);
        Path planJson = Files.writeString(dir.resolve("plan.json"),
                PrettyJson.write(Map.of("cutting", plan, "nesting", Map.of("bundles", 3))));
        Path cutJson = Files.writeString(dir.resolve("cut.json"), PrettyJson.write(plan));
        assertThat(SavedPlanReport.readCutting(planJson)).isEqualTo(plan);
        assertThat(SavedPlanReport.readCutting(cutJson)).isEqualTo(plan);
        LocalDate date = LocalDate.of(2025, 3, 14);
        assertThat(HtmlReport.render(SavedPlanReport.of(kit, planJson, date)))
                .isEqualTo(HtmlReport.render(ReportModel.of(kit, plan, date)));
    }

    @Test
    void aFileWithoutACuttingPlanIsRefused(@TempDir Path dir) throws Exception {
        Path other = Files.writeString(dir.resolve("plan.json"), "{\"nesting\": {}}");
        assertThatThrownBy(() -> SavedPlanReport.readCutting(other)).isInstanceOf(IOException.class)
                .hasMessageContaining("no cutting plan");
    }
}
