package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import kitwright.compare.OptionSummaries;
import kitwright.compare.OptionSummary;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.plan.PlanResult;
import kitwright.report.Look;
import kitwright.testing.PageLook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code sweep} end to end on a small invented designer input: the files and their keys, each option folder a kit
 * that {@code check} and {@code plan} take as it is and whose validated plan gives the row's figures, determinism,
 * {@code --with-plans}, the {@code --marks} problems and an option without a feasible plan.
 */
class SweepCommandTest {
    @TempDir
    Path tmp;
    Path designer;

    static final String MEMBERS = """
            structure,member,section,node_to_node_mm
            frame,f1,CHS 48.3x3.2,1900
            frame,f2,CHS 48.3x3.2,1905.5
            frame,f3,CHS 48.3x3.2,1760
            frame,f4,CHS 48.3x3.2,1500
            frame,f5,CHS 33.7x2.6,1200
            frame,f6,CHS 33.7x2.6,1215
            mast,m1,CHS 48.3x3.2,1900
            mast,m2,CHS 48.3x3.2,1520.3
            mast,m3,CHS 33.7x2.6,1199.9
            mast,m4,CHS 33.7x2.6,990
            """;

    @BeforeEach
    void designerFolder() throws IOException {
        Path catalogs = tmp.resolve("catalogs");
        for (String f : List.of("steel-chs.csv", "materials.csv", "crates.csv", "vehicles.csv")) {
            KitFiles.write(catalogs, f, Files.readString(Path.of("stock-catalogs", f)));
        }
        designer = tmp.resolve("designer");
        KitFiles.write(designer, "kit.json", """
                {"name": "frames", "description": "Invented test members.",
                 "stockCatalog": "../catalogs/steel-chs.csv", "endDeductionMm": 95, "timeLimitSeconds": 20}
                """);
        KitFiles.write(designer, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN90,90,1.6,12\n");
        KitFiles.write(designer, "members.csv", MEMBERS);
    }

    @Test
    void everyOptionIsAKitWhosePlanGivesItsRow() throws Exception {
        Path out = tmp.resolve("out");
        CliRun run = CliRun.of("sweep", designer.toString(), "--marks", "2..4", "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.OK.code());
        assertThat(run.err().lines().filter(l -> l.startsWith("sweep: k0"))).as("one progress line per option")
                .hasSize(3);

        JsonNode options = PrettyJson.mapper().readTree(out.resolve("sweep.json").toFile()).get("options");
        assertThat(options).hasSize(3);
        List<String> keys = new ArrayList<>();
        options.get(0).fieldNames().forEachRemaining(keys::add);
        assertThat(keys).contains("marks", "kit", "maxChangeMm", "meanChangeMm", "reuseRatio", "cost", "totalCost",
                "offcutPct", "bundles", "crates", "vehicles", "co2eKg", "status", "pareto");
        for (int i = 0; i < 3; i++) {
            JsonNode row = options.get(i);
            int k = i + 2;
            Path folder = out.resolve("k0" + k);
            assertThat(row.get("marks").asInt()).isEqualTo(k);
            assertThat(row.get("kit").asText()).isEqualTo("k0" + k);
            assertThat(CliRun.of("check", folder.toString()).exitCode()).isEqualTo(ExitCode.OK.code());
            Path plan = tmp.resolve("plan-k" + k);
            assertThat(CliRun.of("plan", folder.toString(), "--out", plan.toString(), "--date", "2026-12-01")
                    .exitCode()).isEqualTo(ExitCode.OK.code());

            PlanResult result = WrittenPlans.validated(folder); // shared validators first
            WrittenPlans.planFolder(folder, plan, java.time.LocalDate.of(2026, 12, 1));
            OptionSummary summary = OptionSummaries.of(result);
            Kit kit = KitReader.read(folder);
            assertThat(kit.bars()).hasSize(k);
            assertThat(row.get("cost").asDouble()).isEqualTo(summary.cost());
            assertThat(row.get("offcutPct").asDouble()).isEqualTo(summary.offcutPct());
            assertThat(row.get("bundles").asInt()).isEqualTo(summary.bundles());
            assertThat(row.get("crates").asInt()).isEqualTo(summary.crates());
            assertThat(row.get("vehicles").asInt()).isEqualTo(summary.vehicles());
            assertThat(row.get("reuseRatio").asDouble()).isEqualTo(summary.reuseRatio());
            double crates = result.crates().price(kit.crates());
            assertThat(row.get("totalCost").asDouble()).isCloseTo(summary.cost() + crates + summary.tripCost(),
                    org.assertj.core.data.Offset.offset(0.005));
            // every member of both structures is served: structures.csv counts sum to the members
            assertThat(kit.structures().stream().mapToInt(s -> s.count()).sum()).isEqualTo(10);
        }
        assertThat(Files.readString(out.resolve("sweep.csv"))).startsWith("\uFEFFmarks,kit,max_change_mm,");
        String html = Files.readString(out.resolve("sweep.html"));
        assertThat(html).contains("re-solve each structure's geometry")
                .contains("data-chart=\"trade-off\"").contains("class=\"histogram\"").doesNotContain("<script");
        // the project's one look: the shared stylesheet, text at 4.5:1 or more (WCAG 2.1 AA), nothing from the network
        assertThat(html).contains(Look.css());
        assertThat(PageLook.lowContrastPairs(PageLook.styles(html), Set.of(), Set.of())).isEmpty();
        PageLook.assertNoNetwork("sweep.html", html);
        assertThat(out.resolve("k02").resolve("plan")).doesNotExist();
    }

    @Test
    void sameInputsGiveTheSameBytesAndPlansOnlyWithTheFlag() throws Exception {
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        assertThat(CliRun.of("sweep", designer.toString(), "--marks", "3..3", "--out", a.toString(), "--threads",
                "1").exitCode()).isEqualTo(0);
        assertThat(CliRun.of("sweep", designer.toString(), "--marks", "3", "--out", b.toString(), "--with-plans",
                "--date", "2026-12-01").exitCode()).isEqualTo(0);
        for (String f : List.of("sweep.json", "sweep.csv", "sweep.html", "k03/bars.csv", "k03/structures.csv",
                "k03/joints.csv")) {
            assertThat(Files.readAllBytes(b.resolve(f))).as(f).isEqualTo(Files.readAllBytes(a.resolve(f)));
        }
        assertThat(b.resolve("k03/plan/report.html")).exists();
        WrittenPlans.planFolder(b.resolve("k03"), b.resolve("k03/plan"), java.time.LocalDate.of(2026, 12, 1));
        assertThat(a.resolve("k03/plan")).doesNotExist();
    }

    @Test
    void badMarkCountsAreCommandLineProblems() {
        assertMarks("x..4", "command line: --marks: 'x..4' is not a range of mark counts (expected A..B with whole"
                + " numbers, e.g. 5..24, or one count such as 8)");
        assertMarks("4..2", "command line: --marks: the range 4..2 runs backwards (expected A..B with A at most B,"
                + " e.g. 2..4)");
        assertMarks("1..3", "command line: --marks: 1 marks are fewer than the 2 sections of members.csv (expected"
                + " at least 2: each section needs a mark of its own)");
        assertMarks("2..10", "command line: --marks: 10 marks are more than the 9 distinct lengths of members.csv"
                + " (expected at most 9: a mark per distinct length and section is already exact)");
    }

    private void assertMarks(String marks, String expected) {
        Path out = tmp.resolve("never");
        CliRun run = CliRun.of("sweep", designer.toString(), "--marks", marks, "--out", out.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.problemLines()).containsExactly(expected);
        assertThat(out).doesNotExist();
    }

    @Test
    void anOptionWithoutAFeasiblePlanKeepsItsRowAndExitsThree() throws Exception {
        KitFiles.write(tmp.resolve("catalogs"), "crates.csv", "crate,inner_length_mm,inner_width_mm,"
                + "inner_height_mm,outer_length_mm,outer_width_mm,outer_height_mm,tare_kg,max_gross_kg,stackable,"
                + "max_top_load_kg,price\nshort-box,800,600,500,880,700,600,45,600,yes,400,110\n");
        Path out = tmp.resolve("out");
        CliRun run = CliRun.of("sweep", designer.toString(), "--marks", "2..3", "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.NO_FEASIBLE_PLAN.code());
        JsonNode options = PrettyJson.mapper().readTree(out.resolve("sweep.json").toFile()).get("options");
        assertThat(options).hasSize(2);
        for (JsonNode row : options) {
            assertThat(row.get("status").asText()).isEqualTo("INFEASIBLE");
            assertThat(row.get("reason").asText()).startsWith("crating: ");
            assertThat(row.get("pareto").asBoolean()).isFalse();
        }
    }
}
