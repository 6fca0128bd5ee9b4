package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.io.OutputFolder;
import kitwright.io.PrettyJson;
import kitwright.io.RunInputs;
import kitwright.model.Kit;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.PlanFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright plan KIT_DIR --out DIR [--date YYYY-MM-DD]}: the main job. Runs every stage and writes the plan
 * folder. The folder is built beside DIR and moved into place when complete, so a failed run leaves DIR as it was.
 */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = {
            "Plans a kit from end to end and writes one folder to open, print and e-mail.",
            "",
            "  report.html        the report: summary, purchase order, saw sheets, bundles, crates, trucks",
            "  order.csv          stock to buy from the mill, with prices: the amount payable",
            "  rack-pull.csv      rack offcuts to take before cutting new stock",
            "  cut-list.csv       the saw sheet: every stock piece, every cut, start positions, offcuts",
            "  rack-after.csv     the rack for the next job, in the tube catalog's format",
            "  labels.html        A4 label sheets: a QR-coded label per cut piece, a tag per remnant",
            "  nests.csv          which tube goes inside which; assembly-order.csv, innermost first",
            "  packing-lists.csv  per crate: marks and counts, bundles, boxes, gross mass",
            "  manifests.csv      per vehicle: crates, mass, floor length, centre of gravity",
            "  legs.csv           with a kit.json tour: one row per leg, its crates, trips and costs;",
            "                     leg-packing-lists.csv and leg-load-lists.csv every leg's lists",
            "  plan.xlsx          every CSV above as one workbook, a sheet per CSV named as the file",
            "  plan.json          every stage as data; summary.json the kit summary",
            "  timing.json        seconds per stage (the only file that changes between identical runs)",
            "",
            "With a spares policy in kit.json, the service-life spares that check states are cut from offcuts",
            "first and bought only for the rest (the model: check --help).",
            "",
            "Progress goes to stderr. The folder is written beside DIR and moved into place only when",
            "complete; an existing DIR is replaced only when kitwright wrote it. Exit code 2 on invalid input",
            "(nothing written), 3 when some part has no feasible plan (the rest is still written)."
        },
        footer = {
            "",
            "Example: kitwright plan sample-kits/cinema-12 --out out/cinema-12 --date 2026-12-01"
        })
public final class PlanCommand implements Callable<Integer> {
    /** The file holding the kit summary in the plan folder. */
    public static final String SUMMARY_JSON = PlanFiles.SUMMARY_JSON;

    @Parameters(index = "0", paramLabel = "KIT_DIR",
            description = "The kit folder: kit.json (optional), bars.csv, and optionally structures.csv and"
                    + " joints.csv.")
    Path kitDir;

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "Folder to write the plan into; created, or replaced when kitwright wrote it before.")
    Path out;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", converter = IsoDateConverter.class,
            description = "Date printed on the report (default: today). Fix it to get byte-identical output.")
    LocalDate date;

    @Option(names = "--spares-from-offcuts",
            description = "Without a spares policy in kit.json: fill offcuts with spare bars of the section's"
                    + " marks (most-used first), buying nothing more. With a policy, the policy sets the spares"
                    + " (see check --help).")
    boolean sparesFromOffcuts;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InvalidInputException, IOException {
        Kit kit = KitReader.read(kitDir);
        OutputGuards.checkFolder(out, RunInputs.ofKit(kitDir));
        PrintWriter err = spec.commandLine().getErr();
        PlanResult result = Planner.run(kit, new Planner.Options(sparesFromOffcuts), progress(err));
        LocalDate day = date != null ? date : LocalDate.now();
        Map<String, byte[]> files = PlanFiles.written(result, day);
        try (OutputFolder folder = OutputFolder.create(out)) {
            for (Map.Entry<String, byte[]> file : files.entrySet()) {
                folder.write(file.getKey(), file.getValue());
            }
            folder.write("timing.json", PrettyJson.write(timing(result)));
            folder.commit();
        }
        result.stageSeconds().forEach((stage, s) -> err.printf(Locale.ROOT, "plan: %s took %.2f s%n", stage, s));
        err.flush();
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.print(PlanSummaryText.format(result));
        stdout.println("Open " + out.resolve(PlanFiles.REPORT_HTML) + " in a browser (it prints to A4).");
        stdout.flush();
        return result.anyInfeasible() ? ExitCode.NO_FEASIBLE_PLAN.code() : ExitCode.OK.code();
    }

    private static Map<String, Object> timing(PlanResult result) {
        Map<String, Object> timing = new LinkedHashMap<>();
        timing.put("kit", result.kit().name());
        timing.put("stageSeconds", result.stageSeconds());
        timing.put("totalSeconds", result.stageSeconds().values().stream().mapToDouble(Double::doubleValue).sum());
        return timing;
    }

    private static PlanProgress progress(PrintWriter err) {
        return new PlanProgress() {
            @Override
            public void stage(String stage, String detail) {
                err.println("plan: " + stage + ": " + detail);
                err.flush();
            }

            @Override
            public void report(String stage, String section, double lowerBound, Double bestValue) {
                err.printf(Locale.ROOT, "plan: cutting %s (%s): lower bound %.2f, best %s%n", section, stage,
                        lowerBound, bestValue == null ? "-" : String.format(Locale.ROOT, "%.2f", bestValue));
                err.flush();
            }
        };
    }
}
