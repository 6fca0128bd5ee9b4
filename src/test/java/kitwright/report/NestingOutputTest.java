package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.io.StringWriter;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javax.xml.parsers.DocumentBuilderFactory;
import kitwright.model.NestTolerance;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestedTube;
import kitwright.validate.CsvOutput;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.xml.sax.InputSource;

class NestingOutputTest {
    static final String ODD = "<b>&\"";

    /** A literal plan: a 88.9 host with a 76.1 chain (holding a 60.3) and, further along, three 33.7 side by side. */
    static NestPlan plan() {
        NestedTube c = new NestedTube("C", 60.9, 51.7, 2000, 0, 0, 10, List.of());
        NestedTube b = new NestedTube(ODD, 76.9, 67.3, 2900, 0, 0, 10, List.of(c));
        NestedTube e1 = new NestedTube("E", 34.2, 26.5, 1400, 20.89, 0, 2910, List.of());
        NestedTube e2 = new NestedTube("E", 34.2, 26.5, 1400, -10.45, 18.09, 2910, List.of());
        NestedTube e3 = new NestedTube("E", 34.2, 26.5, 1400, -10.45, -18.09, 2910, List.of());
        NestedTube a = new NestedTube("A", 89.8, 80.0, 6000, 0, 0, 0, List.of(b, e1, e2, e3));
        NestedTube lone = new NestedTube("A", 89.8, 80.0, 6000, 0, 0, 0, List.of());
        return new NestPlan(NestTolerance.WORST_CASE, 2, Status.OPTIMAL, 2, List.of(
                new Bundle("B001", 6000, 89.8, 70.5, a), new Bundle("B002", 6000, 89.8, 40.6, lone)));
    }

    @Test
    @DisplayName("nests.csv: one row per tube with its host, channel, offsets and the bundle's size, mass and flag")
    void nestsCsv() throws Exception {
        StringWriter out = new StringWriter();
        NestingCsv.writeNests(plan(), out);
        List<CSVRecord> rows = CsvOutput.records(out.toString());
        assertThat(rows).hasSize(7);
        CSVRecord chain = rows.get(2);
        assertThat(chain.get("tube")).isEqualTo("B001.1.1");
        assertThat(chain.get("in_tube")).isEqualTo("B001.1");
        assertThat(chain.get("in_mark")).isEqualTo(ODD); // the CSV quotes it; read back as text
        assertThat(rows.get(3).get("channel")).isEqualTo("2");
        assertThat(rows.get(5).get("channel")).isEqualTo("4");
        assertThat(rows.get(0).get("handling")).isEqualTo("two people or a hoist"); // 70.5 kg > 25 kg
        assertThat(rows.get(6).get("bundle_mass_kg")).isEqualTo("40.60");
    }

    @Test
    @DisplayName("assembly-order.csv: innermost first, every guest slid in once, after its own guests")
    void assemblyOrder() {
        List<List<String>> steps = NestingTables.assemblyOrder(plan());
        assertThat(steps).hasSize(5);
        Set<String> done = new HashSet<>();
        for (List<String> step : steps) {
            String tube = step.get(2);
            assertThat(done.add(tube)).isTrue();
            // every guest of this tube (a longer place name with it as prefix) is already in
            steps.stream().map(s -> s.get(2)).filter(t -> t.startsWith(tube + "."))
                    .forEach(inner -> assertThat(done).contains(inner));
        }
        assertThat(steps.get(0).get(2)).isEqualTo("B001.1.1");
    }

    @Test
    @DisplayName("The drawing is well-formed SVG without script, escapes marks, and draws every tube in section")
    void drawing() throws Exception {
        NestPlan plan = plan();
        List<BundleDrawing.Distinct> distinct = BundleDrawing.distinct(plan);
        assertThat(distinct).hasSize(2);
        String svg = BundleDrawing.svg(distinct.get(0).bundle(), distinct.get(0).ids());
        var doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new InputSource(new StringReader(svg)));
        assertThat(doc.getDocumentElement().getNodeName()).isEqualTo("svg");
        assertThat(svg).doesNotContain("<script").doesNotContain("href");
        assertThat(svg).contains("&lt;b&gt;&amp;&quot;");
        // four different cross-sections along B001: A+B+C, A+B (past C's end), A+3E, A alone: 10 rings
        assertThat(doc.getElementsByTagName("path").getLength()).isEqualTo(3 + 2 + 4 + 1);
        // a length bar per tube (host, the chain of two, three side by side), each labelled with mark and length
        assertThat(svg.split("<g class=\"tube-length\"", -1)).hasSize(6 + 1);
        assertThat(svg).contains("C \u00B7 2\u202F000").contains("A \u2283 3 \u00D7 E")
                .contains("A \u2283 &lt;b&gt;&amp;&quot; \u2283 C");
        assertThat(svg.split("<g class=\"cross-section\"", -1)).hasSize(4 + 1);
        String tinted = BundleDrawing.svg(distinct.get(0).bundle(), distinct.get(0).ids(), Map.of("E", "#123456"));
        assertThat(tinted.split("fill=\"#123456\"", -1)).as("three E in the side view, bars and section")
                .hasSize(3 * 3 + 1);
    }

    @Test
    @DisplayName("Identical bundles are drawn once, with all their ids")
    void distinctLayouts() {
        NestPlan p = plan();
        Bundle second = new Bundle("B003", 6000, 89.8, 40.6, p.bundles().get(1).host());
        NestPlan three = new NestPlan(p.tolerance(), 2, Status.FEASIBLE, 2, List.of(p.bundles().get(0),
                p.bundles().get(1), second));
        List<BundleDrawing.Distinct> distinct = BundleDrawing.distinct(three);
        assertThat(distinct).hasSize(2);
        assertThat(distinct.get(1).ids()).containsExactly("B002", "B003");
    }
}
