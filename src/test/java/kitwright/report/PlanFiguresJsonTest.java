package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.spares.SparesKits;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.CutPlanValidator;
import kitwright.validate.LoadPlanValidator;
import kitwright.validate.NestPlanValidator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * plan.json's "spares" and "figures" from the whole chain on a small hand-made kit (invented data), against hand
 * computation: the Binomial figures against Apache Commons Math 3 (an independent reference library; the planner
 * uses Commons Statistics), the masses and embodied carbon from the tube catalog and materials.csv read here with
 * Commons CSV, the reuse ratio from the structures.csv written here.
 */
class PlanFiguresJsonTest {
    private static final LocalDate DATE = LocalDate.of(2025, 6, 30);
    /** kit.json spares policy of the test kit: p = 0.05 per cycle, c = 4 cycles, kit level 0.9. */
    private static final double P = 0.05;
    private static final int CYCLES = 4;
    private static final double LEVEL = 0.9;

    @TempDir
    static Path tmp;

    private static Kit kit;
    private static PlanResult result;
    private static JsonNode json;
    private static Kit plainKit;
    private static PlanResult plainResult;

    /** The kit of {@link SparesKits#write}: A 10 and B 6 bars on CHS 48.3x3.2, C 12 (10 needed) on CHS 33.7x2.6. */
    @BeforeAll
    static void planBothKits() throws Exception {
        kit = KitReader.read(SparesKits.write(tmp, "with-policy", "{\"lossRatePerCycle\": " + P
                + ", \"cycles\": " + CYCLES
                + ", \"serviceLevel\": " + LEVEL + "}"));
        result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        validate(kit, result);
        json = PrettyJson.mapper().readTree(PlanFiles.of(result, DATE).get(PlanFiles.PLAN_JSON));
        plainKit = KitReader.read(SparesKits.write(tmp, "no-policy", null));
        plainResult = Planner.run(plainKit, Planner.Options.DEFAULT, PlanProgress.NONE);
        validate(plainKit, plainResult);
    }

    /** Every stage's plan through the validators before any other assertion. */
    private static void validate(Kit k, PlanResult r) {
        CutPlanValidator.validate(k, r.cutting());
        NestPlanValidator.validate(k, r.cutting(), r.nesting().plan());
        CratePlanValidator.check(r.crates(), r.nesting().plan().bundles(), k.joints(), k.crates(),
                k.settings().jointBox());
        LoadPlanValidator.check(r.loads(), r.crates(), k.crates(), k.vehicles());
    }

    @Test
    @DisplayName("plan.json keeps its keys in order and adds \"spares\" and \"figures\" after \"loads\"")
    void keysInOrder() {
        assertThat(fieldNames(json)).containsExactly("kit", "date", "summary", "cutting", "nesting", "crates",
                "loads", "spares", "figures");
        assertThat(fieldNames(json.get("spares"))).containsExactly("policy", "kitLevel", "extraCost", "replans",
                "marks", "totals");
        assertThat(fieldNames(json.get("spares").get("marks").get(0))).containsExactly("mark", "bars",
                "barCycles", "expectedLosses", "perMarkLevel", "coverage", "sparesNeeded", "alreadyInKit",
                "toMake", "fromOffcuts", "bought", "missing");
        assertThat(fieldNames(json.get("figures"))).containsExactly("marks", "bars", "members", "reuseRatio",
                "stockPieces", "boughtPieces", "stockLengthMm", "boughtLengthMm", "cost", "offcutPct", "scrapPct",
                "remnantPct", "kitMassKg", "boughtMassKg", "usedStockMassKg", "co2eKg", "carbon");
    }

