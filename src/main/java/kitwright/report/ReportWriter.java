package kitwright.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes {@code report.html}: UTF-8 bytes of {@link HtmlReport#render}, first to a temporary file beside the
 * target and then moved into place, so a failed run never leaves half a report. The same model (same inputs and
 * date) always gives the same bytes: nothing in the page comes from the clock, the machine or the run's timing.
 */
public final class ReportWriter {
    /** The report's file name inside the plan folder. */
    public static final String FILE_NAME = "report.html";

    private ReportWriter() {
    }

    /** Writes the report to {@code file}, replacing it when it exists, and returns the file. */
    public static Path write(ReportModel model, Path file) throws IOException {
        byte[] bytes = HtmlReport.render(model).getBytes(StandardCharsets.UTF_8);
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path temporary = dir.resolve("." + file.getFileName() + ".part");
        try {
            Files.write(temporary, bytes);
            try {
                Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
        return file;
    }

    /** Writes {@code report.html} into a folder and returns its path. */
    public static Path writeInto(ReportModel model, Path folder) throws IOException {
        return write(model, folder.resolve(FILE_NAME));
    }
}
