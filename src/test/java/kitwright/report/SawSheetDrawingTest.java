package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.model.Origin;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class SawSheetDrawingTest {
    private static final MarkPalette PALETTE = MarkPalette.of(List.of("A", "B", ReportFixtures.HOSTILE));

    private static final CutPattern REMNANT = new CutPattern(6000, Origin.MILL, 12,
            List.of(new Cut("A", 2000), new Cut("B", 1500)), 2486, "remnant");

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<Element> elements(Document doc, String name) {
        NodeList list = doc.getElementsByTagNameNS("*", name);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < list.getLength(); i++) {
            out.add((Element) list.item(i));
        }
        return out;
    }

    private static double width(Document doc, String clazz) {
        return elements(doc, "rect").stream().filter(e -> clazz.equals(((Element) e.getParentNode())
                        .getAttribute("class")) || clazz.equals(e.getAttribute("class")))
                .mapToDouble(e -> Double.parseDouble(e.getAttribute("width"))).sum();
    }

    private static List<Element> withClass(Document doc, String name, String clazz) {
        return elements(doc, name).stream().filter(e -> List.of(e.getAttribute("class").split(" ")).contains(clazz))
                .toList();
    }

    @Test
    void drawsEveryPieceWithItsMarkAndLengthAndTheRemnantAsPlainTubeNamedInWords() throws Exception {
        String svg = SawSheetDrawing.draw("s1-p1", "t", REMNANT, 2, 5, 6000, PALETTE);
        Document doc = parse(svg);
        Element root = doc.getDocumentElement();
        assertThat(root.getAttribute("data-pattern")).isEqualTo("s1-p1");
        List<Element> pieces = elements(doc, "g").stream().filter(g -> g.hasAttribute("data-mark")).toList();
        assertThat(pieces).extracting(g -> g.getAttribute("data-mark")).containsExactly("A", "B");
        String text = root.getTextContent();
        assertThat(text).contains("2" + ShopFormat.GROUP + "000", "1" + ShopFormat.GROUP + "500");
        // 6000 - 2*5 - 3500 - 2*2 = 2486 (hand-computed, saw model of src/docs/sources.md)
        assertThat(text).contains("remnant 2" + ShopFormat.GROUP + "486\u00A0mm, to rack");
        Element offcut = elements(doc, "g").stream().filter(g -> g.hasAttribute("data-offcut")).findFirst()
                .orElseThrow();
        assertThat(offcut.getAttribute("data-offcut")).isEqualTo("remnant");
        // the remnant is stock going back: plain (white) tube, no hatching, no pattern fill anywhere
        assertThat(offcut.getElementsByTagNameNS("*", "rect").item(0).getAttributes().getNamedItem("fill")
                .getNodeValue()).isEqualTo("#ffffff");
        assertThat(elements(doc, "pattern")).isEmpty();
        assertThat(svg).doesNotContain("url(");
        // no count badge and no ruler: the count is in the heading in words, the positions are the stops
        assertThat(text).doesNotContain("\u00D7\u200912");
        assertThat(withClass(doc, "text", "ruler")).isEmpty();
        assertThat(withClass(doc, "text", "count")).isEmpty();
        // two kerf-wide slots (between the pieces, before the offcut), two end trims named "trim 5", and four saw
        // lines: the squaring cut at 5, after A at 2005, after B at 3507, the remnant squared at 5995
        assertThat(withClass(doc, "rect", "kerf")).hasSize(2)
                .allSatisfy(k -> assertThat(Double.parseDouble(k.getAttribute("width"))).isGreaterThanOrEqualTo(1.8));
        assertThat(withClass(doc, "rect", "trim")).hasSize(2);
        assertThat(withClass(doc, "text", "callout")).extracting(Element::getTextContent)
                .containsExactly("trim 5", "trim 5");
        assertThat(withClass(doc, "g", "saw-line")).extracting(g -> g.getAttribute("data-stop-mm"))
                .containsExactly("5", "2" + ShopFormat.GROUP + "005", "3" + ShopFormat.GROUP + "507",
                        "5" + ShopFormat.GROUP + "995");
        assertThat(withClass(doc, "text", "stop")).extracting(Element::getTextContent)
                .containsExactly("5", "2" + ShopFormat.GROUP + "005", "3" + ShopFormat.GROUP + "507",
                        "5" + ShopFormat.GROUP + "995");
        assertThat(withClass(doc, "circle", "origin")).hasSize(1);
    }

    @Test
    void scrapIsGreyWithADashedOutlineAndNamedScrapAndNeedsNoSquaringCut() throws Exception {
        CutPattern scrap = new CutPattern(6000, Origin.MILL, 1,
                List.of(new Cut("A", 2900), new Cut("A", 2900), new Cut("B", 100)), 84, "scrap");
        String svg = SawSheetDrawing.draw("s1-p2", "t", scrap, 2, 5, 6000, PALETTE);
        Document doc = parse(svg);
        Element offcut = withClass(doc, "g", "scrap").get(0);
        assertThat(offcut.getAttribute("data-offcut")).isEqualTo("scrap");
        List<Element> rects = elements(doc, "rect").stream().filter(r -> r.getParentNode() == offcut).toList();
        assertThat(rects).extracting(r -> r.getAttribute("fill")).containsExactly(SawSheetDrawing.SCRAP, "none");
        assertThat(rects.get(1).getAttribute("stroke-dasharray")).isNotEmpty();
        assertThat(withClass(doc, "g", "remnant")).isEmpty();
        // 84 mm in 6000 mm is too narrow for its label: it is called out above the stock piece instead
        assertThat(doc.getDocumentElement().getTextContent()).contains("scrap 84\u00A0mm");
        assertThat(withClass(doc, "text", "callout")).extracting(Element::getTextContent)
                .contains("B \u00B7 100", "scrap 84\u00A0mm", "trim 5");
        // squaring cut, two kerfs between the pieces, one before the scrap; none at the far trim of scrap
        assertThat(withClass(doc, "g", "saw-line")).extracting(g -> g.getAttribute("data-stop-mm"))
                .containsExactly("5", "2" + ShopFormat.GROUP + "905", "5" + ShopFormat.GROUP + "807",
                        "5" + ShopFormat.GROUP + "909");
    }

    @Test
    void theTubeIsDrawnAsATubeWithItsBoreAndAnEndView() throws Exception {
        Document doc = parse(SawSheetDrawing.draw("s1-p3", "t", REMNANT, 2, 5, 6000, PALETTE,
                new SawSheetDrawing.Tube(48.3, 3.2)));
        Element end = withClass(doc, "g", "end-view").get(0);
        assertThat(end.getAttribute("data-outer-diameter-mm")).isEqualTo("48.3");
        assertThat(end.getAttribute("data-wall-mm")).isEqualTo("3.2");
        assertThat(end.getElementsByTagNameNS("*", "circle").getLength()).isEqualTo(2);
        assertThat(end.getTextContent()).contains("\u00D8\u200948.3 \u00D7 3.2");
        // the bore as two hidden (dashed) lines along the whole stock piece
        assertThat(withClass(doc, "line", "bore")).hasSize(2)
                .allSatisfy(l -> assertThat(l.getAttribute("stroke-dasharray")).isNotEmpty());
        // without the section's size, no end view and no bore
        Document unknown = parse(SawSheetDrawing.draw("s1-p4", "t", REMNANT, 2, 5, 6000, PALETTE));
        assertThat(withClass(unknown, "g", "end-view")).isEmpty();
        assertThat(withClass(unknown, "line", "bore")).isEmpty();
    }

    @Test
    void stopsTooCloseForTwoValuesKeepTheLastWrittenAndAllAsLines() throws Exception {
        // fractional kerf and trim; pieces of 40 mm at 6000 mm across 802 units are 5.3 units apart, less than a
        // value's height, so only some values are written; every line is still drawn with its stop
        List<Cut> cuts = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            cuts.add(new Cut("A", 40));
        }
        CutPattern narrow = new CutPattern(6000, Origin.MILL, 1, cuts, 5143.6, "remnant");
        Document doc = parse(SawSheetDrawing.draw("n-1", "t", narrow, 2.5, 3.2, 6000, PALETTE));
        List<Element> lines = withClass(doc, "g", "saw-line");
        // 6000 - 2*3.2 - 800 - 20*2.5 = 5143.6 is the remnant: 1 squaring cut, 20 kerfs, 1 far trim line
        assertThat(lines).hasSize(22);
        assertThat(lines.get(1).getAttribute("data-stop-mm")).isEqualTo("43.2");
        assertThat(lines.get(21).getAttribute("data-stop-mm")).isEqualTo("5" + ShopFormat.GROUP + "996.8");
        List<Element> written = withClass(doc, "text", "stop");
        assertThat(written.size()).isBetween(2, 21);
        assertThat(written.get(written.size() - 1).getAttribute("data-line")).isEqualTo("22");
        assertThat(written.get(0).getAttribute("data-line")).isEqualTo("1");
    }

    @Test
    void piecesAreDrawnToOneScalePerSection() throws Exception {
        CutPattern shortStock = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 5980)), 0, "scrap");
        CutPattern longStock = new CutPattern(12000, Origin.MILL, 1, List.of(new Cut("A", 5980)), 5996, "remnant");
        Document a = parse(SawSheetDrawing.draw("a", "t", shortStock, 2, 5, 12000, PALETTE));
        Document b = parse(SawSheetDrawing.draw("b", "t", longStock, 2, 5, 12000, PALETTE));
        assertThat(width(a, "piece")).isCloseTo(width(b, "piece"), org.assertj.core.data.Offset.offset(0.02));
        double span = SawSheetDrawing.WIDTH - SawSheetDrawing.LEFT - SawSheetDrawing.RIGHT;
        assertThat(width(b, "piece")).isCloseTo(span * 5980 / 12000, org.assertj.core.data.Offset.offset(0.02));
    }

    @Test
    void aHostileMarkIsTextNotMarkup() throws Exception {
        CutPattern p = new CutPattern(6000, Origin.MILL, 2, List.of(new Cut(ReportFixtures.HOSTILE, 2000)), 3979,
                "remnant");
        String svg = SawSheetDrawing.draw("x-1", "title " + ReportFixtures.HOSTILE, p, 2, 5, 6000, PALETTE);
        assertThat(svg).doesNotContain(ReportFixtures.HOSTILE).contains("&lt;b&gt;&amp;&quot;");
        Document doc = parse(svg);
        assertThat(elements(doc, "b")).isEmpty();
        assertThat(elements(doc, "g").stream().filter(g -> g.hasAttribute("data-mark")))
                .extracting(g -> g.getAttribute("data-mark")).containsExactly(ReportFixtures.HOSTILE);
    }

    @Test
    void theSameInputGivesTheSameBytes() {
        assertThat(SawSheetDrawing.draw("s1-p1", "t", REMNANT, 2, 5, 12000, PALETTE))
                .isEqualTo(SawSheetDrawing.draw("s1-p1", "t", REMNANT, 2, 5, 12000, PALETTE));
    }
}
