package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.NoSuchFileException;
import java.util.Locale;

/**
 * One line for every failure that is not bad input: out of memory (with what to do), a full disk or another I/O
 * error (with the file and the reason), and else an internal error naming the place in the code. A person running
 * kitwright needs what to do, not a stack trace; with the environment variable {@value #TRACE} set, the stack trace
 * follows the line for a developer.
 */
final class Failures {
    static final String TRACE = "KITWRIGHT_TRACE";

    private Failures() {
    }

    /** Prints the line (and the trace when asked for) and returns the exit code. */
    static int report(Throwable failure, PrintWriter err) {
        err.println(line(failure));
        if (System.getenv(TRACE) != null) {
            failure.printStackTrace(err);
        }
        err.flush();
        return ExitCode.INTERNAL_ERROR.code();
    }

    /** The one line for {@code failure}; the cause chain is searched for memory and I/O failures. */
    static String line(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (t instanceof OutOfMemoryError) {
                return outOfMemory(Runtime.getRuntime().maxMemory());
            }
            if (t instanceof IOException io) {
                return "kitwright: cannot read or write a file: " + describe(io) + "; nothing was written.";
            }
        }
        StackTraceElement place = failure.getStackTrace().length > 0 ? failure.getStackTrace()[0] : null;
        return "kitwright: internal error (a bug): " + failure + (place == null ? "" : " at " + place)
                + "; nothing was written. Please report it with the input files (" + TRACE + "=1 prints the"
                + " details).";
    }

    /** What to do when the Java heap is full: the heap limit now and how to raise it. */
    static String outOfMemory(long maxHeapBytes) {
        long megabytes = maxHeapBytes >> 20;
        String larger = megabytes >= 4096 ? (2 * megabytes / 1024) + "g" : "4g";
        return String.format(Locale.ROOT, "kitwright: out of memory: this kit needs more than the %d MB the Java"
                + " heap may use; nothing was written. Run it with a larger heap, e.g. 'java -Xmx%s -jar"
                + " kitwright.jar ...', or set JAVA_TOOL_OPTIONS=-Xmx%s in the environment (every java launch takes"
                + " it), within the memory the machine has.", megabytes, larger, larger);
    }

    /** The file and the reason in words, e.g. "out/plan.json: no space left on device (free some space...)". */
    static String describe(IOException e) {
        IOException io = e;
        if (e.getCause() instanceof IOException cause && e.getMessage() != null && e.getMessage().equals(
                String.valueOf(cause))) {
            io = cause;
        }
        String reason = io instanceof AccessDeniedException ? "permission denied"
                : io instanceof NoSuchFileException ? "no such file or folder"
                : io instanceof FileSystemLoopException ? "a symbolic link loop"
                : io instanceof FileSystemException f && f.getReason() != null ? f.getReason()
                : io.getMessage() != null ? io.getMessage() : io.getClass().getSimpleName();
        String lower = reason.toLowerCase(Locale.ROOT);
        if (lower.contains("no space left") || lower.contains("disk quota")) {
            reason = "no space left on the disk (free some space, or write to another disk)";
        } else if (lower.contains("too many levels of symbolic links")) {
            reason = "a symbolic link loop";
        }
        String file = io instanceof FileSystemException f && f.getFile() != null ? f.getFile() + ": " : "";
        return file + reason;
    }
}
