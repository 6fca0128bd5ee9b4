package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.io.KitReader;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.labels.LabelsHtml;
import kitwright.testing.PageLook;
import kitwright.testing.Wcag;
import kitwright.validate.PlanValidator;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The look shared by report.html and compare.html (kitwright/style/look.css, {@link Look}): text contrast at least
 * 4.5:1 (WCAG 2.1 AA, success criterion 1.4.3; ratios by WCAG 2.1, definitions of relative luminance and contrast
 * ratio, in {@link Wcag}); status marks that differ by word, border style and shape, not by colour alone, and no
 * pill shapes; nothing from the network in report.html and labels.html; every mark colour on the saw sheets with
 * its mark's name written in the drawing (the greyscale rule: a fill never speaks alone).
 */
class LookTest {
    private static final double AA_TEXT = PageLook.AA_TEXT;
    private static Map<String, String> files;

    @BeforeAll
    static void planCinema12() throws Exception {
        PlanResult result = Planner.run(KitReader.read(Path.of("sample-kits", "cinema-12")), Planner.Options.DEFAULT,
                PlanProgress.NONE);
        PlanValidator.validate(result);
        files = PlanFiles.of(result, LocalDate.of(2026, 12, 1));
    }

    static String resource(String name) throws IOException {
        try (InputStream in = LookTest.class.getClassLoader().getResourceAsStream(name)) {
            assertThat(in).as(name).isNotNull();
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void theContrastFormulaGivesWcagsEndPoints() {
        // WCAG 2.1, definition of contrast ratio: ratios range from 1:1 to 21:1 (black on white)
        assertThat(Wcag.contrast("#000000", "#ffffff")).isCloseTo(21.0, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(Wcag.contrast("#777777", "#777777")).isEqualTo(1.0);
        // #767676 on white is the well-known lightest grey that passes 4.5:1 (4.54:1; common practice, from memory)
        assertThat(Wcag.contrast("#767676", "#ffffff")).isGreaterThan(4.5);
        assertThat(Wcag.contrast("#777777", "#ffffff")).isLessThan(4.5);
    }

    @Test
    void everyTextColourOfTheReportMeetsAaOnEveryBackground() throws Exception {
        String html = files.get(PlanFiles.REPORT_HTML);
        assertThat(html).contains(Look.css());
        // text drawn in the SVGs: the ink on the paper, on every mark colour (mark labels inside the pieces), on
        // the scrap grey, the white halo; and the lighter line colour, which carries no text
        Set<String> fills = new LinkedHashSet<>(List.of(SawSheetDrawing.SCRAP, "#ffffff"));
        for (int n = 0; n < 200; n++) {
            fills.add(MarkPalette.colour(n));
        }
        assertThat(PageLook.lowContrastPairs(PageLook.styles(html), Set.of(), Set.of())).isEmpty();
        List<String> low = new ArrayList<>();
        for (String fill : fills) {
            if (Wcag.contrast(SawSheetDrawing.INK, fill) < AA_TEXT) {
                low.add(fill);
            }
        }
        assertThat(low).as("fills under the drawings' ink text").isEmpty();
        // every text fill the saw drawings use is the ink
        Matcher text = Pattern.compile("<text [^>]*fill=\"([^\"]+)\"").matcher(between(html, "id=\"saw-sheets\"",
                "</section>"));
        Set<String> textFills = new LinkedHashSet<>();
        while (text.find()) {
            textFills.add(text.group(1));
        }
        assertThat(textFills).containsExactly(SawSheetDrawing.INK);
    }

    @Test
    void thePageStylesheetsDeclareNoColourOfTheirOwn() throws Exception {
        // one palette: colours live in the look only, the report's layout rules use its custom properties
        for (String page : List.of("kitwright/report/report-style.mustache", "kitwright/report/report.mustache",
                "kitwright/compare/compare.html.mustache")) {
            String css = PageLook.styles(resource(page).replace("{{> report-style}}", "").replace("{{{look}}}", ""));
            String own = page.endsWith("report-style.mustache") ? resource(page) : css;
            assertThat(Pattern.compile("#[0-9a-fA-F]{3,6}\\b|rgba?\\(|hsl").matcher(own).find()).as(page).isFalse();
        }
    }

    @Test
    void statusMarksDifferByWordBorderAndShapeAndAreNoPills() throws Exception {
        Map<String, Map<String, String>> rules = Wcag.rules(Look.css());
        Set<String> borders = new LinkedHashSet<>();
        Set<String> shapes = new LinkedHashSet<>();
        for (String status : List.of("optimal", "feasible", "infeasible")) {
            Map<String, String> rule = rules.get(".status-" + status);
            String border = rule.containsKey("border-style") ? rule.get("border-style")
                    : rule.get("border").replaceAll(".*\\b(solid|dashed|double|dotted)\\b.*", "$1");
            borders.add(border);
            shapes.add(rules.get(".status-" + status + "::before").get("content"));
        }
        assertThat(borders).containsExactlyInAnyOrder("solid", "dashed", "double");
        assertThat(shapes).hasSize(3);
        // and the word: every status mark of the report starts with its status's name
        Matcher mark = Pattern.compile("<span class=\"status status-([a-z]+)\">([^<]*)<").matcher(
                files.get(PlanFiles.REPORT_HTML));
        int marks = 0;
        while (mark.find()) {
            marks++;
            assertThat(mark.group(2)).startsWithIgnoringCase(mark.group(1));
        }
        assertThat(marks).isGreaterThan(3);
        // no rounded pills anywhere in either page's styles: no radius above 2 px
        for (String css : List.of(Look.css(), PageLook.styles(files.get(PlanFiles.REPORT_HTML)))) {
            Matcher radius = Pattern.compile("border-radius:\\s*([0-9.]+)").matcher(css);
            while (radius.find()) {
                assertThat(Double.parseDouble(radius.group(1))).as("border-radius").isLessThanOrEqualTo(2);
            }
        }
    }

    @Test
    void nothingComesFromTheNetworkInTheReportAndTheLabels() {
        for (String name : List.of(PlanFiles.REPORT_HTML, LabelsHtml.FILE)) {
            PageLook.assertNoNetwork(name, files.get(name));
        }
    }

    @Test
    void everyMarkColourOnTheSawSheetsHasItsMarkWrittenInTheSameDrawing() {
        String html = files.get(PlanFiles.REPORT_HTML);
        Matcher drawing = Pattern.compile("(?s)<svg [^>]*class=\"saw-drawing\".*?</svg>").matcher(html);
        int drawings = 0;
        while (drawing.find()) {
            drawings++;
            String svg = drawing.group();
            StringBuilder written = new StringBuilder();
            Matcher text = Pattern.compile("<text [^>]*>([^<]*)</text>").matcher(svg);
            while (text.find()) {
                written.append(text.group(1)).append(" | ");
            }
            Matcher piece = Pattern.compile("<g class=\"piece\" data-mark=\"([^\"]*)\">").matcher(svg);
            while (piece.find()) {
                assertThat(written.toString()).as("labels of a drawing with mark " + piece.group(1))
                        .contains(piece.group(1));
            }
        }
        assertThat(drawings).isGreaterThan(10);
    }

    private static String between(String text, String start, String end) {
        int from = text.indexOf(start);
        assertThat(from).as(start).isNotNegative();
        return text.substring(from, text.indexOf(end, from));
    }
}
