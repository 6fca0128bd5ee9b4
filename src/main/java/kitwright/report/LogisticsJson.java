package kitwright.report;

import java.util.LinkedHashMap;
import java.util.Map;
import kitwright.io.PrettyJson;
import kitwright.loading.LoadPlan;
import kitwright.packing.CratePlan;

/** The crating and loading results as JSON: {@code {"crates": ..., "loads": ...}}, the plan.json contract. */
public final class LogisticsJson {
    private LogisticsJson() {
    }

    public static String write(CratePlan crates, LoadPlan loads) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("crates", crates);
        root.put("loads", loads);
        return PrettyJson.write(root);
    }
}
