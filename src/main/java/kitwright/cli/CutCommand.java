package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.spares.SparesStage;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.io.RunInputs;
import kitwright.io.OutputFolder;
import kitwright.io.PrettyJson;
import kitwright.io.Problem;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Status;
import kitwright.report.cutting.CuttingFiles;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright cut KIT_DIR} or {@code kitwright cut --bars FILE --stock FILE [--materials FILE]}: plans what
 * stock to buy and how to saw it, section by section, and prints the summary; writes the plan as JSON and the
 * saw sheet, order and rack files when asked.
 */
@Command(name = "cut", mixinStandardHelpOptions = true,
        description = {
            "Plans the cutting of a kit: which stock lengths to buy and how to saw them.",
            "Rack offcuts count as stock; the plan has the least total price (without",
            "prices: the least total stock length), one section at a time.",
            "Each section is OPTIMAL (proven), FEASIBLE (with its gap to the lower",
            "bound) or INFEASIBLE (with the reason, e.g. too few rack offcuts).",
            "",
            "Saw model: the trim is taken off each end of a stock piece and includes",
            "its own squaring cut; pieces are separated by one kerf; the offcut is",
            "what is left after the last piece's kerf. An offcut of at least the",
            "minimum remnant length goes back on the rack (rack-after.csv).",
            "",
            "Exit codes: 0 every section planned, 2 invalid input, 3 some section has",
            "no feasible plan (the other sections are still planned and written)."
        },
        footer = {
            "",
            "Examples: kitwright cut sample-kits/alu-kiosk --kerf 3 --out out/alu-kiosk-cut",
            "          kitwright cut --bars sample-kits/alu-kiosk/bars.csv --stock stock-catalogs/aluminium-tube.csv"
                    + " --materials stock-catalogs/materials.csv"
        })
public final class CutCommand implements Callable<Integer> {
    /** The plan as JSON in the folder of {@code --out}. */
    public static final String CUTTING_JSON = "cutting.json";

    @Parameters(index = "0", arity = "0..1", paramLabel = "KIT_DIR",
            description = "The kit folder (kit.json, bars.csv). Leave out to use --bars and --stock instead.")
    Path kitDir;

    @Option(names = "--bars", paramLabel = "FILE", description = "bars.csv, for a run without a kit folder.")
    Path barsFile;

    @Option(names = "--stock", paramLabel = "FILE", description = "The tube catalog, with --bars.")
    Path stockFile;

    @Option(names = "--materials", paramLabel = "FILE",
            description = "materials.csv, with --bars; without it masses are left out.")
    Path materialsFile;

    @Option(names = "--kerf", paramLabel = "MM", description = "Saw kerf in mm (default: kit.json kerfMm, else 2).")
    Double kerf;

    @Option(names = "--trim", paramLabel = "MM",
            description = "End trim per end in mm, including its own cut (default: kit.json trimMm, else 5).")
    Double trim;

    @Option(names = "--min-remnant", paramLabel = "MM",
            description = "Shortest offcut kept as a remnant, in mm (default: kit.json minRemnantMm, else 500).")
    Double minRemnant;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Safety-net time limit per section in seconds (default: kit.json timeLimitSeconds, else"
                    + " 10). The work limits are deterministic; this one only stops a runaway search.")
    Double timeLimit;

    @Option(names = "--json", paramLabel = "FILE", description = "Also write the plan as JSON to FILE.")
    Path json;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Write cut-list.csv, order.csv, rack-after.csv and cutting.json into DIR (created, or"
                    + " replaced when kitwright wrote it before).")
    Path out;

    @Option(names = "--spares-from-offcuts",
            description = "Without a spares policy in kit.json: fill offcuts with spare bars of the section's"
                    + " marks, most-used first, buying nothing more. With a policy, the policy sets the spares"
                    + " (see check --help).")
    boolean sparesFromOffcuts;

