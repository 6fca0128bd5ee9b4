package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.validate.CutPlanValidator;
import kitwright.validate.PlanValidator;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The saw sheets' numbers re-derived from the plan by this test, by the saw model of src/docs/sources.md
 * (Cutting, "Saw model": trim off each end including its own cut, one kerf between pieces and one before the
 * offcut; offcut = stock − 2·trim − Σ lengths − n·kerf), and compared with what the drawing and the page print:
 * the stop of the line after piece i is trim + Σ(j ≤ i) length_j + (i − 1)·kerf (the kerf falls on the far side
 * of each line), the squaring cut's stop is the trim, a remnant's far trim line is stock − trim; piece lengths
 * and the offcut's length as the plan gives them; the count in words.
 */
class SawSheetNumbersTest {

    @Test
    void theCinema12SawSheetsPrintTheStopsPiecesAndOffcutsOfThePlan() throws Exception {
        PlanResult result = Planner.run(KitReader.read(Path.of("sample-kits", "cinema-12")), Planner.Options.DEFAULT,
                PlanProgress.NONE);
        PlanValidator.validate(result);
        String html = PlanFiles.of(result, LocalDate.of(2026, 12, 1)).get(PlanFiles.REPORT_HTML);
        assertThat(checkEveryPattern(result.cutting(), html)).isGreaterThan(10);
    }

    @Test
    void theTestKitsSawSheetsToo() throws Exception {
        Kit kit = ReportFixtures.sampleKit();
        CutPlan plan = ReportFixtures.samplePlan(kit);
        CutPlanValidator.validate(kit, plan);
        String html = HtmlReport.render(ReportModel.of(kit, plan, LocalDate.of(2025, 3, 14)));
        assertThat(checkEveryPattern(plan, html)).isPositive();
    }

    /** Checks every distinct pattern of every section; returns how many saw lines were checked. */
    private static int checkEveryPattern(CutPlan plan, String html) throws Exception {
        int lines = 0;
        for (int s = 0; s < plan.sections().size(); s++) {
            SectionCutPlan section = plan.sections().get(s);
            List<CutPattern> patterns = SawSheetSection.distinct(section.patterns());
            for (int p = 0; p < patterns.size(); p++) {
                String id = "s" + (s + 1) + "-p" + (p + 1);
                lines += check(id, patterns.get(p), section.kerfMm(), section.trimMm(), html);
            }
        }
        return lines;
    }

