package kitwright.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.cli.CliRun;
import kitwright.compare.CompareHtml;
import kitwright.compare.CompareJson;
import kitwright.compare.OptionSummaries;
import kitwright.compare.OptionSummary;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.metrics.KitMass;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Section;
import kitwright.nesting.Bundle;
import kitwright.report.PlanFiles;
import kitwright.report.ShopFormat;
import kitwright.spares.SparesPlan;
import kitwright.spares.SparesStage;
import kitwright.validate.PlanValidator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A figure two commands print is the same figure: the kit mass, the reuse ratio and the spares of a sample kit as
 * {@code check} prints them, as plan.json (its summary and its figures) and the report give them, and as
 * compare.json and compare.html give them, all from the same kit. The bundles carry exactly the bars' part of the
 * kit mass (bars of bars.csv and the spares cut), summed here from the nested plan itself.
 *
 * <p>alu-kiosk has a spares policy and no structures.csv (so no reuse ratio anywhere); cinema-6 has structures,
 * joints and no policy.
 */
class SameFigureEverywhereTest {
    private static final LocalDate DATE = LocalDate.of(2026, 1, 1);
    private static final Pattern CHECK_MASS = Pattern.compile("Kit mass: ([0-9.]+) kg \\(bars ([0-9.]+) kg"
            + "(?: with the (\\d+) spare bars? to make)?, joints ([0-9.]+) kg\\)");

