package kitwright.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import kitwright.nesting.NestPlan;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes {@code nests.csv} and {@code assembly-order.csv} (UTF-8 by the caller, comma-separated, header row). The
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
        CSVFormat format = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();
        CSVPrinter printer = new CSVPrinter(out, format);
        printer.printRecord(SpreadsheetCell.row(header));
        for (List<String> row : rows) {
            printer.printRecord(SpreadsheetCell.row(row));
        }
        printer.flush();
    }
}
