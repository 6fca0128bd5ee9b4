package kitwright.report;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.LinkedHashMap;
import java.util.Map;
import kitwright.nesting.NestPlan;

/**
 * The tables the nesting stage adds to a result folder, as text (pure; the caller writes them): {@code nests.csv}
 * and {@code assembly-order.csv}. The drawings go into the report through {@link NestingSection}.
 */
public final class NestingFiles {
    public static final String NESTS_CSV = "nests.csv";
    public static final String ASSEMBLY_ORDER_CSV = "assembly-order.csv";

    private NestingFiles() {
    }

    /** File name to content, in a fixed order. */
    public static Map<String, String> files(NestPlan plan) {
        Map<String, String> files = new LinkedHashMap<>();
        try {
            StringWriter nests = new StringWriter();
            NestingCsv.writeNests(plan, nests);
            files.put(NESTS_CSV, nests.toString());
            StringWriter order = new StringWriter();
            NestingCsv.writeAssemblyOrder(plan, order);
            files.put(ASSEMBLY_ORDER_CSV, order.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringWriter does not fail
        }
        return files;
    }
}
