package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;
import java.util.stream.Stream;
import kitwright.validate.CsvOutput;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every CSV every command writes opens cleanly in common spreadsheet programs: UTF-8 starting with the byte-order
 * mark EF BB BF, CRLF line ends only (RFC 4180, section 2, rules 1 and 6), snake_case header names.
 */
class CsvOutputsTest {
    private static final String KIT = "sample-kits/cinema-6";
    private static final byte[] BYTE_ORDER_MARK = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    @Test
    void everyCsvOfEveryCommandHasTheByteOrderMarkCrlfAndSnakeCaseHeaders(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("plan");
        Path cut = dir.resolve("cut");
        Path nest = dir.resolve("nest");
        Path pack = dir.resolve("pack");
        Path compare = dir.resolve("compare");
        for (String[] command : List.of(
                new String[] {"plan", KIT, "--out", plan.toString(), "--date", "2026-12-03"},
                new String[] {"cut", KIT, "--out", cut.toString()},
                new String[] {"nest", KIT, "--out", nest.toString(), "--date", "2026-12-03"},
                new String[] {"pack", KIT, "--out", pack.toString()},
                new String[] {"compare", KIT, "sample-kits/alu-kiosk", "--out", compare.toString()})) {
            CliRun run = CliRun.of(command);
            assertThat(run.exitCode()).as(String.join(" ", command) + "\n" + run.err()).isZero();
        }
        WrittenPlans.planFolder(Path.of(KIT), plan, java.time.LocalDate.of(2026, 12, 3));

        assertThat(checkedCsvs(plan)).containsExactlyInAnyOrder("order.csv", "rack-pull.csv", "cut-list.csv",
                "rack-after.csv",
                "nests.csv", "assembly-order.csv", "packing-lists.csv", "manifests.csv", "load-lists.csv");
        assertThat(checkedCsvs(cut)).contains("order.csv", "rack-pull.csv", "cut-list.csv", "rack-after.csv");
        assertThat(checkedCsvs(nest)).contains("nests.csv", "assembly-order.csv");
        assertThat(checkedCsvs(pack)).contains("packing-lists.csv", "manifests.csv", "load-lists.csv");
        assertThat(checkedCsvs(compare)).containsExactly("compare.csv");
    }

    /** The CSV files of a folder (at any depth), each checked byte by byte. */
    private static TreeSet<String> checkedCsvs(Path folder) throws Exception {
        TreeSet<String> names = new TreeSet<>();
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".csv")).toList()) {
                byte[] bytes = Files.readAllBytes(file);
                assertThat(Arrays.copyOf(bytes, 3)).as(file + " starts with EF BB BF").isEqualTo(BYTE_ORDER_MARK);
                String text = new String(bytes, StandardCharsets.UTF_8);
                try {
                    CsvOutput.checkLayout(text);
                } catch (AssertionError e) {
                    throw new AssertionError(file + ": " + e.getMessage(), e);
                }
                names.add(folder.relativize(file).toString());
            }
        }
        return names;
    }
}
