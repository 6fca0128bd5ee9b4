package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;

/**
 * The report's purchase order as a buyer forwards it: one sheet per supplier the tube catalog names, each with
 * blank fields for the order number, delivery date and delivery address, unit prices on their catalog basis and
 * totals per currency; the rack offcuts on a sheet of their own that is not an order. Two suppliers, one of them
 * with stock in two currencies, read from files as a user gives them. Masses by M = pi (D - T) T rho 1e-6 kg/m
 * (EN 10219-2) with rho = 7850 kg/m3 (EN 1993-1-1 3.2.6); every other figure worked by hand beside it.
 */
final class PurchaseOrderFixtures {
    static final String STOCK = """
            section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,price_basis,currency,grade,standard,supplier
            CHS 48.3x3.2,steel,48.3,3.2,6000,5.10,,mill,m,EUR,S355J2H,EN 10219,Mill A
            CHS 48.3x3.2,steel,48.3,3.2,3200,2.00,3,rack,,EUR,,,
            CHS 33.7x2.6,steel,33.7,2.6,6000,1.20,,mill,kg,GBP,S235JRH,EN 10219,Mill A
            CHS 60.3x3.2,steel,60.3,3.2,6000,39.20,,mill,piece,EUR,S355J2H,EN 10219,Mill B
            """;
    static final LocalDate DATE = LocalDate.of(2026, 12, 1);

    private PurchaseOrderFixtures() {
    }

    /** The kit: five bars of 2900 mm on CHS 48.3x3.2, two each on CHS 33.7x2.6 and CHS 60.3x3.2. */
    static Kit kit(Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,2900,5\nB,CHS 33.7x2.6,2900,2\n"
                + "C,CHS 60.3x3.2,2900,2\n");
        KitFiles.write(dir, "stock.csv", STOCK);
        KitFiles.write(dir, "kit.json", "{\"name\": \"two-mills\", \"kerfMm\": 2, \"trimMm\": 5, \"minRemnantMm\": 500}");
        return KitReader.read(dir);
    }

    /**
     * Kerf 2, trim 5 (each end): offcut = L - 10 - lengths - n x 2, a remnant from 500 mm. Two 6 m pieces and one
     * rack offcut of 48.3x3.2; one 6 m piece each of 33.7x2.6 and 60.3x3.2.
     */
    static CutPlan plan(Kit kit) {
        CutPattern two = new CutPattern(6000, Origin.MILL, 2, List.of(new Cut("A", 2900), new Cut("A", 2900)),
                186, "scrap");
        CutPattern rack = new CutPattern(3200, Origin.RACK, 1, List.of(new Cut("A", 2900)), 288, "scrap");
        CutPattern b = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("B", 2900), new Cut("B", 2900)),
                186, "scrap");
        CutPattern c = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("C", 2900), new Cut("C", 2900)),
                186, "scrap");
        double b6m = kit.catalog().stockFor("CHS 33.7x2.6").get(0).price();
        CutPlan plan = new CutPlan(List.of(
                new SectionCutPlan("CHS 48.3x3.2", 2, 5, 500, "cost", Status.OPTIMAL, null, 63.2, 63.2, 0.0, 3,
                        List.of(two, rack), List.of()),
                new SectionCutPlan("CHS 33.7x2.6", 2, 5, 500, "cost", Status.OPTIMAL, null, b6m, b6m, 0.0, 1,
                        List.of(b), List.of()),
                new SectionCutPlan("CHS 60.3x3.2", 2, 5, 500, "cost", Status.OPTIMAL, null, 39.2, 39.2, 0.0, 1,
                        List.of(c), List.of())));
        CutPlanValidator.validate(kit, plan);
        return plan;
    }

    /** The purchase order's sheets in the report, in order: each {@code <article class="po-sheet...">} whole. */
    static List<String> sheets(String html) {
        Matcher m = Pattern.compile("<article class=\"po-sheet[^\"]*\"[^>]*>.*?</article>", Pattern.DOTALL)
                .matcher(html);
        List<String> sheets = new ArrayList<>();
        while (m.find()) {
            sheets.add(m.group());
        }
        return sheets;
    }
}
