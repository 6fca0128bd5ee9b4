package kitwright.report;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import kitwright.cutting.CutPlan;
import kitwright.model.Kit;

/**
 * The report of a plan saved earlier, without planning again: reads the cutting plan from {@code plan.json}
 * (under {@code "cutting"}, the JSON contract of the cutting stage) or from a {@code cut --json} file (the plan at
 * the top level), and builds the report model with the kit it was made for. Keys other stages add to plan.json are
 * ignored here until their report sections exist.
 */
public final class SavedPlanReport {
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .build();

    private SavedPlanReport() {
    }

    /** The cutting plan in a saved plan file. */
    public static CutPlan readCutting(Path planJson) throws IOException {
        JsonNode root = MAPPER.readTree(planJson.toFile());
        JsonNode cutting = root.has("cutting") ? root.get("cutting") : root;
        if (cutting == null || !cutting.has("sections")) {
            throw new IOException(planJson + ": no cutting plan (expected \"cutting\": {\"sections\": [...]})");
        }
        return MAPPER.treeToValue(cutting, CutPlan.class);
    }

    /** The report model of a kit and its saved plan, dated {@code date}. */
    public static ReportModel of(Kit kit, Path planJson, LocalDate date) throws IOException {
        return ReportModel.of(kit, readCutting(planJson), date);
    }
}
