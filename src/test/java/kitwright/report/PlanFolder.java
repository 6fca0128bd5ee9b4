package kitwright.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import kitwright.io.PrettyJson;

/**
 * What a written plan folder says the report must draw, read from its {@code plan.json} alone (the JSON contracts
 * of the stages), without the report code: the distinct saw patterns of each section, the distinct bundle
 * layouts, the crate types used and the vehicles. For the browser test, which then looks for each in the DOM.
 */
record PlanFolder(int sections, List<String> patternIds, List<String> bundleLayouts, Set<String> crateTypes,
                  List<String> vehicles) {

    static PlanFolder read(Path folder) throws IOException {
        JsonNode plan = PrettyJson.mapper().readTree(folder.resolve("plan.json").toFile());
        List<String> patterns = new ArrayList<>();
        JsonNode sections = plan.get("cutting").get("sections");
        for (int s = 0; s < sections.size(); s++) {
            Set<String> distinct = new LinkedHashSet<>();
            for (JsonNode p : sections.get(s).get("patterns")) {
                ObjectNode withoutCount = p.deepCopy();
                withoutCount.remove("count");
                distinct.add(withoutCount.toString());
            }
            for (int p = 1; p <= distinct.size(); p++) {
                patterns.add("s" + (s + 1) + "-p" + p);
            }
        }
        Map<String, String> layouts = new LinkedHashMap<>();
        for (JsonNode b : plan.get("nesting").get("bundles")) {
            layouts.putIfAbsent(b.get("host").toString(), b.get("id").asText());
        }
        Set<String> types = new LinkedHashSet<>();
        plan.get("crates").get("crates").forEach(c -> types.add(c.get("type").asText()));
        List<String> vehicles = new ArrayList<>();
        plan.get("loads").get("vehicles").forEach(v -> vehicles.add(v.get("id").asText()));
        return new PlanFolder(sections.size(), patterns, List.copyOf(layouts.values()), types, vehicles);
    }
}