    @Test
    @DisplayName("Spares per mark: n c bar-cycles, n c p, level^(1/3), Binomial(n c, p) quantile and CDF from"
            + " commons-math3")
    void sparesAgainstHandComputationAndCommonsMath() {
        JsonNode spares = json.get("spares");
        assertThat(spares.get("policy").get("lossRatePerCycle").asDouble()).isEqualTo(P);
        assertThat(spares.get("policy").get("cycles").asInt()).isEqualTo(CYCLES);
        assertThat(spares.get("policy").get("serviceLevel").asDouble()).isEqualTo(LEVEL);
        double perMark = Math.pow(LEVEL, 1.0 / 3); // three marks in service
        Map<String, int[]> barsAndSurplus = Map.of("A", new int[] {10, 0}, "B", new int[] {6, 0},
                "C", new int[] {10, 2});
        Map<String, Integer> listed = listedSpares(result.cutting());
        double kitLevel = 1;
        int toMakeTotal = 0;
        for (JsonNode m : spares.get("marks")) {
            String mark = m.get("mark").asText();
            int n = barsAndSurplus.get(mark)[0];
            int surplus = barsAndSurplus.get(mark)[1];
            // Reference: org.apache.commons.math3.distribution.BinomialDistribution (commons-math3 3.6.1); its
            // inverseCumulativeProbability is the smallest s with P(X <= s) >= level.
            // Lost bars are replaced and can be lost again: losses ~ Binomial(n c, p).
            BinomialDistribution reference = new BinomialDistribution(null, n * CYCLES, P);
            int s = reference.inverseCumulativeProbability(perMark);
            double coverage = reference.cumulativeProbability(Math.max(s, surplus));
            assertThat(m.get("bars").asInt()).as(mark).isEqualTo(n);
            assertThat(m.get("barCycles").asInt()).as(mark).isEqualTo(n * CYCLES);
            assertThat(m.get("expectedLosses").asDouble()).as(mark).isCloseTo(n * CYCLES * P, within(5e-4));
            assertThat(m.get("perMarkLevel").asDouble()).as(mark).isCloseTo(perMark, within(5e-6));
            assertThat(m.get("sparesNeeded").asInt()).as(mark + " (commons-math3 quantile)").isEqualTo(s);
            assertThat(m.get("coverage").asDouble()).as(mark).isCloseTo(coverage, within(5e-6))
                    .isGreaterThanOrEqualTo(perMark - 5e-6);
            assertThat(reference.cumulativeProbability(s - 1)).as(mark + ": one spare fewer misses the level")
                    .isLessThan(perMark);
            assertThat(m.get("alreadyInKit").asInt()).as(mark).isEqualTo(surplus);
            int toMake = Math.max(0, s - surplus);
            assertThat(m.get("toMake").asInt()).as(mark).isEqualTo(toMake);
            int fromOffcuts = m.get("fromOffcuts").asInt();
            int bought = m.get("bought").asInt();
            assertThat(m.get("missing").asInt()).as(mark).isZero();
            assertThat(fromOffcuts + bought).as(mark + ": spares cut cover what is to make")
                    .isGreaterThanOrEqualTo(toMake)
                    .isEqualTo(listed.getOrDefault(mark, 0));
            kitLevel *= coverage;
            toMakeTotal += toMake;
        }
        assertThat(spares.get("kitLevel").asDouble()).isCloseTo(kitLevel, within(5e-6))
                .isGreaterThanOrEqualTo(LEVEL);
        JsonNode totals = spares.get("totals");
        assertThat(totals.get("bars").asInt()).isEqualTo(26);
        assertThat(totals.get("expectedLosses").asDouble()).isCloseTo(26 * CYCLES * P, within(5e-4));
        assertThat(totals.get("toMake").asInt()).isEqualTo(toMakeTotal);
        assertThat(totals.get("alreadyInKit").asInt()).isEqualTo(2);
        assertThat(totals.get("fromOffcuts").asInt() + totals.get("bought").asInt())
                .isEqualTo(listed.values().stream().mapToInt(Integer::intValue).sum());
    }

    @Test
    @DisplayName("Extra cost of the spares = catalog price of the plan with spares - of the plan without")
    void extraCostIsTheDifferenceOfCatalogPrices() throws Exception {
        Map<String, Double> prices = catalogPrices();
        CutPlan without = KitCutter.cut(kit, KitCutter.Options.DEFAULT, CutProgress.NONE);
        CutPlanValidator.validate(kit, without);
        double expected = price(result.cutting(), prices) - price(without, prices);
        assertThat(json.get("spares").get("extraCost").asDouble()).isCloseTo(expected, within(0.0051));
        assertThat(expected).isGreaterThanOrEqualTo(-1e-9);
    }

