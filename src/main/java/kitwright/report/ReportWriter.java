package kitwright.report;

import java.io.IOException;
import java.nio.file.Path;
import kitwright.io.InvalidInputException;
import kitwright.io.OutputFile;

/**
 * Writes {@code report.html}: UTF-8 bytes of {@link HtmlReport#render}, whole or not at all ({@link OutputFile}),
 * so a failed run never leaves half a report. The same model (same inputs and
 * date) always gives the same bytes: nothing in the page comes from the clock, the machine or the run's timing.
 */
public final class ReportWriter {
    /** The report's file name inside the plan folder. */
    public static final String FILE_NAME = "report.html";

    private ReportWriter() {
    }

    /** Writes the report to {@code file}, replacing it when it exists, and returns the file. */
    public static Path write(ReportModel model, Path file) throws IOException {
        try {
            OutputFile.write(file, HtmlReport.render(model));
        } catch (InvalidInputException e) {
            throw new IOException(e.getMessage(), e);
        }
        return file;
    }

    /** Writes {@code report.html} into a folder and returns its path. */
    public static Path writeInto(ReportModel model, Path folder) throws IOException {
        return write(model, folder.resolve(FILE_NAME));
    }
}
