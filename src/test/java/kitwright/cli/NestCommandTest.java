package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.model.NestTolerance;
import kitwright.nesting.NestPlan;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class NestCommandTest {
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

    private static NestPlan read(Path json) throws IOException {
        return PrettyJson.mapper().readValue(Files.readString(json), NestPlan.class);
    }

    @Test
    @DisplayName("nest KIT --out --json: report, nests.csv, assembly order and JSON, every cut piece nested once")
    void nestsASampleKit() throws Exception {
        Path target = temp.resolve("nest");
        Path json = temp.resolve("nesting.json");
        int code = run("nest", "sample-kits/alu-kiosk", "--out", target.toString(), "--json", json.toString(),
                "--date", "2026-12-01");
        assertThat(code).as(err.toString()).isZero();
        Kit kit = KitReader.read(Path.of("sample-kits/alu-kiosk"));
        CutPlan cuts = kitwright.spares.SparesStage.cut(kit, false, null, CutProgress.NONE).plan();
        NestPlan plan = read(json);
        NestPlanValidator.validate(kit, cuts, plan);
        int pieces = cuts.sections().stream().flatMap(s -> s.patterns().stream())
                .mapToInt(p -> p.count() * p.cuts().size()).sum();
        assertThat(Files.readAllLines(target.resolve("nests.csv"))).hasSize(pieces + 1);
        assertThat(Files.readAllLines(target.resolve("assembly-order.csv")))
                .hasSize(pieces - plan.bundles().size() + 1);
        assertThat(Files.readString(target.resolve("report.html"))).contains("Nested bundles")
                .contains("Out-of-roundness and straightness are not counted");
        assertThat(out.toString()).contains("bundles (lower bound").contains("Fit rule: Worst case");
        assertThat(err.toString()).contains("timing:");
        assertThat(out.toString()).doesNotContain("timing");

        Path again = temp.resolve("again.json");
        assertThat(run("nest", "sample-kits/alu-kiosk", "--json", again.toString())).isZero();
        assertThat(Files.readString(again)).isEqualTo(Files.readString(json));
    }

    @Test
    @DisplayName("a fractional bundle bound says the whole count it proves: 154.33, so at least 155; 46 stays 46")
    void bundleBoundText() {
        assertThat(PlanSummaryText.bound(154.333)).isEqualTo("154.33, so at least 155");
        assertThat(PlanSummaryText.bound(46.0)).isEqualTo("46");
        assertThat(PlanSummaryText.bound(46.0000000001)).isEqualTo("46");
    }

    @Test
    @DisplayName("--tolerance nominal overrides kit.json and the JSON says which rule was used")
    void nominalOption() throws Exception {
        Path json = temp.resolve("nominal.json");
        assertThat(run("nest", "sample-kits/acrylic-vitrine", "--tolerance", "nominal", "--json", json.toString()))
                .as(err.toString()).isZero();
        assertThat(read(json).tolerance()).isEqualTo(NestTolerance.NOMINAL);
        assertThat(Files.readString(json)).contains("\"tolerance\": \"nominal\"");
    }

    @Test
    @DisplayName("A fit rule that does not exist is invalid input (exit 2), nothing written")
    void badTolerance() {
        Path json = temp.resolve("x.json");
        assertThat(run("nest", "sample-kits/alu-kiosk", "--tolerance", "loose", "--json", json.toString()))
                .isEqualTo(2);
        assertThat(err.toString()).contains("'loose' is not a fit rule (expected worst-case or nominal)");
        assertThat(json).doesNotExist();
    }

    @Test
    @DisplayName("A bar heavier than maxBundleMassKg: exit 3, the plan is still written and the mark named")
    void barAboveTheMassLimit() throws Exception {
        Path kit = Files.createDirectories(temp.resolve("heavy"));
        Files.writeString(kit.resolve("kit.json"), "{\"stockCatalog\": \"catalog.csv\", \"maxBundleMassKg\": 20}\n");
        Files.writeString(kit.resolve("bars.csv"), """
                mark,section,length_mm,quantity
                A1,CHS 88.9x3.2,5000,2
                E1,CHS 33.7x2.6,1000,4
                """);
        Files.writeString(kit.resolve("catalog.csv"), """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin
                CHS 88.9x3.2,steel,88.9,3.2,6000,40.00,,mill
                CHS 33.7x2.6,steel,33.7,2.6,6000,17.35,,mill
                """);
        Files.writeString(kit.resolve("materials.csv"), """
                material,density_kg_m3,co2e_kg_per_kg,source
                steel,7850,1.55,EN 1993-1-1 (density); invented CO2e for the test
                """);
        Path json = temp.resolve("heavy.json");
        int code = run("nest", kit.toString(), "--json", json.toString());
        assertThat(code).as(err.toString()).isEqualTo(3);
        assertThat(err.toString()).contains("A1").contains("heavier than the bundle mass limit");
        assertThat(read(json).bundles()).isNotEmpty();
    }
}
