package kitwright.report.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import kitwright.validate.CsvOutput;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * order.csv and rack-pull.csv of a catalog that quotes per metre and per kilogram, with grade, supplier and
 * currency, read from files as a user gives them. Masses by the EN 10219-2 formula M = pi (D - T) T rho 1e-6 kg/m
 * with rho = 7850 kg/m3 (EN 1993-1-1 3.2.6); every other figure worked by hand beside it.
 */
class OrderTermsTest {
    /** 1.20 per kg x 6 m x pi x 31.1 x 2.6 x 7850e-6 kg/m. */
    private static final double PER_KG_PIECE = 1.2 * 6 * Math.PI * 31.1 * 2.6 * 7850e-6;
    private static final String STOCK = """
            section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,price_basis,currency,grade,supplier
            CHS 48.3x3.2,steel,48.3,3.2,6000,5.1,,mill,m,EUR,S355J2H,Mill A
            CHS 48.3x3.2,steel,48.3,3.2,12000,4.5,,mill,m,EUR,S355J2H,Mill A
            CHS 48.3x3.2,steel,48.3,3.2,3200,2,3,rack,,EUR,,
            CHS 33.7x2.6,steel,33.7,2.6,6000,1.2,,mill,kg,GBP,S235JRH,Mill B
            """;

    @Test
    void orderCarriesBasisCurrencyGradeAndSupplierWithFixedDecimalsPerColumn(@TempDir Path dir) throws Exception {
        Kit kit = kit(dir);
        CutPlan plan = plan();
        CutPlanValidator.validate(kit, plan);

        // 48.3x3.2: 3.559148 kg/m (EN 10219-2 tables: 3.56); 1 x 6 m = 21.355 kg, 2 x 12 m = 85.420 kg. 33.7x2.6: 1.994116 kg/m x 6 m = 11.965.
        // Totals: 5.10 x 6 = 30.60; 4.50 x 12 x 2 = 108.00; 1.20 x 11.96470 kg = 14.36 (GBP).
        assertThat(CsvOutput.lines(OrderCsv.format(kit, plan)).stream()).containsExactly(
                "section,material,outer_diameter_mm,wall_mm,stock_length_mm,pieces,mass_kg,unit_price,price_basis,"
                        + "currency,total,grade,supplier",
                "CHS 48.3x3.2,steel,48.3,3.2,6000,1,21.355,5.10,m,EUR,30.60,S355J2H,Mill A",
                "CHS 48.3x3.2,steel,48.3,3.2,12000,2,85.420,4.50,m,EUR,108.00,S355J2H,Mill A",
                "CHS 33.7x2.6,steel,33.7,2.6,6000,1,11.965,1.20,kg,GBP,14.36,S235JRH,Mill B");
        // 3200 mm x 3.559148 kg/m = 11.389 kg; the rack price is per piece.
        assertThat(CsvOutput.lines(RackPullCsv.format(kit, plan)).stream()).containsExactly(
                "section,material,outer_diameter_mm,wall_mm,length_mm,pieces,mass_kg,unit_price,total",
                "CHS 48.3x3.2,steel,48.3,3.2,3200,1,11.389,2.00,2.00");
        assertThat(KitMetricsCalculator.stockCost(kit, plan)).as("EUR and GBP cannot be added into one cost")
                .isNull();
    }

