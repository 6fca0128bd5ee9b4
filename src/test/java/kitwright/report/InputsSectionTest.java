package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** How the report names the kit's files: the same whether the kit folder was typed relative or absolute. */
class InputsSectionTest {
    @TempDir
    Path temp;

    @Test
    void aCatalogOutsideTheKitIsNamedTheSameForARelativeAndAnAbsoluteKitFolder() throws Exception {
        Path kit = Files.createDirectories(temp.resolve("kits").resolve("kiosk")).toAbsolutePath();
        Path relativeKit = Path.of("").toAbsolutePath().relativize(kit);
        Path catalog = temp.resolve("catalogs").resolve("tube.csv").toAbsolutePath();
        Path typedFromTheKit = relativeKit.resolve("../../catalogs/tube.csv");
        assertThat(InputsSection.file(kit, catalog)).isEqualTo("tube.csv");
        assertThat(InputsSection.file(relativeKit, catalog)).isEqualTo("tube.csv");
        assertThat(InputsSection.file(relativeKit, typedFromTheKit)).isEqualTo("tube.csv");
        assertThat(InputsSection.file(kit, kit.resolve("../../catalogs/tube.csv"))).isEqualTo("tube.csv");
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
