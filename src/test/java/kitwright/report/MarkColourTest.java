package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.io.KitReader;
import kitwright.model.Bar;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.validate.PlanValidator;
import org.junit.jupiter.api.Test;

/**
 * One colour per mark throughout the report: the saw-sheet pieces and legends, the bundle drawings and the bundle
 * tables of a real plan (cinema-12) give every mark one fill, and no two marks share one.
 */
class MarkColourTest {
    /** Where a mark's fill appears: a drawn piece, a drawn tube length, a legend or table swatch. */
    private static final Pattern[] PLACES = {
        Pattern.compile("<g class=\"piece\" data-mark=\"([^\"]*)\"><title>[^<]*</title><rect [^>]*fill=\"([^\"]+)\""),
        Pattern.compile("<g class=\"tube-length\" data-mark=\"([^\"]*)\"><rect [^>]*fill=\"([^\"]+)\""),
        Pattern.compile("<tr class=\"(?:legend-mark|bundle-tube)\" data-mark=\"([^\"]*)\"><td class=\"swatch-cell\">"
                + "<svg [^>]*><rect [^>]*fill=\"([^\"]+)\""),
    };

    @Test
    void everyMarkHasOneColourOnTheSawSheetsAndInTheBundles() throws Exception {
        PlanResult result = Planner.run(KitReader.read(Path.of("sample-kits", "cinema-12")), Planner.Options.DEFAULT,
                PlanProgress.NONE);
        PlanValidator.validate(result);
        String html = PlanFiles.of(result, LocalDate.of(2026, 12, 3)).get("report.html");

        Map<String, Set<String>> fills = new HashMap<>();
        int[] seen = new int[PLACES.length];
        for (int i = 0; i < PLACES.length; i++) {
            Matcher m = PLACES[i].matcher(html);
            while (m.find()) {
                fills.computeIfAbsent(m.group(1), k -> new HashSet<>()).add(m.group(2));
                seen[i]++;
            }
        }
        assertThat(seen).as("pieces, tube lengths and swatches found").doesNotContain(0);
        assertThat(fills.keySet()).containsExactlyInAnyOrderElementsOf(
                result.kit().bars().stream().map(Bar::mark).toList());
        fills.forEach((mark, colours) -> assertThat(colours).as("colours of mark " + mark).hasSize(1));
        assertThat(fills.values().stream().map(s -> s.iterator().next()).distinct().count())
                .as("no two marks share a colour").isEqualTo(fills.size());
    }
}
