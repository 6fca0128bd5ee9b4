package kitwright.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import kitwright.nesting.NestPlan;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes {@code nests.csv} and {@code assembly-order.csv} (laid out by {@link CsvFile}, UTF-8 by the caller). The
 * writer is flushed, not closed.
 */
public final class NestingCsv {
    private NestingCsv() {
    }

    public static void writeNests(NestPlan plan, Writer out) throws IOException {
        write(NestingTables.NESTS_HEADER, NestingTables.nests(plan), out);
    }

    public static void writeAssemblyOrder(NestPlan plan, Writer out) throws IOException {
        write(NestingTables.ASSEMBLY_HEADER, NestingTables.assemblyOrder(plan), out);
    }

    private static void write(List<String> header, List<List<String>> rows, Writer out) throws IOException {
        CSVPrinter printer = CsvFile.printer(out, header);
        for (List<String> row : rows) {
            printer.printRecord(SpreadsheetCell.row(row));
        }
        printer.flush();
    }
}