    @Test
    @DisplayName("Figures: reuse 44/28, stock and waste from the patterns, CO2e = bought mass x factor (materials.csv)")
    void figuresAgainstHandComputation() throws Exception {
        JsonNode f = json.get("figures");
        assertThat(f.get("marks").asInt()).isEqualTo(3);
        assertThat(f.get("bars").asInt()).isEqualTo(28);
        assertThat(f.get("members").asInt()).isEqualTo(44);
        assertThat(f.get("reuseRatio").asDouble()).isEqualTo(1.571); // 44 / 28 = 1.5714...
        Map<String, double[]> sections = catalogSections();
        Map<String, String> steel = materialsRow("steel");
        double density = Double.parseDouble(steel.get("density_kg_m3"));
        double factor = Double.parseDouble(steel.get("co2e_kg_per_kg"));
        int pieces = 0;
        double stock = 0;
        double bought = 0;
        double offcut = 0;
        double scrap = 0;
        double remnant = 0;
        double boughtMass = 0;
        double usedMass = 0;
        for (SectionCutPlan s : result.cutting().sections()) {
            double[] dt = sections.get(s.section());
            double perMetre = Math.PI * (dt[0] - dt[1]) * dt[1] * density * 1e-6; // EN 10219-2 mass formula
            for (CutPattern p : s.patterns()) {
                pieces += p.count();
                stock += p.count() * p.stockLengthMm();
                offcut += p.count() * p.offcutMm();
                if ("remnant".equals(p.offcutKind())) {
                    remnant += p.count() * p.offcutMm();
                } else {
                    scrap += p.count() * p.offcutMm();
                }
                usedMass += p.count() * p.stockLengthMm() / 1000 * perMetre;
                if (p.origin() == Origin.MILL) {
                    bought += p.count() * p.stockLengthMm();
                    boughtMass += p.count() * p.stockLengthMm() / 1000 * perMetre;
                }
            }
        }
        assertThat(f.get("stockPieces").asInt()).isEqualTo(pieces);
        assertThat(f.get("stockLengthMm").asDouble()).isCloseTo(stock, within(0.05));
        assertThat(f.get("boughtLengthMm").asDouble()).isCloseTo(bought, within(0.05));
        assertThat(f.get("cost").asDouble()).isCloseTo(price(result.cutting(), catalogPrices()), within(0.0051));
        assertThat(f.get("offcutPct").asDouble()).isCloseTo(100 * offcut / stock, within(0.0051));
        assertThat(f.get("scrapPct").asDouble()).isCloseTo(100 * scrap / stock, within(0.0051));
        assertThat(f.get("remnantPct").asDouble()).isCloseTo(100 * remnant / stock, within(0.0051));
        double[] a = sections.get("CHS 48.3x3.2");
        double[] c = sections.get("CHS 33.7x2.6");
        // the kit mass counts every bar the kit holds: bars.csv and the spares the plan cuts beyond it
        Map<String, Integer> listed = listedSpares(result.cutting());
        assertThat(listed.values().stream().mapToInt(Integer::intValue).sum()).as("the policy makes spares")
                .isPositive();
        double kitMass = ((10 + listed.getOrDefault("A", 0)) * 1.450 + (6 + listed.getOrDefault("B", 0)) * 2.400)
                * Math.PI * (a[0] - a[1]) * a[1] * density * 1e-6
                + (12 + listed.getOrDefault("C", 0)) * 0.950 * Math.PI * (c[0] - c[1]) * c[1] * density * 1e-6
                + 14 * 0.8;
        assertThat(f.get("kitMassKg").asDouble()).isCloseTo(kitMass, within(0.0006));
        assertThat(f.get("boughtMassKg").asDouble()).isCloseTo(boughtMass, within(0.0006));
        assertThat(f.get("usedStockMassKg").asDouble()).as("no rack offcuts in this catalog: used = bought")
                .isCloseTo(usedMass, within(0.0006));
        assertThat(f.get("co2eKg").asDouble()).as("bought mass x the steel factor of materials.csv")
                .isCloseTo(boughtMass * factor, within(0.0006));
        JsonNode carbon = f.get("carbon");
        assertThat(carbon).hasSize(1);
        assertThat(carbon.get(0).get("material").asText()).isEqualTo("steel");
        assertThat(carbon.get(0).get("co2eKgPerKg").asDouble()).isEqualTo(factor);
        assertThat(carbon.get(0).get("source").asText()).isEqualTo(steel.get("source")).contains("CO2e");
        assertThat(carbon.get(0).get("co2eKg").asDouble()).isCloseTo(boughtMass * factor, within(0.0006));
        assertThat(result.figures()).as("the plan carries the figures of its own cutting plan")
                .isEqualTo(KitMetricsCalculator.of(kit, result.cutting()));
    }

