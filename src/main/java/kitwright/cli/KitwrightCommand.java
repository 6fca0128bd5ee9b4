package kitwright.cli;

import java.io.PrintWriter;
import java.util.List;
import kitwright.io.InvalidInputException;
import kitwright.io.Problem;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The root command: {@code kitwright <command> ...}. */
@Command(name = "kitwright",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Turns a reusable bar kit into a purchase order, saw sheets, nested tube bundles, crates and truckloads.",
            "",
            "A kit folder holds kit.json, bars.csv and optionally structures.csv and joints.csv; it names a tube",
            "catalog (stock lengths, prices, rack offcuts) and materials, crate and vehicle catalogs.",
            "Start with 'kitwright check KIT_DIR', then 'kitwright plan KIT_DIR --out DIR'."
        },
        footer = {
            "",
            "Exit codes: 0 ok, 1 out of memory, I/O error or internal error (one line says which), 2 invalid input (bad",
            "arguments or data, or an output that would replace an input or a file of yours), 3 no feasible plan.",
            "",
            "kitwright plans material and logistics only. It does not check structural capacity, joints, lifting",
            "or load securing; follow local codes and licensed professionals."
        },
        subcommands = {CommandLine.HelpCommand.class, CheckCommand.class, PlanCommand.class, CutCommand.class,
            NestCommand.class, PackCommand.class, CompareCommand.class, SweepCommand.class})
public final class KitwrightCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "Missing command (expected one of check, plan, cut, nest, pack, compare, sweep).");
    }

    /** Builds the command line with kitwright's exit codes and error handling. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new KitwrightCommand());
        cl.setUsageHelpWidth(110);
        cl.setExitCodeExceptionMapper(KitwrightCommand::exitCodeOf);
        cl.setExecutionExceptionHandler(KitwrightCommand::handleExecutionException);
        // Errors (out of memory) pass picocli's handler by; catch them here so they too print one line.
        CommandLine.IExecutionStrategy last = new CommandLine.RunLast();
        cl.setExecutionStrategy(parsed -> {
            try {
                return last.execute(parsed);
            } catch (Error e) {
                return Failures.report(e, parsed.commandSpec().commandLine().getErr());
            }
        });
        cl.setParameterExceptionHandler((ex, args) -> {
            PrintWriter err = ex.getCommandLine().getErr();
            List<String> lines = ArgumentHints.explain(ex, args);
            err.println("kitwright: " + lines.get(0));
            lines.subList(1, lines.size()).forEach(err::println);
            err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            err.flush();
            return ExitCode.INVALID_INPUT.code();
        });
        return cl;
    }

    /** Runs kitwright with the given arguments and returns the exit code. */
    public static int execute(String... args) {
        return commandLine().execute(args);
    }

    private static int exitCodeOf(Throwable t) {
        if (t instanceof InvalidInputException || t instanceof CommandLine.ParameterException) {
            return ExitCode.INVALID_INPUT.code();
        }
        return ExitCode.INTERNAL_ERROR.code();
    }

    private static int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        if (ex instanceof InvalidInputException invalid) {
            for (Problem p : invalid.problems()) {
                err.println(p);
            }
            err.println("kitwright: " + invalid.problems().size()
                    + " problem(s) in the input; nothing was written.");
            err.flush();
            return ExitCode.INVALID_INPUT.code();
        }
        return Failures.report(ex, err);
    }
}
