package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.function.Consumer;
import kitwright.compare.CompareFiles;
import kitwright.compare.OptionPlanner;
import kitwright.compare.OptionRunner;
import kitwright.compare.OptionSummary;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.io.OutputFolder;
import kitwright.io.Problem;
import kitwright.io.RunInputs;
import kitwright.model.Status;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright compare KIT_DIR KIT_DIR... --out DIR}: plans every kit option and writes compare.json,
 * compare.csv and compare.html side by side. Options are planned in parallel on a bounded pool of threads; each
 * plan is deterministic, so the files do not depend on the number of threads.
 */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = {
            "Plans several kit options (e.g. the structures re-shaped for 6, 12 or 20 marks) and compares them: "
                    + "marks, bars, reuse ratio, stock bought, cost, offcut waste, masses, embodied carbon, "
                    + "bundles, crates, vehicles and trip cost.",
            "Writes compare.html (open it in a browser: the best value in each row is marked, the others show "
                    + "their difference to it), compare.csv and compare.json into DIR."
        },
        footer = {
            "",
            "Example: kitwright compare sample-kits/cinema-6 sample-kits/cinema-12 sample-kits/cinema-20"
                    + " --out out/compare",
            "",
            "Exit codes: 0 ok, 1 internal error, 2 invalid input in any option (nothing is written), "
                    + "3 some option has no feasible plan (the files are written, that option is marked INFEASIBLE)."
        })
public final class CompareCommand implements Callable<Integer> {
    @Parameters(arity = "1..*", paramLabel = "KIT_DIR",
            description = "Kit folders to compare, two or more; columns follow this order.")
    List<Path> kitDirs;

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "Folder to write compare.html, compare.csv and compare.json into: created, or replaced "
                    + "when kitwright wrote it before (never a folder of yours).")
    Path out;

    @Option(names = "--threads", paramLabel = "N",
            description = "Options planned at the same time (default: the available processors, ${DEFAULT-VALUE}).")
    int threads = Runtime.getRuntime().availableProcessors();

    @Spec
    CommandSpec spec;

    private OptionPlanner planner;

    /** The command as the root command builds it: options planned by the whole chain ({@link OptionPlanners}). */
    public CompareCommand() {
        this(null);
    }

    /** The command with another planner (tests, tools); null for the whole chain. */
    public CompareCommand(OptionPlanner planner) {
        this.planner = planner;
    }

    /** Replaces the planner, e.g. with a fake in tests of the command line. */
    public void usePlanner(OptionPlanner other) {
        this.planner = other;
    }

    @Override
    public Integer call() throws InvalidInputException, IOException {
        PrintWriter err = spec.commandLine().getErr();
        if (kitDirs.size() < 2) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(), "compare needs two or more kit"
                    + " folders (got " + kitDirs.size() + ": " + kitDirs.get(0) + ")");
        }
        if (threads < 1) {
            err.println("kitwright: --threads must be at least 1 (got " + threads + ")");
            err.flush();
            return ExitCode.INVALID_INPUT.code();
        }
        refuseRepeatedKits();
        if (planner == null) {
            checkKits(); // the whole chain reads kit folders; another planner reads what it likes
        }
        RunInputs inputs = new RunInputs(List.of());
        for (Path kitDir : kitDirs) {
            inputs = inputs.and(RunInputs.ofKit(kitDir));
        }
        inputs.refuseFolder(out);
        Consumer<String> progress = line -> {
            synchronized (err) {
                err.println(line);
                err.flush();
            }
        };
        OptionPlanner chosen = planner != null ? planner : OptionPlanners.pipeline(progress);
        OptionRunner runner = new OptionRunner(chosen, threads, progress);
        List<OptionSummary> options;
        // Claim the output folder first: a wrong --out is reported before the planning, not after it.
        try (OutputFolder folder = OutputFolder.create(out)) {
            options = runner.run(kitDirs);
            CompareFiles.write(folder, options);
            folder.commit();
        }
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.println("compare: wrote " + CompareFiles.HTML + ", " + CompareFiles.CSV + " and " + CompareFiles.JSON
                + " for " + options.size() + " options into " + out);
        stdout.flush();
        List<String> infeasible = options.stream().filter(o -> o.status() == Status.INFEASIBLE)
                .map(OptionSummary::kit).toList();
        if (!infeasible.isEmpty()) {
            err.println("kitwright: no feasible plan for " + String.join(", ", infeasible)
                    + " (see its status in compare.html)");
            err.flush();
            return ExitCode.NO_FEASIBLE_PLAN.code();
        }
        return ExitCode.OK.code();
    }

    /** One kit given twice (under any spelling) would be compared with itself: bad arguments. */
    private void refuseRepeatedKits() throws InvalidInputException {
        Map<Path, Path> seen = new HashMap<>();
        for (Path kitDir : kitDirs) {
            Path first = seen.putIfAbsent(new RunInputs(List.of(kitDir)).paths().get(0), kitDir);
            if (first != null) {
                String spelling = first.equals(kitDir) ? "" : " (as " + first + " and " + kitDir + ")";
                throw new InvalidInputException(new Problem(null, 0, "KIT_DIR", "the kit " + kitDir
                        + " is given twice" + spelling + " (expected different kit options to compare)"));
            }
        }
    }

    /** Reads every option before planning any, so that bad input in the last one costs no planning time. */
    private void checkKits() throws InvalidInputException {
        List<Problem> problems = new ArrayList<>();
        for (Path kitDir : kitDirs) {
            try {
                KitReader.read(kitDir);
            } catch (InvalidInputException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) {
            throw new InvalidInputException(problems);
        }
    }
}