    private static int check(String id, CutPattern pattern, double kerfMm, double trimMm, String html)
            throws Exception {
        List<BigDecimal> stops = expectedStops(pattern, kerfMm, trimMm);
        String figure = between(html, "<figure class=\"pattern\" id=\"" + id + "\"", "</figure>");
        Document svg = parse(between(figure, "<svg ", "</svg>"));

        // every saw line of the drawing, in saw order, at the stop the saw model gives
        List<Element> sawLines = elements(svg, "g", "saw-line");
        assertThat(sawLines).extracting(e -> e.getAttribute("data-stop-mm")).as(id + " saw lines")
                .containsExactlyElementsOf(stops.stream().map(SawSheetNumbersTest::mm).toList());
        // the stops written under the tube: each the stop of its line, the last line always written
        List<Element> written = elements(svg, "text", "stop");
        assertThat(written).as(id + " stops written").isNotEmpty();
        for (Element t : written) {
            int line = Integer.parseInt(t.getAttribute("data-line"));
            assertThat(t.getTextContent()).as(id + " stop of line " + line).isEqualTo(mm(stops.get(line - 1)));
        }
        assertThat(written.get(written.size() - 1).getAttribute("data-line")).isEqualTo(String.valueOf(stops.size()));
        // the list of stops beside the drawing: all of them, in saw order
        assertThat(cells(figure, "<td class=\"num stop-mm\">([^<]*)</td>")).as(id + " list of stops")
                .containsExactlyElementsOf(stops.stream().map(SawSheetNumbersTest::mm).toList());

        // pieces: marks and lengths as the plan cuts them, in saw order
        assertThat(elements(svg, "g", "piece")).extracting(e -> e.getAttribute("data-mark") + " "
                + ((Element) e.getElementsByTagNameNS("*", "rect").item(0)).getAttribute("data-length-mm"))
                .as(id + " pieces")
                .containsExactlyElementsOf(pattern.cuts().stream().map(c -> c.mark() + " " + mm(exact(c.lengthMm())))
                        .toList());
        // the offcut: its length by the saw model, as the plan states it, named in words
        BigDecimal offcut = exact(pattern.stockLengthMm()).subtract(exact(trimMm).multiply(BigDecimal.valueOf(2)))
                .subtract(pattern.cuts().stream().map(c -> exact(c.lengthMm())).reduce(BigDecimal.ZERO, BigDecimal::add))
                .subtract(exact(kerfMm).multiply(BigDecimal.valueOf(pattern.cuts().size())));
        List<Element> offcuts = elements(svg, "g", pattern.offcutKind());
        if (pattern.offcutMm() > 0) {
            assertThat(offcut.compareTo(exact(pattern.offcutMm()))).as(id + " offcut by the saw model").isZero();
            assertThat(offcuts).hasSize(1);
            assertThat(offcuts.get(0).getAttribute("data-length-mm")).isEqualTo(mm(offcut));
            String words = pattern.offcutKind() + " " + mm(offcut) + "\u00A0mm"
                    + ("remnant".equals(pattern.offcutKind()) ? ", to rack" : "");
            assertThat(svg.getDocumentElement().getTextContent()).as(id).contains(words);
        } else {
            assertThat(offcuts).isEmpty();
        }
        // how many stock pieces, in words in the heading
        assertThat(figure).contains("<span class=\"pattern-count\">cut " + ShopFormat.count(pattern.count())
                + " stock piece" + (pattern.count() == 1 ? "" : "s") + " like this</span>");
        return stops.size();
    }

    /** The stops by the saw model, in exact decimals (test's own arithmetic, not the report's). */
    private static List<BigDecimal> expectedStops(CutPattern pattern, double kerfMm, double trimMm) {
        BigDecimal trim = exact(trimMm);
        BigDecimal kerf = exact(kerfMm);
        List<BigDecimal> stops = new ArrayList<>();
        if (trimMm > 0) {
            stops.add(trim);
        }
        BigDecimal lengths = BigDecimal.ZERO;
        List<Cut> cuts = pattern.cuts();
        for (int i = 0; i < cuts.size(); i++) {
            lengths = lengths.add(exact(cuts.get(i).lengthMm()));
            boolean last = i == cuts.size() - 1;
            if (!last || pattern.offcutMm() > 0 || trimMm > 0) {
                stops.add(trim.add(lengths).add(kerf.multiply(BigDecimal.valueOf(i))));
            }
        }
        if (pattern.offcutMm() > 0 && "remnant".equals(pattern.offcutKind()) && trimMm > 0) {
            stops.add(exact(pattern.stockLengthMm()).subtract(trim));
        }
        return stops;
    }

    private static BigDecimal exact(double mm) {
        return new BigDecimal(Double.toString(mm));
    }

    private static String mm(BigDecimal value) {
        return ShopFormat.sawMm(value.doubleValue());
    }

    private static String between(String text, String start, String end) {
        int from = text.indexOf(start);
        assertThat(from).as(start).isNotNegative();
        int to = text.indexOf(end, from);
        assertThat(to).as(end + " after " + start).isPositive();
        return text.substring(from, to + end.length());
    }

    private static List<String> cells(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(html);
        List<String> out = new ArrayList<>();
        while (m.find()) {
            out.add(m.group(1));
        }
        return out;
    }

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    /** Elements of that name whose class list holds {@code clazz}. */
    private static List<Element> elements(Document doc, String name, String clazz) {
        NodeList list = doc.getElementsByTagNameNS("*", name);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < list.getLength(); i++) {
            Element e = (Element) list.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(clazz)) {
                out.add(e);
            }
        }
        return out;
    }
}
