package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import kitwright.compare.OptionPlanner;
import kitwright.io.KitFiles;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * One line for every failure, never a stack trace (README, exit codes). The failures come through seams: a
 * planner that runs out of memory or meets a full disk (compare plans on worker threads, so the failure arrives
 * wrapped), and a command whose own thread runs out of memory. A real full disk (a 256 KB tmpfs) gives the same
 * line; that run is described in the README's exit codes.
 */
class FailureLineTest {
    @TempDir
    Path dir;

    private CliRun compareWith(OptionPlanner planner) {
        CommandLine cl = KitwrightCommand.commandLine();
        ((CompareCommand) cl.getSubcommands().get("compare").getCommand()).usePlanner(planner);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute("compare", "a", "b", "--out", dir.resolve("cmp").toString(), "--threads", "1");
        // progress lines ("compare: planning option 1/2: a") come first; the failure is what follows them
        String failure = err.toString().lines().filter(line -> !line.startsWith("compare: "))
                .collect(java.util.stream.Collectors.joining("\n", "", "\n"));
        return new CliRun(code, out.toString(), failure);
    }

    @Test
    void outOfMemoryOnAWorkerThreadSaysWhatToDoInOneLine() {
        CliRun run = compareWith(kit -> {
            throw new OutOfMemoryError("Java heap space");
        });

        assertThat(run.exitCode()).isEqualTo(ExitCode.INTERNAL_ERROR.code());
        assertThat(run.err().lines()).hasSize(1);
        assertThat(run.err()).startsWith("kitwright: out of memory: ").contains("-Xmx", "JAVA_TOOL_OPTIONS")
                .doesNotContain("\tat ", "OutOfMemoryError");
        assertThat(dir.resolve("cmp")).doesNotExist();
    }

    @Test
    void outOfMemoryOnTheCommandThreadSaysWhatToDoInOneLine() {
        CommandLine cl = KitwrightCommand.commandLine();
        cl.addSubcommand("pack-oom", new PackCommand(kit -> {
            throw new OutOfMemoryError("Java heap space");
        }));
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err, true));
        cl.setOut(new PrintWriter(new StringWriter(), true));

        int code = cl.execute("pack-oom", "sample-kits/alu-kiosk");

        assertThat(code).isEqualTo(ExitCode.INTERNAL_ERROR.code());
        assertThat(err.toString()).contains("kitwright: out of memory: ").doesNotContain("\tat ");
    }

    @Test
    void aFullDiskIsOneLineNamingTheFile() {
        CliRun run = compareWith(kit -> {
            throw new UncheckedIOException(new FileSystemException("out/compare.html", null,
                    "No space left on device"));
        });

        assertThat(run.exitCode()).isEqualTo(ExitCode.INTERNAL_ERROR.code());
        assertThat(run.err().lines()).containsExactly("kitwright: cannot read or write a file: out/compare.html: no"
                + " space left on the disk (free some space, or write to another disk); nothing was written.");
    }

    @Test
    void aBugIsOneLineNamingThePlaceInTheCode() {
        CliRun run = compareWith(kit -> {
            throw new IllegalStateException("a stage broke");
        });

        assertThat(run.exitCode()).isEqualTo(ExitCode.INTERNAL_ERROR.code());
        assertThat(run.err().lines()).hasSize(1);
        assertThat(run.err()).startsWith("kitwright: internal error (a bug): ").contains("a stage broke", " at ");
    }

    @Test
    void theReasonsAreInWords() {
        assertThat(Failures.describe(new AccessDeniedException("/data/kit/bars.csv")))
                .isEqualTo("/data/kit/bars.csv: permission denied");
        assertThat(Failures.describe(new IOException("No space left on device"))).startsWith("no space left");
        assertThat(Failures.outOfMemory(1L << 30)).contains("the 1024 MB the Java heap may use", "-Xmx4g");
    }

    @Test
    void anUnreadableKitSaysPermissionDenied() throws Exception {
        // As root every file is readable, so this runs only for other users; InputBytesTest checks the wording
        // through the exception the file system gives, which works as root too.
        Path kit = KitFiles.kit(dir.resolve("kit"), "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,4\n");
        Path closed = KitFiles.kit(dir.resolve("closed"), "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,4\n");
        Files.setPosixFilePermissions(kit.resolve("bars.csv"), Set.of());
        Files.setPosixFilePermissions(closed, Set.of());
        try {
            Assumptions.assumeFalse(Files.isReadable(kit.resolve("bars.csv")), "as root mode 000 does not stop reading");
            CliRun file = CliRun.of("check", kit.toString());
            CliRun folder = CliRun.of("check", closed.toString());
            assertThat(file.err()).contains("bars.csv: cannot read the file: permission denied");
            assertThat(folder.err()).contains("closed: cannot read the folder: permission denied")
                    .doesNotContain("not found");
        } finally {
            Files.setPosixFilePermissions(closed, PosixFilePermissions.fromString("rwx------"));
        }
    }
}
