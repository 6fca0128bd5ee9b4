package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringWriter;
import java.util.List;
import kitwright.compare.CompareCsv;
import kitwright.compare.OptionSummary;
import kitwright.model.Status;
import org.junit.jupiter.api.Test;

/**
 * The second guard against CSV injection. Source: OWASP, "CSV Injection" (cells beginning with =, +, -, @, tab or
 * carriage return are run by spreadsheets; prefix them with a single quote so they are read as text).
 */
class SpreadsheetCellTest {

    @Test
    void cellsASpreadsheetWouldRunGetALeadingQuote() {
        for (String cell : List.of("=HYPERLINK(\"x\")", "+SUM(A1)", "-2+3", "@SUM(1)", "\tA1", "\rA1", "-A1", "-")) {
            assertThat(SpreadsheetCell.safe(cell)).as(cell).isEqualTo("'" + cell);
        }
    }

    @Test
    void negativeNumbersAndPlainTextStayAsTheyAre() {
        for (String cell : List.of("-12", "-0.5", "-1.5E3", "12.5", "A1", "CHS 48.3x3.2", "", "a=b")) {
            assertThat(SpreadsheetCell.safe(cell)).as(cell).isEqualTo(cell);
        }
        assertThat(SpreadsheetCell.safe(null)).isNull();
        assertThat(SpreadsheetCell.row("=x", null, -3, 2.5)).containsExactly("'=x", "", "-3", "2.5");
    }

    @Test
    void compareCsvWritesAKitNameFromAFolderAsText() throws Exception {
        // a kit without kit.json is named after its folder, which no reader checks
        OptionSummary option = new OptionSummary("=cmd|' /C calc'!A0", 6, 300, 750, 2.5, 80, 480000.0, 5000.0, 4.0,
                1.5, 2.5, 1500.0, 1700.0, 1720.0, 2635.0, 30, 4, 2, 1800.0, Status.OPTIMAL);
        StringWriter out = new StringWriter();

        CompareCsv.write(List.of(option), out);

        String row = out.toString().lines().skip(1).findFirst().orElseThrow();
        assertThat(row.replace("\"", "")).startsWith("'=cmd|' /C calc'!A0,6,");
    }
}
