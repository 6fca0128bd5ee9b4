package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import kitwright.io.KitFiles;
import kitwright.io.OutputFolder;
import kitwright.io.PrettyJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PlanCommandTest {

    @Test
    void planWritesTheSummaryIntoAFolderThatAppearsWhole(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("reports").resolve("cinema-6");

        CliRun run = CliRun.of("plan", "sample-kits/cinema-6", "--out", out.toString(), "--date", "2025-06-30");

        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.OK.code());
        WrittenPlans.planFolder(Path.of("sample-kits", "cinema-6"), out, java.time.LocalDate.of(2025, 6, 30));
        assertThat(run.err()).contains("plan: cutting", "plan: nesting", "plan: crating and loading");
        assertThat(KitFiles.entries(out)).containsExactlyInAnyOrder(OutputFolder.MARKER, PlanCommand.SUMMARY_JSON,
                "report.html", "plan.json", "order.csv", "rack-pull.csv", "cut-list.csv", "rack-after.csv",
                "labels.html", "nests.csv", "assembly-order.csv", "packing-lists.csv", "manifests.csv", "load-lists.csv",
                "plan.xlsx",
                "timing.json");
        assertThat(run.out()).contains("Open " + out.resolve("report.html"));
        assertThat(run.out().split("Kit cinema-6", -1)).as("the kit named once, at the top").hasSize(2);
        assertThat(run.out()).startsWith("Kit cinema-6: ").contains("\nCrates: ", "\nTrips: ");
        assertThat(KitFiles.entries(out.getParent())).as("no temporary folder left beside").containsExactly("cinema-6");
        JsonNode summary = PrettyJson.mapper().readTree(out.resolve(PlanCommand.SUMMARY_JSON).toFile());
        assertThat(summary.get("kit").asText()).isEqualTo("cinema-6");
        assertThat(summary.get("marks").asInt()).isEqualTo(6);
        assertThat(summary.get("bars").asInt()).isEqualTo(318);
        assertThat(summary.get("members").asInt()).isEqualTo(570);
        assertThat(summary.get("sections")).hasSize(5);
    }

    @Test
    void theSummaryIsStableJsonWithTwoSpaceIndentAndATrailingNewline(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir.resolve("kit"), "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,4\n");
        Path first = dir.resolve("one");
        Path second = dir.resolve("two");

        CliRun.of("plan", dir.resolve("kit").toString(), "--out", first.toString());
        CliRun.of("plan", dir.resolve("kit").toString(), "--out", second.toString());

        String text = Files.readString(first.resolve("summary.json"));
        assertThat(Files.readString(second.resolve("summary.json"))).isEqualTo(text);
        assertThat(text).startsWith("{\n  \"kit\": \"kit\",\n  \"description\": \"\",\n  \"marks\": 1,\n")
                .contains("\n  \"spares\": [],\n  \"sparesToMake\": 0,\n  \"allowance\": 0\n}").endsWith("}\n").doesNotContain("\r");
        List<String> keys = KitFiles.listOf(PrettyJson.mapper().readTree(text).fieldNames());
        assertThat(keys).containsExactly("kit", "description", "marks", "bars", "members", "reuseRatio", "sections",
                "markList", "structures", "joints", "barsMassKg", "jointsMassKg", "kitMassKg", "spares",
                "sparesToMake", "allowance");
    }

    @Test
    void invalidInputLeavesNoFolderAndKeepsAPreviousOne(@TempDir Path dir) throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,4\n");
        Path fresh = dir.resolve("fresh");
        Path previous = dir.resolve("previous");
        assertThat(CliRun.of("plan", kit.toString(), "--out", previous.toString()).exitCode()).isZero();
        String before = Files.readString(previous.resolve("summary.json"));
        KitFiles.write(kit, "bars.csv", "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,-4\n");

        CliRun intoFresh = CliRun.of("plan", kit.toString(), "--out", fresh.toString());
        CliRun intoPrevious = CliRun.of("plan", kit.toString(), "--out", previous.toString());

        assertThat(intoFresh.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(intoPrevious.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(intoFresh.err()).contains("bars.csv:2: quantity: -4 is negative");
        assertThat(fresh).doesNotExist();
        assertThat(previous.resolve("summary.json")).hasContent(before.strip());
        assertThat(KitFiles.entries(dir)).containsExactly("kit", "previous");
    }

    @Test
    void aFolderKitwrightDidNotWriteIsRefused(@TempDir Path dir) throws Exception {
        Path mine = Files.createDirectories(dir.resolve("mine"));
        Files.writeString(mine.resolve("notes.txt"), "keep");

        CliRun run = CliRun.of("plan", "sample-kits/alu-kiosk", "--out", mine.toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("the folder exists and was not written by kitwright");
        assertThat(KitFiles.entries(mine)).containsExactly("notes.txt");
    }

    @Test
    void aBadDateIsInvalidInput(@TempDir Path dir) {
        CliRun run = CliRun.of("plan", "sample-kits/alu-kiosk", "--out", dir.resolve("x").toString(),
                "--date", "30/06/2025");

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("'30/06/2025' is not a date (expected YYYY-MM-DD, e.g. 2025-06-30)");
        assertThat(dir.resolve("x")).doesNotExist();
    }

    @Test
    @org.junit.jupiter.api.DisplayName("no crate plan: the summary and the report say why, exit 3, the rest written")
    void noCratePlanSaysWhy(@TempDir Path dir) throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,4\n");
        // the only crate is 500 mm long inside: the 1000 mm bars fit no crate
        KitFiles.write(kit, "crates.csv", "crate,inner_length_mm,inner_width_mm,inner_height_mm,outer_length_mm,"
                + "outer_width_mm,outer_height_mm,tare_kg,max_gross_kg,stackable,max_top_load_kg,price\n"
                + "short,500,400,300,560,460,360,10,200,yes,100,50\n");
        KitFiles.write(kit, "kit.json", "{\"crateCatalog\": \"crates.csv\", \"vehicleCatalog\": \""
                + Path.of("stock-catalogs/vehicles.csv").toAbsolutePath() + "\"}");
        Path out = dir.resolve("out");

        CliRun run = CliRun.of("plan", kit.toString(), "--out", out.toString(), "--date", "2025-06-30");

        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.NO_FEASIBLE_PLAN.code());
        assertThat(run.out()).contains("Crates: none planned; INFEASIBLE: bundle BDL-1 (1000 mm long,")
                .contains("fits no crate type of the catalog").contains("Trips: none planned (no crates to load).")
                .doesNotContain("INFEASIBLE, gap");
        assertThat(Files.readString(out.resolve("report.html"))).contains("No crate plan: bundle BDL-1 (1000 mm long,");
        assertThat(out.resolve("cut-list.csv")).exists();
    }

    @Test
    void aPlanTheClockStoppedSaysSoAndTheReportNamesCatalogsTheSameForRelativeAndAbsoluteKitPaths(
            @TempDir Path dir) throws Exception {
        // the alu-kiosk sample with its tube catalog given by an absolute path and a time limit of a microsecond
        Path kit = Files.createDirectories(dir.resolve("kits").resolve("kiosk"));
        Path sample = Path.of("sample-kits/alu-kiosk");
        Files.copy(sample.resolve("bars.csv"), kit.resolve("bars.csv"));
        Path catalog = Path.of("stock-catalogs/aluminium-tube.csv").toAbsolutePath();
        Files.writeString(kit.resolve("kit.json"), Files.readString(sample.resolve("kit.json"))
                .replaceAll("\"stockCatalog\": \"[^\"]*\"", "\"stockCatalog\": \""
                        + catalog.toString().replace("\\", "/") + "\"")
                .replaceAll("\"timeLimitSeconds\": [0-9.]+", "\"timeLimitSeconds\": 0.000001"));
        Path relativeKit = Path.of("").toAbsolutePath().relativize(kit.toAbsolutePath());
        CliRun relative = CliRun.of("plan", relativeKit.toString(), "--out", dir.resolve("relative").toString(),
                "--date", "2026-12-01");
        CliRun absolute = CliRun.of("plan", kit.toAbsolutePath().toString(), "--out",
                dir.resolve("absolute").toString(), "--date", "2026-12-01");
        assertThat(relative.exitCode()).as(relative.err()).isZero();
        assertThat(absolute.exitCode()).as(absolute.err()).isZero();
        String report = Files.readString(dir.resolve("relative").resolve("report.html"));
        assertThat(Files.readString(dir.resolve("absolute").resolve("report.html"))).isEqualTo(report);
        String fromTheKit = kit.toAbsolutePath().relativize(catalog).toString().replace('\\', '/');
        assertThat(report).contains("<td>" + fromTheKit + "</td>").contains("stopped by the time limit");
        JsonNode sections = PrettyJson.mapper().readTree(Files.readString(dir.resolve("relative").resolve("plan.json")))
                .get("cutting").get("sections");
        List<JsonNode> feasible = KitFiles.listOf(sections.elements()).stream()
                .filter(s -> s.get("status").asText().equals("FEASIBLE")).toList();
        assertThat(feasible).isNotEmpty().allSatisfy(s ->
                assertThat(s.get("reason").asText()).isEqualTo("stopped by the time limit"));
        assertThat(relative.out()).contains(feasible.get(0).get("section").asText()
                + ": FEASIBLE, stopped by the time limit");
    }
}
