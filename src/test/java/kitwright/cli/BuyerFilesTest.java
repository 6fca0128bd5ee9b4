package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.StockLength;
import kitwright.report.PlanFiles;
import kitwright.report.SavedPlanReport;
import kitwright.validate.CutPlanValidator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the buyer receives from {@code plan} and {@code cut --out}: {@code order.csv} holds only the stock bought
 * from the mill, so its {@code total} column adds up to plan.json's {@code payableCost}, and the rack offcuts to
 * take are in {@code rack-pull.csv}, with the columns the order specification gives. The sums are checked against
 * the validated plan's patterns priced from the tube catalog directly, not against kitwright's own figures only.
 */
class BuyerFilesTest {
    /** The columns as the specification writes them (not the production constants). */
    private static final List<String> ORDER_COLUMNS = List.of("section", "material", "outer_diameter_mm", "wall_mm",
            "stock_length_mm", "pieces", "mass_kg", "unit_price", "price_basis", "currency", "total");
    private static final List<String> RACK_PULL_COLUMNS = List.of("section", "material", "outer_diameter_mm",
            "wall_mm", "length_mm", "pieces", "mass_kg", "unit_price", "total");
    /** cinema-6 cuts rack offcuts of four sections besides the mill stock (its plan, stock-catalogs/steel-chs.csv). */
    private static final Path KIT = Path.of("sample-kits", "cinema-6");

    @Test
    void planWritesAnOrderThatAddsUpToThePayableCostAndTheRackPullApart(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("plan");
        CliRun run = CliRun.of("plan", KIT.toString(), "--out", out.toString(), "--date", "2026-12-01");
        assertThat(run.exitCode()).as(run.err()).isZero();
        WrittenPlans.planFolder(KIT, out, LocalDate.of(2026, 12, 1));
        Kit kit = KitReader.read(KIT);
        CutPlan plan = SavedPlanReport.readCutting(out.resolve(PlanFiles.PLAN_JSON));
        CutPlanValidator.validate(kit, plan);
        JsonNode figures = PrettyJson.mapper().readTree(out.resolve(PlanFiles.PLAN_JSON).toFile()).get("figures");

        double payable = figures.get("payableCost").asDouble();
        double cost = figures.get("cost").asDouble();
        checkFiles(kit, plan, out);
        assertThat(payable).as("payableCost: the mill stock at its catalog price")
                .isCloseTo(priced(kit, plan, Origin.MILL), within(0.005));
        assertThat(cost).as("cost: mill and rack").isCloseTo(payable + priced(kit, plan, Origin.RACK), within(0.005));
        assertThat(sum(read(out.resolve("order.csv"), ORDER_COLUMNS), "total")).isCloseTo(payable, within(0.005));
        assertThat(cost - payable).as("the rack offcuts this plan takes are priced").isPositive();
    }

    @Test
    void cutWritesTheSameTwoFilesIntoItsFolder(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("cut");
        CliRun run = CliRun.of("cut", KIT.toString(), "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        Kit kit = KitReader.read(KIT);
        CutPlan plan = PrettyJson.mapper().readValue(Files.readString(out.resolve("cutting.json")), CutPlan.class);
        CutPlanValidator.validate(kit, plan);

        checkFiles(kit, plan, out);
        double payable = sum(read(out.resolve("order.csv"), ORDER_COLUMNS), "total");
        assertThat(payable).isCloseTo(priced(kit, plan, Origin.MILL), within(0.005));
        assertThat(run.out()).contains(String.format(java.util.Locale.ROOT, ", payable to suppliers %.2f (order.csv)",
                payable));
    }

    /** Both files: exact headers; order rows are mill rows, rack-pull rows rack rows, pieces as the plan cuts. */
    private static void checkFiles(Kit kit, CutPlan plan, Path out) throws Exception {
        List<CSVRecord> order = read(out.resolve("order.csv"), ORDER_COLUMNS);
        List<CSVRecord> rack = read(out.resolve("rack-pull.csv"), RACK_PULL_COLUMNS);
        for (CSVRecord row : order) {
            assertThat(catalogRow(kit, row.get("section"), row.get("stock_length_mm")).origin()).as(row.toString())
                    .isEqualTo(Origin.MILL);
        }
        for (CSVRecord row : rack) {
            assertThat(catalogRow(kit, row.get("section"), row.get("length_mm")).origin()).as(row.toString())
                    .isEqualTo(Origin.RACK);
        }
        assertThat(rack).as("cinema-6 takes rack offcuts").isNotEmpty();
        assertThat(sum(order, "pieces")).isEqualTo((double) pieces(plan, Origin.MILL));
        assertThat(sum(rack, "pieces")).isEqualTo((double) pieces(plan, Origin.RACK));
        assertThat(sum(rack, "total")).isCloseTo(priced(kit, plan, Origin.RACK), within(0.005));
    }

    private static List<CSVRecord> read(Path file, List<String> header) throws Exception {
        String text = Files.readString(file);
        assertThat(kitwright.validate.CsvOutput.lines(text).get(0)).as(file.getFileName().toString())
                .isEqualTo(String.join(",", header));
        return kitwright.validate.CsvOutput.records(text);
    }

    private static double sum(List<CSVRecord> rows, String column) {
        return rows.stream().mapToDouble(r -> Double.parseDouble(r.get(column))).sum();
    }

    private static StockLength catalogRow(Kit kit, String section, String lengthMm) {
        double length = Double.parseDouble(lengthMm);
        List<StockLength> rows = kit.catalog().stockFor(section).stream().filter(s -> s.lengthMm() == length)
                .toList();
        assertThat(rows).as(section + " " + lengthMm + " mm in the catalog").hasSize(1);
        return rows.get(0);
    }

    private static int pieces(CutPlan plan, Origin origin) {
        return plan.sections().stream().flatMap(s -> s.patterns().stream()).filter(p -> p.origin() == origin)
                .mapToInt(CutPattern::count).sum();
    }

    /** The plan's stock of one origin at the catalog's price per piece (cinema-6 prices per piece). */
    private static double priced(Kit kit, CutPlan plan, Origin origin) {
        double total = 0;
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern p : section.patterns()) {
                if (p.origin() == origin) {
                    StockLength row = kit.catalog().stockFor(section.section()).stream()
                            .filter(s -> s.origin() == origin && s.lengthMm() == p.stockLengthMm()).findFirst()
                            .orElseThrow();
                    total += p.count() * row.terms().quotedPrice();
                }
            }
        }
        return total;
    }
}
