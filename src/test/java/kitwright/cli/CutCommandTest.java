package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import kitwright.cutting.CutPlan;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class CutCommandTest {
    @TempDir
    Path temp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = KitwrightCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    /** A kit whose second section can only use two rack offcuts, too few for its bars (invented data). */
    private Path kitWithShortRack() throws IOException {
        Path kit = Files.createDirectories(temp.resolve("short-rack"));
        Files.writeString(kit.resolve("kit.json"), "{\"stockCatalog\": \"catalog.csv\", \"kerfMm\": 2.0}\n");
        Files.writeString(kit.resolve("bars.csv"), """
                mark,section,length_mm,quantity
                D1,CHS 48.3x3.2,2330,7
                C1,CHS 60.3x3.2,2845,2
                C2,CHS 60.3x3.2,1600,1
                """);
        Files.writeString(kit.resolve("catalog.csv"), """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin
                CHS 48.3x3.2,steel,48.3,3.2,6000,30.96,,mill
                CHS 60.3x3.2,steel,60.3,3.2,3000,2.00,2,rack
                """);
        return kit;
    }

    @Test
    void cutsASampleKitAndWritesTheFourFilesWhole() throws Exception {
        Path target = temp.resolve("cut");
        int code = run("cut", "sample-kits/cinema-6", "--out", target.toString(), "--json",
                temp.resolve("plan.json").toString());
        assertThat(code).as(err.toString()).isZero();
        Kit kit = KitReader.read(Path.of("sample-kits/cinema-6"));
        CutPlan plan = PrettyJson.mapper().readValue(Files.readString(target.resolve("cutting.json")), CutPlan.class);
        CutPlanValidator.validate(kit, plan);
        assertThat(target.resolve("cut-list.csv")).exists();
        assertThat(target.resolve("order.csv")).exists();
        assertThat(target.resolve("rack-after.csv")).exists();
        assertThat(target.resolve("rack-pull.csv")).exists();
        assertThat(Files.readString(temp.resolve("plan.json"))).isEqualTo(Files.readString(target.resolve("cutting.json")));
        assertThat(out.toString()).contains("Stock to buy").contains("Total: cost");
        assertThat(err.toString()).contains("lower bound");
    }

    /**
     * Hundredths that once overran the stock: kerf 1.04 mm, no trim, ten 599.1 mm bars on 6000 mm stock. Ten take
     * 10 x 599.1 + 9 x 1.04 = 6000.36 mm, so one stock piece holds nine; the plan used to claim one piece (OPTIMAL)
     * with the tenth piece ending at 6000.36 mm.
     */
    @Test
    void hundredthsOfKerfNeverOverrunTheStockAndThePrintedKerfIsTheOneGiven() throws Exception {
        Path kit = Files.createDirectories(temp.resolve("hundredths"));
        Files.writeString(kit.resolve("kit.json"),
                "{\"stockCatalog\": \"catalog.csv\", \"kerfMm\": 1.04, \"trimMm\": 0, \"minRemnantMm\": 400}\n");
        Files.writeString(kit.resolve("bars.csv"), "mark,section,length_mm,quantity\nA1,AL 30x2,599.1,10\n");
        Files.writeString(kit.resolve("catalog.csv"), """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin
                AL 30x2,aluminium,30,2,6000,19.38,,mill
                """);
        Path target = temp.resolve("hundredths-out");
        assertThat(run("cut", kit.toString(), "--out", target.toString())).as(err.toString()).isZero();
        CutPlan plan = PrettyJson.mapper().readValue(Files.readString(target.resolve("cutting.json")), CutPlan.class);
        CutPlanValidator.validate(KitReader.read(kit), plan);
        CutPlanValidator.validateCutList(plan, Files.readString(target.resolve("cut-list.csv")));
        assertThat(plan.sections().get(0).stockPieces()).isEqualTo(2);
        assertThat(out.toString()).contains("(kerf 1.04 mm, trim 0.0 mm per end");
    }

    @Test
    void aSectionWithTooFewRackOffcutsExitsThreeAndTheOthersAreStillWritten() throws Exception {
        Path json = temp.resolve("cutting.json");
        int code = run("cut", kitWithShortRack().toString(), "--json", json.toString());
        assertThat(code).isEqualTo(ExitCode.NO_FEASIBLE_PLAN.code());
        JsonNode sections = PrettyJson.mapper().readTree(Files.readString(json)).get("sections");
        assertThat(sections).hasSize(2);
        assertThat(sections.get(0).get("status").asText()).isEqualTo("OPTIMAL");
        assertThat(sections.get(1).get("status").asText()).isEqualTo("INFEASIBLE");
        assertThat(sections.get(1).get("reason").asText()).contains("C2").contains("1600 mm of bar length missing");
        assertThat(sections.get(1).get("patterns")).isEmpty();
        assertThat(out.toString()).contains("CHS 60.3x3.2: INFEASIBLE");
    }

    @Test
    void standAloneFilesWithoutMaterialsWarnThatMassesAreLeftOut() throws Exception {
        Path kit = kitWithShortRack();
        int code = run("cut", "--bars", kit.resolve("bars.csv").toString(), "--stock",
                kit.resolve("catalog.csv").toString(), "--kerf", "3", "--trim", "0");
        assertThat(code).isEqualTo(ExitCode.NO_FEASIBLE_PLAN.code());
        assertThat(err.toString()).contains("masses are left out");
        assertThat(out.toString()).contains("kerf 3.0 mm, trim 0.0 mm");
    }

    @Test
    void badArgumentsExitTwo() throws Exception {
        assertThat(run("cut")).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run("cut", "sample-kits/cinema-6", "--bars", "x.csv")).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run("cut", "sample-kits/cinema-6", "--kerf", "-1")).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(err.toString()).contains("--kerf -1.0 is not allowed");
    }

    @Test
    void aSectionTheTimeLimitStoppedSaysSoInCuttingJsonAndOnTheConsole() throws Exception {
        Path json = temp.resolve("cutting.json");
        int code = run("cut", "sample-kits/cinema-6", "--time-limit", "0.000001", "--json", json.toString());
        assertThat(code).as(err.toString()).isZero();
        CutPlan plan = PrettyJson.mapper().readValue(Files.readString(json), CutPlan.class);
        CutPlanValidator.validate(KitReader.read(Path.of("sample-kits/cinema-6")), plan);
        var feasible = plan.sections().stream().filter(s -> s.status() == kitwright.model.Status.FEASIBLE).toList();
        assertThat(feasible).isNotEmpty().allSatisfy(s -> {
            assertThat(s.reason()).isEqualTo("stopped by the time limit");
            assertThat(out.toString()).contains(s.section() + ": FEASIBLE, stopped by the time limit");
        });
    }
}
