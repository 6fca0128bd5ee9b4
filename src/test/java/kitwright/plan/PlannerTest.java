package kitwright.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import kitwright.cli.CliRun;
import kitwright.cli.ExitCode;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.io.OutputFolder;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.report.PlanFiles;
import kitwright.validate.PlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The whole chain on real kits: every sample kit planned and re-checked by the plan validator before anything
 * else is asserted; two runs of {@code plan} giving the same bytes; a kit whose rack-only stock cannot cover one
 * section still planned and written for the rest, with exit code 3.
 */
class PlannerTest {
    private static final LocalDate DATE = LocalDate.of(2026, 12, 1);
    /** What every plan folder holds besides the files of {@link PlanFiles}. */
    private static final List<String> FOLDER_EXTRAS = List.of("timing.json", OutputFolder.MARKER);
    private static final List<String> CHAIN_FILES = List.of("report.html", "plan.json", "summary.json", "order.csv",
            "rack-pull.csv", "cut-list.csv", "rack-after.csv", "nests.csv", "assembly-order.csv", "labels.html",
            "packing-lists.csv", "manifests.csv", "load-lists.csv", "plan.xlsx");

    /** The files of {@link #CHAIN_FILES}, with the tour's leg files before plan.xlsx when the kit has a tour. */
    static List<String> chainFiles(Kit kit) {
        List<String> files = new java.util.ArrayList<>(CHAIN_FILES);
        if (!kit.settings().tour().isEmpty()) {
            files.addAll(files.size() - 1, List.of("legs.csv", "leg-packing-lists.csv", "leg-load-lists.csv"));
        }
        return files;
    }

    /** The stages timed: the chain's, and the tour's legs when the kit has a tour. */
    static List<String> stages(Kit kit) {
        List<String> stages = new java.util.ArrayList<>(Planner.STAGES);
        if (!kit.settings().tour().isEmpty()) {
            stages.add(Planner.TOUR_STAGE);
        }
        return stages;
    }