    @ParameterizedTest
    @ValueSource(strings = {"alu-kiosk", "cinema-6"})
    void checkPlanReportAndCompareGiveTheSameFigures(String sample) throws Exception {
        Path dir = Path.of("sample-kits", sample);
        Kit kit = KitReader.read(dir);
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> files = PlanFiles.of(result, DATE);
        PlanValidator.validate(result, files);

        JsonNode plan = PrettyJson.mapper().readTree(files.get(PlanFiles.PLAN_JSON));
        JsonNode figures = plan.get("figures");
        JsonNode summary = plan.get("summary");
        String report = files.get(PlanFiles.REPORT_HTML);
        List<OptionSummary> options = List.of(OptionSummaries.of(result));
        JsonNode compare = PrettyJson.mapper().readTree(CompareJson.toJson(options)).get("options").get(0);
        String compareHtml = CompareHtml.render(options);
        CliRun check = CliRun.of("check", dir.toString());
        assertThat(check.exitCode()).as(check.err()).isZero();

        // kit mass: every bar (bars.csv and the spares) plus the joints
        double kitMass = figures.get("kitMassKg").asDouble();
        double jointsMass = kit.joints().stream().mapToDouble(j -> j.massKg() * j.quantity()).sum();
        double bundled = result.nesting().plan().bundles().stream().mapToDouble(Bundle::massKg).sum();
        assertThat(bundled).as("the bundles carry exactly the bars' mass").isCloseTo(kitMass - jointsMass,
                within(0.001));
        assertThat(cutMassKg(kit, result.cutting()) + jointsMass).as("every piece the validated plan cuts, plus joints")
                .isCloseTo(kitMass, within(0.001));

        // spares: the policy's sizing, check's Service-life spares line and the spares the plan cuts are one count
        int sparesCut = KitMass.sparesCut(result.cutting()).values().stream().mapToInt(Integer::intValue).sum();
        SparesPlan sizing = SparesStage.sizing(kit);
        if (sizing == null) {
            assertThat(check.out()).contains("Service-life spares: none");
            assertThat(sparesCut).isZero();
        } else {
            assertThat(sizing.totalToMake()).as("alu-kiosk's policy asks for spares").isPositive();
            assertThat(sparesCut).as("spares cut = spares to make").isEqualTo(sizing.totalToMake())
                    .isEqualTo(plan.get("spares").get("totals").get("toMake").asInt());
            assertThat(check.out()).contains("Service-life spares: " + sizing.totalToMake() + " bars to make (");
        }
        assertThat(summary.get("kitMassKg").asDouble()).isEqualTo(kitMass);
        assertThat(compare.get("kitMassKg").asDouble()).isCloseTo(kitMass, within(0.05 + 1e-9));
        Matcher m = CHECK_MASS.matcher(check.out());
        assertThat(m.find()).as(check.out()).isTrue();
        assertThat(m.group(1)).isEqualTo(String.format(Locale.ROOT, "%.1f", kitMass));
        assertThat(m.group(3) == null ? 0 : Integer.parseInt(m.group(3))).as("spares check counts in the mass")
                .isEqualTo(sparesCut).isEqualTo(summary.get("sparesToMake").asInt());
        String shown = ShopFormat.kg(kitMass) + "\u00A0kg";
        assertThat(report).containsPattern("figure-label\">Kit mass</div>\\s*<div class=\"figure-value\">"
                + Pattern.quote(shown) + "</div>");
        assertThat(report).containsPattern("figure-label\">Kit mass with joints</div>\\s*<div class=\"figure-value\">"
                + Pattern.quote(shown) + "</div>");
        assertThat(compareCell(compareHtml, "kitMassKg").replaceAll("[^0-9.]", ""))
                .isEqualTo(String.format(Locale.ROOT, "%.1f", compare.get("kitMassKg").asDouble()));

        // stock masses: used = mill + rack, bought = mill; the same in plan.json and compare.json
        assertThat(figures.get("usedStockMassKg").asDouble()).isGreaterThanOrEqualTo(
                figures.get("boughtMassKg").asDouble()).isGreaterThanOrEqualTo(0);
        assertThat(compare.get("usedStockMassKg").asDouble()).isCloseTo(figures.get("usedStockMassKg").asDouble(),
                within(0.05 + 1e-9));
        assertThat(compare.get("boughtMassKg").asDouble()).isCloseTo(figures.get("boughtMassKg").asDouble(),
                within(0.05 + 1e-9));

        // reuse ratio: none without structures.csv, else members / bars, the same everywhere
        if (kit.structures().isEmpty()) {
            assertThat(figures.get("reuseRatio").isNull()).isTrue();
            assertThat(figures.get("members").isNull()).isTrue();
            assertThat(summary.get("reuseRatio").isNull()).isTrue();
            assertThat(compare.has("reuseRatio")).isTrue();
            assertThat(compare.get("reuseRatio").isNull()).isTrue();
            assertThat(check.out()).contains("reuse ratio: none");
            assertThat(report).containsPattern("figure-label\">Reuse ratio</div>\\s*<div class=\"figure-value\">"
                    + "none</div>");
            assertThat(compareCell(compareHtml, "reuseRatio")).isEqualTo("\u2014");
        } else {
            double ratio = figures.get("reuseRatio").asDouble();
            assertThat(ratio).isEqualTo(summary.get("reuseRatio").asDouble()).isEqualTo(
                    compare.get("reuseRatio").asDouble());
            assertThat(check.out()).contains("reuse ratio " + String.format(Locale.ROOT, "%.2f", ratio));
            assertThat(report).containsPattern("figure-label\">Reuse ratio</div>\\s*<div class=\"figure-value\">"
                    + Pattern.quote(String.format(Locale.ROOT, "%.2f", ratio)) + "</div>");
        }
    }

    /**
     * Mass of every piece a cutting plan cuts, counted from its patterns: length x M, M = pi (D - T) T rho 1e-6
     * kg/m (the EN 10219-2 formula, src/docs/sources.md) with D, T of the section and rho of its material.
     */
    private static double cutMassKg(Kit kit, CutPlan plan) {
        double kg = 0;
        for (SectionCutPlan section : plan.sections()) {
            Section tube = kit.catalog().section(section.section()).orElseThrow();
            double rho = kit.materials().get(tube.material()).densityKgM3();
            double perMetre = Math.PI * (tube.outerDiameterMm() - tube.wallMm()) * tube.wallMm() * rho * 1e-6;
            for (CutPattern pattern : section.patterns()) {
                for (Cut cut : pattern.cuts()) {
                    kg += pattern.count() * cut.lengthMm() / 1000 * perMetre;
                }
            }
        }
        return kg;
    }

    /** The text of the first option's cell in a row of compare.html. */
    private static String compareCell(String html, String key) {
        Matcher cell = Pattern.compile("data-metric=\"" + key + "\"[^\n]*?<td class=\"(?!unit)[a-z]+\">([^<]+)")
                .matcher(html);
        assertThat(cell.find()).as(key + " row in compare.html").isTrue();
        return cell.group(1);
    }
}
