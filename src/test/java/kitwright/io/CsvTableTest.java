package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CsvTableTest {
    private static final CsvColumns COLUMNS = new CsvColumns(List.of("mark", "quantity"), List.of("note"));

    @Test
    void rowsCarryTheLineTheyStartOnCountingTheHeaderAsLineOne(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("t.csv");
        // line 1 header (BOM, spaces around names), 2-3 a quoted value over two lines, 4 blank, 5 B,
        // 6 a row of empty values, 7 C, then a blank trailing line
        String text = "\uFEFF mark , quantity ,note\r\nA,1,\"first,\r\nsecond\"\r\n\r\nB,2,\r\n,,\r\nC,3,x\r\n\r\n";
        Files.write(file, text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        Problems problems = new Problems();

        CsvTable table = CsvTable.read(file, COLUMNS, "test rows", problems).orElseThrow();

        assertThat(problems.list()).isEmpty();
        assertThat(table.rows()).extracting(CsvRow::line).containsExactly(2, 5, 7);
        assertThat(table.rows()).extracting(r -> r.text("mark")).containsExactly("A", "B", "C");
        assertThat(table.rows().get(0).text("note")).isEqualTo("first,\r\nsecond");
    }

    @Test
    void aHeaderNameInAnyLetterCaseReadsAsTheKnownColumn(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("t.csv");
        Files.writeString(file, "Mark,QUANTITY\nA,1\n");
        Problems problems = new Problems();

        CsvTable table = CsvTable.read(file, COLUMNS, "test rows", problems).orElseThrow();

        assertThat(problems.list()).isEmpty();
        assertThat(table.rows().get(0).text("mark")).isEqualTo("A");
        assertThat(table.rows().get(0).text("quantity")).isEqualTo("1");
    }

    @Test
    void aHeaderNameTwiceInDifferentCaseIsReportedOnce(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("t.csv");
        Files.writeString(file, "mark,Mark,quantity\nA,B,1\n");
        Problems problems = new Problems();

        assertThat(CsvTable.read(file, COLUMNS, "test rows", problems)).isEmpty();

        assertThat(problems.list()).singleElement().asString().endsWith(
                "t.csv:1: mark: the column appears twice (expected each column once)");
    }

    @Test
    void numbersAreReadStrictly(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("t.csv");
        Files.writeString(file, "mark,quantity\nA,1e3\nB,0x10\nC,+4\nD,.5\nE,NaN\n");
        Problems problems = new Problems();

        List<Double> values = CsvTable.read(file, COLUMNS, "test rows", problems).orElseThrow().rows().stream()
                .map(r -> r.number("quantity", 0, true, "a number")).toList();

        assertThat(values).containsExactly(null, null, 4.0, 0.5, null);
        assertThat(problems.list()).extracting(Problem::line).containsExactly(2, 3, 6);
    }

    @Test
    void nearestNameSuggestsOnlyCloseNames() {
        assertThat(NearestName.of("lenght_mm", List.of("length_mm", "quantity"))).contains("length_mm");
        assertThat(NearestName.of("colour", List.of("length_mm", "quantity"))).isEmpty();
        assertThat(NearestName.distance("kitten", "sitting")).as("Levenshtein's classic example").isEqualTo(3);
    }
}