    @Test
    @DisplayName("Without a policy: \"spares\" is null, the figures are still there, the report says how to set one")
    void withoutAPolicy() throws Exception {
        Map<String, String> files = PlanFiles.of(plainResult, DATE);
        JsonNode plain = PrettyJson.mapper().readTree(files.get(PlanFiles.PLAN_JSON));
        assertThat(plainResult.spares()).isNull();
        assertThat(plain.get("spares").isNull()).isTrue();
        assertThat(plain.get("figures").get("reuseRatio").asDouble()).isEqualTo(1.571);
        assertThat(listedSpares(plainResult.cutting())).isEmpty();
        String html = files.get(PlanFiles.REPORT_HTML);
        assertThat(html).contains("kit.json has no <code>spares</code> policy")
                .doesNotContain("kit-figures-spares");
    }

    @Test
    @DisplayName("The report's new section comes after the crates and trucks, before the cautions and inputs")
    void reportSectionOrder() {
        String html = PlanFiles.of(result, DATE).get(PlanFiles.REPORT_HTML);
        List<String> ids = new ArrayList<>();
        Matcher m = Pattern.compile("<section id=\"([a-z-]+)\"").matcher(html);
        while (m.find()) {
            ids.add(m.group(1));
        }
        assertThat(ids).endsWith(KitFiguresSection.ID, "cautions", "inputs");
        assertThat(ids.indexOf(KitFiguresSection.ID)).isGreaterThan(ids.indexOf(NestingSection.ID));
        assertThat(html).contains("<h2>" + KitFiguresSection.TITLE + "</h2>")
                .contains("<tr data-spares-mark=\"A\">", "<tr data-spares-mark=\"B\">", "<tr data-spares-mark=\"C\">");
    }

    private static Map<String, Integer> listedSpares(CutPlan plan) {
        Map<String, Integer> listed = new HashMap<>();
        for (SectionCutPlan s : plan.sections()) {
            for (Spare spare : s.spares()) {
                listed.merge(spare.mark(), spare.count(), Integer::sum);
            }
        }
        return listed;
    }

    private static double price(CutPlan plan, Map<String, Double> prices) {
        double sum = 0;
        for (SectionCutPlan s : plan.sections()) {
            for (CutPattern p : s.patterns()) {
                sum += p.count() * prices.get(s.section() + "|" + p.origin() + "|" + p.stockLengthMm());
            }
        }
        return sum;
    }

    /** Price per stock row of stock-catalogs/steel-chs.csv, keyed "section|ORIGIN|length". */
    private static Map<String, Double> catalogPrices() throws IOException {
        Map<String, Double> prices = new HashMap<>();
        for (CSVRecord r : csv(Path.of("stock-catalogs", "steel-chs.csv"))) {
            prices.put(r.get("section") + "|" + r.get("origin").toUpperCase(java.util.Locale.ROOT) + "|"
                    + Double.parseDouble(r.get("length_mm")), Double.parseDouble(r.get("price")));
        }
        return prices;
    }

    /** Outer diameter and wall per section of stock-catalogs/steel-chs.csv. */
    private static Map<String, double[]> catalogSections() throws IOException {
        Map<String, double[]> sections = new HashMap<>();
        for (CSVRecord r : csv(Path.of("stock-catalogs", "steel-chs.csv"))) {
            sections.put(r.get("section"), new double[] {Double.parseDouble(r.get("outer_diameter_mm")),
                Double.parseDouble(r.get("wall_mm"))});
        }
        return sections;
    }

    /** One row of stock-catalogs/materials.csv, column name to value. */
    private static Map<String, String> materialsRow(String material) throws IOException {
        for (CSVRecord r : csv(Path.of("stock-catalogs", "materials.csv"))) {
            if (r.get("material").equals(material)) {
                return r.toMap();
            }
        }
        throw new AssertionError("no " + material + " in materials.csv");
    }

    private static List<CSVRecord> csv(Path file) throws IOException {
        try (Reader in = Files.newBufferedReader(file)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    private static List<String> fieldNames(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