    @Option(names = "--force",
            description = "Let --json replace a file that kitwright did not write (never an input of the run).")
    boolean force;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InvalidInputException, IOException {
        Kit kit = readKit();
        PrintWriter err = spec.commandLine().getErr();
        if (kit.materials().isEmpty()) {
            err.println("kitwright: warning: no materials, so masses are left out"
                    + (kitDir == null ? " (give --materials FILE)" : ""));
        }
        RunInputs inputs = kitDir != null ? RunInputs.ofKit(kitDir) : RunInputs.of(barsFile, stockFile, materialsFile);
        if (json != null) {
            OutputGuards.checkJson(json, out, inputs, force);
        }
        if (out != null) {
            OutputGuards.checkFolder(out, inputs);
        }
        long start = System.nanoTime();
        CutProgress progress = (stage, section, bound, best) -> {
            err.printf(Locale.ROOT, "cut %s (%s): lower bound %s, best %s%n", section, stage, figure(bound),
                    best == null ? "-" : figure(best));
            err.flush();
        };
        CutPlan plan = SparesStage.cut(kit, sparesFromOffcuts, null, progress).plan();
        err.printf(Locale.ROOT, "cut: %.2f s%n", (System.nanoTime() - start) / 1e9);
        err.flush();
        String planJson = PrettyJson.write(plan);
        if (json != null) {
            OutputGuards.writeJson(json, planJson, inputs, force);
        }
        if (out != null) {
            try (OutputFolder folder = OutputFolder.create(out)) {
                CuttingFiles.write(folder, kit, plan);
                folder.write(CUTTING_JSON, planJson);
                folder.commit();
            }
        }
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.print(CutSummaryText.format(kit, plan));
        if (json != null) {
            stdout.println("Wrote " + json);
        }
        if (out != null) {
            stdout.println("Wrote " + out.resolve(CuttingFiles.CUT_LIST) + ", " + CuttingFiles.ORDER + ", "
                    + CuttingFiles.RACK_AFTER + ", " + CUTTING_JSON);
        }
        stdout.flush();
        boolean infeasible = plan.sections().stream().map(SectionCutPlan::status).anyMatch(Status.INFEASIBLE::equals);
        return infeasible ? ExitCode.NO_FEASIBLE_PLAN.code() : ExitCode.OK.code();
    }

    private Kit readKit() throws InvalidInputException {
        boolean looseFiles = barsFile != null || stockFile != null || materialsFile != null;
        if (kitDir != null && looseFiles) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "give either KIT_DIR or --bars and --stock, not both");
        }
        if (kitDir == null && (barsFile == null || stockFile == null)) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "give KIT_DIR, or --bars FILE and --stock FILE");
        }
        check(kerf, "--kerf", true);
        check(trim, "--trim", true);
        check(minRemnant, "--min-remnant", true);
        check(timeLimit, "--time-limit", false);
        Kit kit;
        if (kitDir != null) {
            kit = KitReader.read(kitDir);
            kit = kit.withSettings(override(kit.settings()));
        } else {
            String name = String.valueOf(barsFile.toAbsolutePath().getParent().getFileName());
            kit = KitReader.fromFiles(barsFile, stockFile, materialsFile, override(KitSettings.defaults(name)));
        }
        Optional<String> kerfProblem = KitReader.kerfProblem(kit.settings().kerfMm(), kit.catalog());
        if (kerfProblem.isPresent()) {
            throw new InvalidInputException(new Problem(null, 0, "--kerf", kerfProblem.get()));
        }
        return kit;
    }

    private KitSettings override(KitSettings settings) {
        KitSettings s = settings;
        if (kerf != null) {
            s = s.withKerfMm(kerf);
        }
        if (trim != null) {
            s = s.withTrimMm(trim);
        }
        if (minRemnant != null) {
            s = s.withMinRemnantMm(minRemnant);
        }
        if (timeLimit != null) {
            s = s.withTimeLimitSeconds(timeLimit);
        }
        return s;
    }

    private void check(Double value, String option, boolean zeroAllowed) {
        double maximum = option.equals("--time-limit") ? kitwright.io.Limits.MAX_NUMBER
                : kitwright.io.Limits.MAX_LENGTH_MM;
        if (value != null && (value.isNaN() || value.isInfinite() || value < 0 || (!zeroAllowed && value == 0)
                || value > maximum)) {
            throw new CommandLine.ParameterException(spec.commandLine(), option + " " + value + " is not allowed"
                    + " (expected a number " + (zeroAllowed ? "0 or more" : "above 0") + ", at most "
                    + kitwright.io.Figures.plain(maximum) + ")");
        }
    }

    private static String figure(double value) {
        return kitwright.io.Figures.plain(Math.round(value * 100) / 100.0);
    }
}
