package kitwright.compare;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import kitwright.io.InvalidInputException;
import kitwright.io.OutputFolder;

/**
 * Writes {@code compare.json}, {@code compare.csv} and {@code compare.html} into a result folder that appears whole
 * or not at all ({@link OutputFolder}: written beside the target, then moved into place; an existing target is
 * replaced only when kitwright wrote it or it is empty).
 */
public final class CompareFiles {
    public static final String JSON = "compare.json";
    public static final String CSV = "compare.csv";
    public static final String HTML = "compare.html";

    private CompareFiles() {
    }

    /** Writes the three files into an output folder that the caller commits. */
    public static void write(OutputFolder folder, List<OptionSummary> options) throws IOException {
        folder.write(JSON, CompareJson.toJson(options));
        StringWriter csv = new StringWriter();
        CompareCsv.write(options, csv);
        folder.write(CSV, csv.toString());
        folder.write(HTML, CompareHtml.render(options));
    }

    /**
     * Writes the three files into {@code out} and moves the folder into place.
     *
     * @throws InvalidInputException when {@code out} is a file or a folder kitwright did not write
     */
    public static void write(Path out, List<OptionSummary> options) throws IOException, InvalidInputException {
        try (OutputFolder folder = OutputFolder.create(out)) {
            write(folder, options);
            folder.commit();
        }
    }
}