    static Stream<Path> sampleKits() throws Exception {
        try (Stream<Path> kits = Files.list(Path.of("sample-kits"))) {
            return kits.filter(p -> Files.exists(p.resolve("bars.csv"))).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sampleKits")
    @DisplayName("every sample kit: the validator passes the whole plan, bounds lie below values, every file made")
    void everySampleKit(Path dir) throws Exception {
        Kit kit = KitReader.read(dir);
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> files = PlanFiles.of(result, DATE);

        PlanValidator.validate(result, files);

        assertThat(result.anyInfeasible()).as("sample kits are plannable").isFalse();
        for (SectionCutPlan s : result.cutting().sections()) {
            assertThat(s.status()).as(s.section()).isIn(Status.OPTIMAL, Status.FEASIBLE);
            assertThat(s.lowerBound()).as(s.section()).isLessThanOrEqualTo(s.value() + 1e-9);
        }
        var nesting = result.nesting().plan();
        assertThat(nesting.status()).isIn(Status.OPTIMAL, Status.FEASIBLE);
        assertThat(nesting.lowerBound()).isLessThanOrEqualTo(nesting.bundles().size());
        assertThat(result.nesting().bundledVolumeM3()).isLessThanOrEqualTo(result.nesting().looseVolumeM3() + 1e-9);
        assertThat(result.logisticsPlanned()).as("the sample kits name their crate and vehicle catalogs").isTrue();
        assertThat(result.crates().status()).isIn(Status.OPTIMAL, Status.FEASIBLE);
        assertThat(result.crates().lowerBound()).isLessThanOrEqualTo(result.crates().crates().size());
        assertThat(result.loads().status()).isIn(Status.OPTIMAL, Status.FEASIBLE);
        assertThat(result.loads().lowerBound()).isLessThanOrEqualTo(result.loads().tripCost() + 1e-9);
        assertThat(PlanFiles.written(result, DATE).keySet()).containsExactlyElementsOf(chainFiles(kit));
        assertThat(result.stageSeconds().keySet()).containsExactlyElementsOf(stages(kit));

        JsonNode plan = PrettyJson.mapper().readTree(files.get("plan.json"));
        List<String> keys = new java.util.ArrayList<>(List.of("kit", "date", "summary", "cutting", "nesting",
                "crates", "loads", "spares", "figures"));
        if (result.tour() != null) {
            keys.add(keys.indexOf("loads") + 1, "legs");
            assertThat(plan.get("legs")).hasSize(kit.settings().tour().size() + 1);
        }
        assertThat(KitFiles.listOf(plan.fieldNames())).containsExactlyElementsOf(keys);
        assertThat(plan.get("date").asText()).isEqualTo("2026-12-01");
        assertThat(plan.get("nesting").get("bundles")).hasSize(nesting.bundles().size());
        assertThat(plan.get("loads").get("vehicles")).hasSize(result.loads().vehicles().size());
        assertThat(files.get("plan.json")).doesNotContain("Seconds").doesNotContain("seconds");
    }

    @Test
    @DisplayName("two runs of plan with the same --date write byte-identical files, timing.json aside")
    void twoRunsGiveTheSameBytes(@TempDir Path dir) throws Exception {
        Path first = dir.resolve("first");
        Path second = dir.resolve("second");

        CliRun one = CliRun.of("plan", "sample-kits/cinema-12", "--out", first.toString(), "--date", "2026-12-01");
        CliRun two = CliRun.of("plan", "sample-kits/cinema-12", "--out", second.toString(), "--date", "2026-12-01");

        assertThat(one.exitCode()).as(one.err()).isEqualTo(ExitCode.OK.code());
        assertThat(two.exitCode()).as(two.err()).isEqualTo(ExitCode.OK.code());
        Kit kit = KitReader.read(Path.of("sample-kits", "cinema-12"));
        assertThat(kit.settings().tour()).as("the sample tours its structures").isNotEmpty();
        Set<String> expected = new LinkedHashSet<>(chainFiles(kit));
        expected.addAll(FOLDER_EXTRAS);
        assertThat(KitFiles.entries(first)).containsExactlyInAnyOrderElementsOf(expected);
        assertThat(KitFiles.entries(second)).containsExactlyInAnyOrderElementsOf(expected);
        for (String name : chainFiles(kit)) {
            byte[] a = Files.readAllBytes(first.resolve(name));
            byte[] b = Files.readAllBytes(second.resolve(name));
            assertThat(a).as(name + " is not empty").isNotEmpty();
            assertThat(b).as(name + " the same in both runs").isEqualTo(a);
        }
        JsonNode timing = PrettyJson.mapper().readTree(first.resolve("timing.json").toFile());
        assertThat(KitFiles.listOf(timing.get("stageSeconds").fieldNames())).containsExactlyElementsOf(stages(kit));
        assertThat(Files.readString(first.resolve("report.html"), StandardCharsets.UTF_8))
                .contains("2026-12-01").doesNotContain("<script");
    }

    @Test
    @DisplayName("rack-only stock too short for one section: exit 3, that section INFEASIBLE, the rest still written")
    void oneSectionWithoutStockStillWritesTheRest(@TempDir Path dir) throws Exception {
        Path kitDir = KitFiles.kit(dir.resolve("kit"), """
                mark,section,length_mm,quantity
                A,CHS 48.3x3.2,1900,6
                E,CHS 33.7x2.6,1500,5
                """);
        // 33.7 only as two rack offcuts of 3200 mm: four of the five 1500 mm pieces fit, one is missing
        KitFiles.write(kitDir, "stock.csv", """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin
                CHS 48.3x3.2,steel,48.3,3.2,6000,31.00,,mill
                CHS 33.7x2.6,steel,33.7,2.6,3200,2.00,2,rack
                """);
        KitFiles.write(kitDir, "crates.csv", Files.readString(Path.of("stock-catalogs", "crates.csv")));
        KitFiles.write(kitDir, "vehicles.csv", Files.readString(Path.of("stock-catalogs", "vehicles.csv")));
        Path out = dir.resolve("out");

        Kit kit = KitReader.read(kitDir);
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        PlanValidator.validate(result);
        CliRun run = CliRun.of("plan", kitDir.toString(), "--out", out.toString(), "--date", "2026-12-01");

        assertThat(result.anyInfeasible()).isTrue();
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.NO_FEASIBLE_PLAN.code());
        Set<String> expected = new LinkedHashSet<>(CHAIN_FILES);
        expected.addAll(FOLDER_EXTRAS);
        assertThat(KitFiles.entries(out)).containsExactlyInAnyOrderElementsOf(expected);
        JsonNode sections = PrettyJson.mapper().readTree(out.resolve("plan.json").toFile()).get("cutting")
                .get("sections");
        JsonNode e = sections.get(1);
        assertThat(e.get("section").asText()).isEqualTo("CHS 33.7x2.6");
        assertThat(e.get("status").asText()).isEqualTo("INFEASIBLE");
        assertThat(e.get("reason").asText()).contains("E");
        assertThat(e.get("patterns")).isEmpty();
        JsonNode a = sections.get(0);
        assertThat(a.get("status").asText()).isEqualTo("OPTIMAL");
        // 6 x 1900 mm with the default 2 mm kerf and 5 mm trims: three to a 6000 mm piece, so two pieces at 31.00
        assertThat(a.get("value").asDouble()).isCloseTo(62.0, within(1e-9));
        assertThat(a.get("stockPieces").asInt()).isEqualTo(2);
        assertThat(Files.readString(out.resolve("nests.csv"))).contains(",A,").doesNotContain(",E,");
        assertThat(Files.readString(out.resolve("report.html"), StandardCharsets.UTF_8))
                .contains("No plan for this section").contains("CHS 33.7x2.6");
        assertThat(Files.readString(out.resolve("packing-lists.csv"))).contains("A x 6");
        assertThat(run.out()).contains("INFEASIBLE");
    }

    @Test
    @DisplayName("a mark named <b>&\" is text everywhere: escaped in report.html, quoted in the CSVs")
    void hostileMarkStaysText(@TempDir Path dir) throws Exception {
        Path kitDir = KitFiles.kit(dir.resolve("kit"), """
                mark,section,length_mm,quantity
                "<b>&\"\"",CHS 48.3x3.2,1900,6
                E,CHS 33.7x2.6,1500,5
                """);
        KitFiles.write(kitDir, "crates.csv", Files.readString(Path.of("stock-catalogs", "crates.csv")));
        KitFiles.write(kitDir, "vehicles.csv", Files.readString(Path.of("stock-catalogs", "vehicles.csv")));
        Kit kit = KitReader.read(kitDir);
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> files = PlanFiles.of(result, DATE);

        PlanValidator.validate(result, files);

        assertThat(kit.bars().get(0).mark()).isEqualTo("<b>&\"");
        String html = files.get("report.html");
        assertThat(html).doesNotContain("<b>&").contains("&lt;b&gt;&amp;&quot;");
        assertThat(html.split("data-mark=\"&lt;b&gt;&amp;&quot;\"", -1).length - 1)
                .as("legend row, bundle drawing bars and bundle tables").isGreaterThanOrEqualTo(3);
        assertThat(files.get("packing-lists.csv")).contains("\"<b>&\"\" x 6");
        assertThat(files.get("nests.csv")).contains("\"<b>&\"\"");
        assertThat(files.get("labels.html")).doesNotContain("<b>&").contains("&lt;b&gt;&amp;&quot;");
    }
}
