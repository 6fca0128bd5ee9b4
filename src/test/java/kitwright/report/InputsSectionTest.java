package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * "Inputs used": every catalog with its path from the kit folder, the same whether the kit folder was typed relative
 * or absolute, and every setting that shaped the plan.
 */
class InputsSectionTest {
    @TempDir
    Path temp;

    @Test
    void aCatalogOutsideTheKitIsNamedTheSameForARelativeAndAnAbsoluteKitFolder() throws Exception {
        Path kit = Files.createDirectories(temp.resolve("kits").resolve("kiosk")).toAbsolutePath();
        Path relativeKit = Path.of("").toAbsolutePath().relativize(kit);
        Path catalog = temp.resolve("catalogs").resolve("tube.csv").toAbsolutePath();
        Path typedFromTheKit = relativeKit.resolve("../../catalogs/tube.csv");
        String path = "../../catalogs/tube.csv";
        assertThat(InputsSection.file(kit, catalog)).isEqualTo(path);
        assertThat(InputsSection.file(relativeKit, catalog)).isEqualTo(path);
        assertThat(InputsSection.file(relativeKit, typedFromTheKit)).isEqualTo(path);
        assertThat(InputsSection.file(kit, kit.resolve("../../catalogs/tube.csv"))).isEqualTo(path);
    }

    @Test
    void theRealReportListsEveryCatalogAndEverySettingThatShapedThePlan() throws Exception {
        kitwright.plan.PlanResult result = kitwright.plan.Planner.run(
                kitwright.io.KitReader.read(Path.of("sample-kits", "alu-kiosk")), kitwright.plan.Planner.Options.DEFAULT,
                kitwright.plan.PlanProgress.NONE);
        kitwright.validate.PlanValidator.validate(result);
        String html = PlanFiles.of(result, java.time.LocalDate.of(2026, 12, 3)).get("report.html");
        String inputs = html.substring(html.indexOf("id=\"inputs\""));
        for (String row : new String[] {"kitwright", "Tube catalog", "Materials catalog", "Crate catalog",
            "Vehicle catalog", "Kerf", "End trim", "Minimum remnant", "End deduction", "Structures", "Time limit",
            "Nesting fit", "Bundle mass limit", "Joint box", "Service-life spares"}) {
            assertThat(inputs).as(row).contains(">" + row + "</th>");
        }
        assertThat(inputs).contains("../../stock-catalogs/aluminium-tube.csv", "../../stock-catalogs/materials.csv",
                "../../stock-catalogs/crates.csv", "../../stock-catalogs/vehicles.csv", "worst-case tolerances",
                "20 cycles");
    }

    @Test
    void aCatalogInsideTheKitIsNamedFromTheKitFolderEitherWay() throws Exception {
        Path kit = Files.createDirectories(temp.resolve("kiosk")).toAbsolutePath();
        Path relativeKit = Path.of("").toAbsolutePath().relativize(kit);
        assertThat(InputsSection.file(kit, kit.resolve("catalogs/tube.csv"))).isEqualTo("catalogs/tube.csv");
        assertThat(InputsSection.file(relativeKit, relativeKit.resolve("catalogs/tube.csv")))
                .isEqualTo("catalogs/tube.csv");
        assertThat(InputsSection.file(relativeKit, kit.resolve("catalogs/tube.csv"))).isEqualTo("catalogs/tube.csv");
    }
}