    @Test
    void rackAfterRowsGoBackIntoTheCatalogWithTheirSectionsCurrency(@TempDir Path dir) throws Exception {
        Kit kit = kit(dir);
        CutPlan plan = plan();
        CutPlanValidator.validate(kit, plan);

        String rackAfter = RackAfterCsv.format(kit, plan);

        // 3 rack offcuts of 3200 less the 1 taken; 2 remnants of 3284 from the 12 m pieces
        assertThat(CsvOutput.lines(rackAfter).stream()).containsExactly(
                "section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,weld_bead_mm,"
                        + "od_tolerance_mm,wall_tolerance_pct,currency",
                "CHS 48.3x3.2,steel,48.3,3.2,3200,2,2,rack,,,,EUR",
                "CHS 48.3x3.2,steel,48.3,3.2,3284,,2,rack,,,,EUR");
        // the next job's catalog: the mill rows as they were, the rack rows as rack-after.csv gives them, column by
        // column under the catalog's header; it reads without a currency conflict
        StringBuilder next = new StringBuilder(STOCK.lines().filter(l -> !l.contains(",rack,"))
                .map(l -> l + "\n").collect(java.util.stream.Collectors.joining()));
        List<String> header = List.of(STOCK.lines().findFirst().orElseThrow().split(","));
        try (CSVParser rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(rackAfter.substring(1)))) {
            for (CSVRecord row : rows) {
                next.append(header.stream().map(c -> row.isMapped(c) ? row.get(c) : "")
                        .collect(java.util.stream.Collectors.joining(","))).append('\n');
            }
        }
        Path nextJob = KitFiles.kit(dir.resolve("next"), "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,2900,1\n");
        KitFiles.write(nextJob, "stock.csv", next.toString());
        assertThat(KitReader.read(nextJob).catalog().stockFor("CHS 48.3x3.2")).hasSize(4);
    }

    @Test
    void thePayableCostIsTheSumOfTheOrdersLineTotalsInCents(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,2900,8\n");
        KitFiles.write(dir, "stock.csv", """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,price_basis
                CHS 48.3x3.2,steel,48.3,3.2,6000,1.05,,mill,kg
                CHS 48.3x3.2,steel,48.3,3.2,12000,1.05,,mill,kg
                """);
        KitFiles.write(dir, "kit.json", "{\"kerfMm\": 2, \"trimMm\": 5, \"minRemnantMm\": 500}");
        Kit kit = KitReader.read(dir);
        // 1.05 per kg x 3.559148 kg/m: 6 m = 22.4226 a piece, 12 m = 44.8453; kerf 2, trim 5: 12000 - 10 - 4 x 2900
        // - 4 x 2 = 382 scrap
        double six = 1.05 * 6 * Math.PI * 45.1 * 3.2 * 7850e-6;
        CutPlan plan = new CutPlan(List.of(new SectionCutPlan("CHS 48.3x3.2", 2, 5, 500, "cost", Status.OPTIMAL,
                null, 4 * six, 4 * six, 0.0, 3, List.of(
                        new CutPattern(6000, Origin.MILL, 2, List.of(new Cut("A", 2900), new Cut("A", 2900)), 186,
                                "scrap"),
                        new CutPattern(12000, Origin.MILL, 1, List.of(new Cut("A", 2900), new Cut("A", 2900),
                                new Cut("A", 2900), new Cut("A", 2900)), 382, "scrap")),
                List.of())));
        CutPlanValidator.validate(kit, plan);

        // each line 2 x 22.4226 = 1 x 44.8453 = 44.8453, written 44.85: the order adds up to 89.70, not the 89.69
        // that the unrounded sum 89.6905 rounds to
        assertThat(CsvOutput.lines(OrderCsv.format(kit, plan)).stream()).extracting(l -> l.substring(l.lastIndexOf(',') + 1))
                .containsExactly("total", "44.85", "44.85");
        assertThat(4 * six).isCloseTo(89.6905, within(0.0001));
        assertThat(KitMetricsCalculator.payableCost(kit, plan)).isEqualTo(89.70);
        assertThat(KitMetricsCalculator.stockCost(kit, plan)).as("the objective stays unrounded")
                .isCloseTo(4 * six, within(1e-9));
    }

    @Test
    void rackPullWritesEveryRowOfAColumnToTheSameDecimals(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1500,2\n");
        KitFiles.write(dir, "stock.csv", """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin
                CHS 48.3x3.2,steel,48.3,3.2,6000,31.00,,mill
                CHS 48.3x3.2,steel,48.3,3.2,3200,2,1,rack
                CHS 48.3x3.2,steel,48.3,3.2,1950.5,1.5,1,rack
                """);
        KitFiles.write(dir, "kit.json", "{\"kerfMm\": 2, \"trimMm\": 5, \"minRemnantMm\": 500}");
        Kit kit = KitReader.read(dir);
        // kerf 2, trim 5: 3200 - 10 - 1500 - 2 = 1688 (a remnant), 1950.5 - 10 - 1500 - 2 = 438.5 (scrap)
        CutPlan plan = new CutPlan(List.of(new SectionCutPlan("CHS 48.3x3.2", 2, 5, 500, "cost", Status.OPTIMAL,
                null, 3.5, 3.5, 0.0, 2, List.of(
                        new CutPattern(3200, Origin.RACK, 1, List.of(new Cut("A", 1500)), 1688, "remnant"),
                        new CutPattern(1950.5, Origin.RACK, 1, List.of(new Cut("A", 1500)), 438.5, "scrap")),
                List.of())));
        CutPlanValidator.validate(kit, plan);

        // 3.559148 kg/m x 3.2 m = 11.389 kg, x 1.9505 m = 6.942 kg; lengths to the 0.1 mm the finest one needs
        assertThat(CsvOutput.lines(RackPullCsv.format(kit, plan)).stream()).containsExactly(
                "section,material,outer_diameter_mm,wall_mm,length_mm,pieces,mass_kg,unit_price,total",
                "CHS 48.3x3.2,steel,48.3,3.2,3200.0,1,11.389,2.00,2.00",
                "CHS 48.3x3.2,steel,48.3,3.2,1950.5,1,6.942,1.50,1.50");
        assertThat(CsvOutput.lines(OrderCsv.format(kit, plan)).stream()).as("nothing bought").hasSize(1);
    }

    @Test
    void decimalsFollowTheFinestValueOfTheColumn() {
        List<String> header = List.of("length_mm", "mass_kg", "total");
        List<List<Object>> rows = List.of(List.of(6000.0, 1.5, 845.7), List.of(2345.25, 2.0, 221.13),
                List.of(12000.0, 1.23456, 1.0));
        assertThat(CsvOutput.lines(CsvText.of(header, ColumnFormat.apply(header, java.util.Set.of("total"), rows))).stream())
                .containsExactly("length_mm,mass_kg,total", "6000.00,1.500,845.70", "2345.25,2.000,221.13",
                        "12000.00,1.235,1.00");
    }

    private static Kit kit(Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,2900,9\nB,CHS 33.7x2.6,2900,2\n");
        KitFiles.write(dir, "stock.csv", STOCK);
        KitFiles.write(dir, "kit.json", "{\"name\": \"terms\", \"kerfMm\": 2, \"trimMm\": 5, \"minRemnantMm\": 500}");
        return KitReader.read(dir);
    }

    /** Kerf 2, trim 5: offcut = L - 10 - lengths - n x 2, a remnant from 500 mm. */
    private static CutPlan plan() {
        CutPattern six = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 2900), new Cut("A", 2900)),
                186, "scrap");
        CutPattern twelve = new CutPattern(12000, Origin.MILL, 2, List.of(new Cut("A", 2900), new Cut("A", 2900),
                new Cut("A", 2900)), 3284, "remnant");
        CutPattern rack = new CutPattern(3200, Origin.RACK, 1, List.of(new Cut("A", 2900)), 288, "scrap");
        CutPattern small = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("B", 2900), new Cut("B", 2900)),
                186, "scrap");
        return new CutPlan(List.of(
                new SectionCutPlan("CHS 48.3x3.2", 2, 5, 500, "cost", Status.OPTIMAL, null, 140.6, 140.6, 0.0, 4,
                        List.of(six, twelve, rack), List.of()),
                new SectionCutPlan("CHS 33.7x2.6", 2, 5, 500, "cost", Status.OPTIMAL, null, PER_KG_PIECE, PER_KG_PIECE, 0.0, 1,
                        List.of(small), List.of())));
    }
}
