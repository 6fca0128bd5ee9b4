package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.validate.CsvOutput;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

class CompareWritersTest {
    private static final List<String> KEYS = List.of("kit", "marks", "bars", "members", "reuseRatio", "stockPieces",
            "stockLengthMm", "cost", "payableCost", "offcutPct", "scrapPct", "remnantPct", "kitMassKg",
            "boughtMassKg", "usedStockMassKg", "co2eKg", "bundles", "crates", "vehicles", "tripCost", "crateCost",
            "totalCost", "status", "statusReason", "stages");

    @Test
    void jsonHasExactlyTheIssueKeysInOrder() throws Exception {
        String json = CompareJson.toJson(CompareFixtures.three());
        JsonNode root = new ObjectMapper().readTree(json);
        assertThat(root.size()).isEqualTo(1);
        assertThat(root.get("options")).hasSize(3);
        for (JsonNode option : root.get("options")) {
            List<String> names = new ArrayList<>();
            option.fieldNames().forEachRemaining(names::add);
            assertThat(names).containsExactlyElementsOf(KEYS);
        }
        JsonNode third = root.get("options").get(2);
        assertThat(third.get("kit").asText()).isEqualTo("<b>&\"");
        assertThat(third.get("status").asText()).isEqualTo("FEASIBLE");
        assertThat(third.get("cost").asDouble()).isEqualTo(5100.5);
        assertThat(json).doesNotContain("E+").doesNotContain("E7").endsWith("}\n");
        assertThat(CompareJson.read(json).options()).isEqualTo(CompareFixtures.three());
    }

    @Test
    void jsonWritesUnknownFiguresAsNull() throws Exception {
        OptionSummary unknown = CompareFixtures.option("x", 6, 2.0, null, 1.0, null, kitwright.model.Status.OPTIMAL);
        JsonNode option = new ObjectMapper().readTree(CompareJson.toJson(List.of(unknown))).get("options").get(0);
        assertThat(option.has("cost")).isTrue();
        assertThat(option.get("cost").isNull()).isTrue();
        assertThat(option.get("vehicles").isNull()).isTrue();
        assertThat(option.get("stockLengthMm").asText()).isEqualTo("480000.0");
    }

    @Test
    void csvHasTheKeysAsHeaderAndOneRowPerOption() throws Exception {
        StringWriter out = new StringWriter();
        CompareCsv.write(CompareFixtures.three(), out);
        List<CSVRecord> records = CsvOutput.records(out.toString());
        // compare.csv names the compare.json keys in snake_case
        // every key but the stages (a list: compare.csv gives them as status_reason)
        assertThat(out.toString()).startsWith("\uFEFF" + KEYS.stream().filter(k -> !k.equals("stages"))
                .map(k -> k.replaceAll("([A-Z])", "_$1").toLowerCase(java.util.Locale.ROOT))
                .collect(java.util.stream.Collectors.joining(",")) + "\r\n");
        assertThat(records).hasSize(3);
        assertThat(records.get(2).get("kit")).isEqualTo("<b>&\"");
        assertThat(records.get(1).get("cost")).isEqualTo("4800.0");
        assertThat(records.get(1).get("payable_cost")).isEqualTo("4800.0");
        assertThat(records.get(1).get("stock_length_mm")).isEqualTo("480000.0");
        assertThat(records.get(0).get("status")).isEqualTo("OPTIMAL");
    }

    @Test
    void wasteBarReadsTheOffcutOfTheTable() throws Exception {
        // scrap 1.88 + remnant 3.84 (each rounded) = 5.72, where the offcut itself rounds to 5.71
        OptionSummary option = new OptionSummary("k", 6, 300, 750, 2.0, 80, 480_000.0, 5000.0, 4950.0, 5.71, 1.88,
                3.84, 1500.0, 1700.0, 1750.0, 2635.0, 30, 2, 1, 900.0, kitwright.model.Status.OPTIMAL);
        String html = CompareHtml.render(List.of(option));
        assertThat(html).contains("5.71 %").doesNotContain("5.72");
    }

    @Test
    void htmlEscapesKitNames() throws Exception {
        String html = CompareHtml.render(CompareFixtures.three());
        assertThat(html).doesNotContain("<b>&\"");
        assertThat(html).contains("&lt;b&gt;&amp;&quot;");
        assertThat(html).doesNotContainIgnoringCase("<script");
        assertThat(html).doesNotContain("http://").doesNotContain("https://");
    }

    @Test
    void htmlMarksTheBestValueInEachRowAndShowsDifferences() throws Exception {
        String html = CompareHtml.render(CompareFixtures.three());
        assertThat(html).contains("<th scope=\"col\" class=\"option\">", "cinema-6", "cinema-12");
        assertThat(count(html, "<th scope=\"col\" class=\"option\">")).isEqualTo(3);
        String cost = rowOf(html, "cost");
        assertThat(cellsOf(cost)).hasSize(3);
        assertThat(cellsOf(cost).get(1)).startsWith("<td class=\"best\">4\u202F800.00<span class=\"best-mark\">best");
        assertThat(cellsOf(cost).get(0)).contains("+400.00 (+8.3 %)").doesNotContain("best-mark");
        assertThat(cellsOf(cost).get(2)).contains("+300.50 (+6.3 %)");
        String reuse = rowOf(html, "reuseRatio");
        assertThat(cellsOf(reuse).get(0)).contains("best-mark");
        assertThat(cellsOf(reuse).get(2)).contains("\u22120.70 (\u221228.0 %)");
        assertThat(cellsOf(rowOf(html, "scrapPct")).get(0)).contains("+2.60 points");
        // remnants go back to the rack as stock with value: neither they nor the offcut holding them are ranked
        for (String key : List.of("offcutPct", "remnantPct")) {
            assertThat(cellsOf(rowOf(html, key))).allSatisfy(c -> assertThat(c).doesNotContain("best-mark"));
        }
        assertThat(cellsOf(rowOf(html, "members"))).allSatisfy(c -> assertThat(c).doesNotContain("best-mark"));
        assertThat(count(html, "<svg class=\"chart\"")).isEqualTo(4);
        for (String chart : List.of("cost", "waste", "mass", "vehicles")) {
            assertThat(html).contains("<svg class=\"chart\" data-metric=\"" + chart + "\"");
        }
    }

    @Test
    void writersAreDeterministic() throws Exception {
        assertThat(CompareHtml.render(CompareFixtures.three())).isEqualTo(CompareHtml.render(CompareFixtures.three()));
        assertThat(CompareJson.toJson(CompareFixtures.three())).isEqualTo(CompareJson.toJson(CompareFixtures.three()));
    }

    static String rowOf(String html, String key) {
        Matcher m = Pattern.compile("<tr data-metric=\"" + key + "\"[^>]*>(.*?)</tr>").matcher(html);
        assertThat(m.find()).as("row " + key).isTrue();
        return m.group(1);
    }

    static List<String> cellsOf(String row) {
        List<String> cells = new ArrayList<>();
        Matcher m = Pattern.compile("<td class=\"(?!unit)[^\"]*\">.*?</td>").matcher(row);
        while (m.find()) {
            cells.add(m.group());
        }
        return cells;
    }

    static int count(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + 1)) {
            n++;
        }
        return n;
    }
}
