package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import kitwright.io.KitWorkbooks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sample kit's CSVs turned into kit.xlsx (written with Apache POI; the main code reads it with FastExcel) plan
 * exactly as the CSV kit does: the plan is validated first, then plan.json and the cut list are compared byte for
 * byte with the CSV kit's.
 */
class KitWorkbookPlanTest {
    private static final LocalDate DATE = LocalDate.of(2026, 12, 3);

    @Test
    void cinemaSixAsOneWorkbookPlansAsItsCsvFiles(@TempDir Path temp) throws Exception {
        Path sample = Path.of("sample-kits", "cinema-6");
        String kitJson = Files.readString(sample.resolve("kit.json")).replace("../../stock-catalogs/",
                Path.of("stock-catalogs").toAbsolutePath().toString().replace('\\', '/') + "/");
        Path csvKit = Files.createDirectories(temp.resolve("csv").resolve("cinema-6"));
        Path xlsxKit = Files.createDirectories(temp.resolve("xlsx").resolve("cinema-6"));
        for (String file : List.of("bars.csv", "structures.csv", "joints.csv")) {
            Files.copy(sample.resolve(file), csvKit.resolve(file));
        }
        Files.writeString(csvKit.resolve("kit.json"), kitJson);
        Files.writeString(xlsxKit.resolve("kit.json"), kitJson);
        KitWorkbooks.kitFromCsvFolder(csvKit, xlsxKit);

        Path csvOut = temp.resolve("csv-plan");
        Path xlsxOut = temp.resolve("xlsx-plan");
        assertThat(CliRun.of("plan", csvKit.toString(), "--out", csvOut.toString(), "--date", DATE.toString())
                .exitCode()).isZero();
        CliRun run = CliRun.of("plan", xlsxKit.toString(), "--out", xlsxOut.toString(), "--date", DATE.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();

        WrittenPlans.planFolder(xlsxKit, xlsxOut, DATE);
        for (String file : List.of("plan.json", "cut-list.csv", "order.csv")) {
            assertThat(Files.readString(xlsxOut.resolve(file))).as(file)
                    .isEqualTo(Files.readString(csvOut.resolve(file)));
        }
        assertThat(Files.readString(xlsxOut.resolve("report.html"))).contains("Kit tables", "kit.xlsx, sheets bars,"
                + " structures, joints");
        assertThat(CliRun.of("check", xlsxKit.toString()).exitCode()).isZero();
    }
}
