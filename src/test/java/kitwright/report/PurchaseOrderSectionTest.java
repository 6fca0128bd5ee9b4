package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.cutting.CutPlan;
import kitwright.model.Kit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The purchase order in report.html (fixture: {@link PurchaseOrderFixtures}, figures worked by hand here): one
 * sheet per supplier in catalog order, then the rack pull; each sheet blank where the buyer writes the order number,
 * delivery date and delivery address; unit prices with what they are per; totals per currency.
 */
class PurchaseOrderSectionTest {
    private static String html(Path dir) throws Exception {
        Kit kit = PurchaseOrderFixtures.kit(dir);
        CutPlan plan = PurchaseOrderFixtures.plan(kit);
        return HtmlReport.render(ReportModel.of(kit, plan, PurchaseOrderFixtures.DATE));
    }

    @Test
    void oneSheetPerSupplierWithBlankOrderNumberDeliveryDateAndAddress(@TempDir Path dir) throws Exception {
        List<String> sheets = PurchaseOrderFixtures.sheets(html(dir));

        assertThat(sheets).hasSize(3);
        assertThat(sheets.get(0)).contains("data-supplier=\"Mill A\"").contains("To: Mill A")
                .doesNotContain("Mill B");
        assertThat(sheets.get(1)).contains("data-supplier=\"Mill B\"").contains("To: Mill B")
                .doesNotContain("Mill A");
        assertThat(sheets.get(2)).startsWith("<article class=\"po-sheet po-rack\"").contains("not an order");
        for (String sheet : sheets.subList(0, 2)) {
            for (String field : List.of("order-number", "delivery-date", "delivery-address")) {
                assertThat(sheet).as(field).containsPattern("<td class=\"po-blank[^\"]*\"[^>]* data-blank=\""
                        + field + "\"></td>");
            }
        }
    }

    @Test
    void eachSheetTotalsEachCurrencyApart(@TempDir Path dir) throws Exception {
        List<String> sheets = PurchaseOrderFixtures.sheets(html(dir));

        // Mill A: CHS 48.3x3.2, 2 x 6 m at 5.10 per m = 2 x 30.60 = 61.20 EUR; CHS 33.7x2.6, 1 x 6 m at 1.20 per kg
        // x 6 m x pi x 31.1 x 2.6 x 7850e-6 kg/m = 1.20 x 11.965 kg = 14.36 GBP. Mill B: 1 x 39.20 EUR.
        assertThat(totals(sheets.get(0))).containsExactly("Total EUR|2|61.20", "Total GBP|1|14.36");
        assertThat(totals(sheets.get(1))).containsExactly("Total EUR|1|39.20");
        assertThat(sheets.get(0)).contains("5.10 per m").contains("1.20 per kg").contains("S355J2H · EN 10219");
        assertThat(sheets.get(1)).contains("39.20 per piece");
        // the rack offcut: 1 x 3200 mm at its rack price of 2.00 per piece, nothing payable
        assertThat(sheets.get(2)).contains("2.00 per piece").doesNotContain("Total EUR");
    }

    @Test
    void theReportSaysWhatAPriceIsPerAndPrintsEachSheetOnAPageOfItsOwn(@TempDir Path dir) throws Exception {
        String html = html(dir);

        assertThat(PurchaseOrderFixtures.sheets(html).get(0)).contains("per piece of the stock length, per metre of"
                + " it\n  (per m) or per kilogram of it (per kg)");
        Matcher print = Pattern.compile("@media print \\{(.*)\\n\\}", Pattern.DOTALL).matcher(html);
        assertThat(print.find()).isTrue();
        assertThat(print.group(1)).contains(".po-sheet { break-before: page;")
                .containsPattern("\\.po-sheet[^{]*\\{[^}]*break-after: page");
    }

    @Test
    void theSummarySaysWhatIsPayableAndAddsNoTwoCurrencies(@TempDir Path dir) throws Exception {
        Kit kit = PurchaseOrderFixtures.kit(dir);
        List<CuttingFigures> figures = PurchaseOrderFixtures.plan(kit).sections().stream()
                .map(s -> CuttingFigures.of(kit, s)).toList();

        // EUR: mill 61.20 + 39.20 = 100.40, rack 2.00, cost 102.40; GBP: mill 14.36
        assertThat(StockCostFigure.of(figures)).isEqualTo(new SummarySection.Figure("Stock cost",
                "several currencies", "payable to suppliers 100.40\u00A0EUR, 14.36\u00A0GBP: see the purchase order"));
        List<CuttingFigures> euro = figures.stream().filter(f -> !f.plan().section().equals("CHS 33.7x2.6")).toList();
        assertThat(StockCostFigure.of(euro)).isEqualTo(new SummarySection.Figure("Stock cost", "102.40\u00A0EUR",
                "payable to suppliers 100.40\u00A0EUR; rack offcuts 2.00 at their rack price"));
    }

    /** The sheet's total rows as "currency|pieces|total". */
    private static List<String> totals(String sheet) {
        Matcher m = Pattern.compile("<tr class=\"po-total\"><th>([^<]*)</th>.*?<th class=\"num\">([^<]*)</th>"
                + ".*?<th class=\"num\">([^<]*)</th></tr>", Pattern.DOTALL).matcher(sheet);
        List<String> rows = new java.util.ArrayList<>();
        while (m.find()) {
            rows.add(m.group(1) + "|" + m.group(2) + "|" + m.group(3));
        }
        return rows;
    }
}
