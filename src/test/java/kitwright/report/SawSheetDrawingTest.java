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

    @Test
    void drawsEveryPieceWithItsMarkAndLengthAndTheRemnantHatchedWithItsLength() throws Exception {
        String svg = SawSheetDrawing.draw("s1-p1", "t", REMNANT, 2, 5, 6000, PALETTE);
        Document doc = parse(svg);
        Element root = doc.getDocumentElement();
        assertThat(root.getAttribute("data-pattern")).isEqualTo("s1-p1");
        List<Element> pieces = elements(doc, "g").stream().filter(g -> g.hasAttribute("data-mark")).toList();
        assertThat(pieces).extracting(g -> g.getAttribute("data-mark")).containsExactly("A", "B");
        String text = root.getTextContent();
        assertThat(text).contains("2" + ShopFormat.GROUP + "000", "1" + ShopFormat.GROUP + "500");
        assertThat(text).contains("remnant 2" + ShopFormat.GROUP + "486\u00A0mm");
        assertThat(text).contains("\u00D7\u200912");
        Element offcut = elements(doc, "g").stream().filter(g -> g.hasAttribute("data-offcut")).findFirst()
                .orElseThrow();
        assertThat(offcut.getAttribute("data-offcut")).isEqualTo("remnant");
        assertThat(svg).contains("fill=\"url(#s1-p1-remnant)\"");
        // two kerf slots (between the pieces and before the offcut) and two end trims, with a wedge at each cut
        assertThat(elements(doc, "rect").stream().filter(e -> "kerf".equals(e.getAttribute("class")))).hasSize(2);
        assertThat(elements(doc, "rect").stream().filter(e -> "trim".equals(e.getAttribute("class")))).hasSize(2);
        assertThat(elements(doc, "path").stream().filter(e -> "saw-cut".equals(e.getAttribute("class"))))
                .hasSize(4);
    }

    @Test
    void scrapIsCrossHatchedAndNamedScrap() throws Exception {
        CutPattern scrap = new CutPattern(6000, Origin.MILL, 1,
                List.of(new Cut("A", 2900), new Cut("A", 2900), new Cut("B", 100)), 84, "scrap");
        String svg = SawSheetDrawing.draw("s1-p2", "t", scrap, 2, 5, 6000, PALETTE);
        Document doc = parse(svg);
        assertThat(svg).contains("fill=\"url(#s1-p2-scrap)\"").doesNotContain("url(#s1-p2-remnant)");
        // the scrap pattern crosses two line directions; the remnant one has a single direction
        Element scrapPattern = elements(doc, "pattern").stream()
                .filter(e -> e.getAttribute("id").equals("s1-p2-scrap")).findFirst().orElseThrow();
        assertThat(scrapPattern.getElementsByTagNameNS("*", "line").getLength()).isEqualTo(2);
        // 84 mm in 6000 mm is too narrow for its label: it is called out above the stock piece instead
        assertThat(doc.getDocumentElement().getTextContent()).contains("scrap 84\u00A0mm");
        assertThat(elements(doc, "text").stream().filter(e -> "callout".equals(e.getAttribute("class"))))
                .extracting(Element::getTextContent).contains("B \u00B7 100", "scrap 84\u00A0mm");
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
