package kitwright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import picocli.CommandLine;

/** Runs kitwright in-process, as a user would, with stdout and stderr captured. */
public record CliRun(int exitCode, String out, String err) {

    public static CliRun of(String... args) {
        CommandLine commandLine = KitwrightCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        commandLine.setOut(new PrintWriter(out, true));
        commandLine.setErr(new PrintWriter(err, true));
        int exitCode = commandLine.execute(args);
        return new CliRun(exitCode, out.toString(), err.toString());
    }

    /** The problem lines of stderr (without the closing count line). */
    public List<String> problemLines() {
        return err.lines().filter(line -> !line.startsWith("kitwright: ")).toList();
    }
}
