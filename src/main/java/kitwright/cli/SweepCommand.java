package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import kitwright.compare.OptionPlanner;
import kitwright.compare.OptionRunner;
import kitwright.compare.OptionSummaries;
import kitwright.compare.OptionSummary;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.io.OutputFolder;
import kitwright.io.Problem;
import kitwright.io.SweepInput;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.PlanFiles;
import kitwright.report.sweep.OptionKitFiles;
import kitwright.report.sweep.SweepHtml;
import kitwright.report.sweep.SweepTables;
import kitwright.sweep.MarkNames;
import kitwright.sweep.Member;
import kitwright.sweep.SweepOption;
import kitwright.sweep.SweepOptions;
import kitwright.sweep.SweepRow;
import kitwright.sweep.SweepRows;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright sweep KIT_DIR --marks A..B --out DIR}: groups the structures' members (members.csv) exactly into
 * A to B marks, writes each option as a complete kit folder DIR/kNN, plans every option through the whole chain
 * in parallel (compare's runner; each plan deterministic) and writes sweep.json, sweep.csv and sweep.html.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = {
            "From the members of several structures (members.csv: structure,member,section,node_to_node_mm) to kit"
                    + " options of A to B marks, each planned and compared.",
            "For each K the member lengths are grouped exactly into K marks (least largest change of any member,"
                    + " then least sum of squared changes; marks in whole tenths of a millimetre), written as the kit"
                    + " folder DIR/kNN (kit.json, bars.csv, structures.csv, joints.csv) and planned as plan plans it.",
            "Writes sweep.html (charts of the trade-off, the table, member changes per option), sweep.csv and"
                    + " sweep.json into DIR. Progress goes to stderr, one line per option.",
            "The structures are not re-shaped: re-solve each structure's geometry to the mark lengths and check it"
                    + " structurally before using an option."
        },
        footer = {
            "",
            "Example: kitwright sweep sample-kits/cinema-members --marks 5..24 --out out/sweep",
            "",
            "Exit codes: 0 ok, 1 internal error, 2 invalid input or --marks (nothing is written), 3 some option has"
                    + " no feasible plan (everything is written, that option's row says why)."
        })
public final class SweepCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "KIT_DIR",
            description = "The designer's folder: kit.json, members.csv and optionally joints.csv; the catalogs as"
                    + " kit.json names them.")
    Path kitDir;

    @Option(names = "--marks", required = true, paramLabel = "A..B",
            description = "Mark counts to try, e.g. 5..24 (or one count, e.g. 8); from the number of sections to the"
                    + " number of distinct lengths.")
    String marks;

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "Folder to write into: created, or replaced when kitwright wrote it before.")
    Path out;

    @Option(names = "--with-plans",
            description = "Also write each option's plan files (report.html, order.csv, ...) into DIR/kNN/plan.")
    boolean withPlans;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", converter = IsoDateConverter.class,
            description = "Date printed on the plans of --with-plans (default: today).")
    LocalDate date;

    @Option(names = "--threads", paramLabel = "N",
            description = "Options planned at the same time (default: the available processors, ${DEFAULT-VALUE}).")
    int threads = Runtime.getRuntime().availableProcessors();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InvalidInputException, IOException {
        PrintWriter err = spec.commandLine().getErr();
        int[] range = MarkRange.parse(marks);
        if (threads < 1) {
            throw new InvalidInputException(new Problem(null, 0, "--threads", "must be at least 1 (got " + threads
                    + ")"));
        }
        SweepInput input = SweepInput.read(kitDir);
        List<String> sections = input.sectionOrder();
        MarkRange.check(range, sections.size(), SweepOptions.lengths(input.members(), sections).stream()
                .mapToInt(l -> l.lengths().size()).sum());
        input.inputs().refuseFolder(out);
        MarkNames names = new MarkNames(input.joints().stream().map(Joint::mark).toList());
        List<SweepOption> options = new ArrayList<>();
        for (int k = range[0]; k <= range[1]; k++) {
            options.add(SweepOptions.of(input.members(), sections, names, k));
        }
        LocalDate day = date != null ? date : LocalDate.now();
        List<SweepRow> rows;
        try (OutputFolder folder = OutputFolder.create(out)) {
            List<Path> dirs = new ArrayList<>();
            for (SweepOption option : options) {
                Path target = folder.target().resolve(option.kit());
                for (Map.Entry<String, byte[]> file : OptionKitFiles.of(input, option, target).entrySet()) {
                    folder.write(option.kit() + "/" + file.getKey(), file.getValue());
                }
                dirs.add(folder.resolve(option.kit()));
            }
            Map<Path, SweepRows.Planned> planned = new ConcurrentHashMap<>();
            OptionPlanner planner = planner(folder, options, planned, day, err);
            new OptionRunner(planner, threads, line -> { }).run(dirs); // progress: the planner's one line each
            rows = SweepRows.of(options, dirs.stream().map(planned::get).toList());
            folder.write("sweep.json", SweepTables.json(rows));
            folder.write("sweep.csv", SweepTables.csv(rows));
            folder.write("sweep.html", SweepHtml.render(heading(input), options, rows));
            folder.commit();
        }
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.println("sweep: wrote sweep.html, sweep.csv, sweep.json and " + options.size() + " kit folders ("
                + options.get(0).kit() + " to " + options.get(options.size() - 1).kit() + ") into " + out);
        stdout.println("sweep: Pareto options: " + String.join(", ", rows.stream().filter(SweepRow::pareto)
                .map(SweepRow::kit).toList()));
        stdout.flush();
        List<String> infeasible = rows.stream().filter(r -> r.status() == Status.INFEASIBLE).map(SweepRow::kit)
                .toList();
        if (!infeasible.isEmpty()) {
            err.println("kitwright: no feasible plan for " + String.join(", ", infeasible)
                    + " (see its status and reason in sweep.html)");
            err.flush();
            return ExitCode.NO_FEASIBLE_PLAN.code();
        }
        return ExitCode.OK.code();
    }

    /** Plans one option folder as plan does, keeps what the rows need and prints one line when done. */
    private OptionPlanner planner(OutputFolder folder, List<SweepOption> options,
                                  Map<Path, SweepRows.Planned> planned, LocalDate day, PrintWriter err) {
        AtomicInteger done = new AtomicInteger();
        return dir -> {
            long start = System.nanoTime();
            Kit kit = KitReader.read(dir);
            PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
            OptionSummary summary = OptionSummaries.of(result);
            Double crateCost = result.crates() == null || result.crates().status() == Status.INFEASIBLE ? null
                    : result.crates().price(kit.crates());
            planned.put(dir, new SweepRows.Planned(summary, crateCost, reason(result)));
            String name = dir.getFileName().toString();
            if (withPlans) {
                for (Map.Entry<String, byte[]> file : PlanFiles.written(result, day).entrySet()) {
                    try {
                        folder.write(name + "/plan/" + file.getKey(), file.getValue());
                    } catch (IOException e) {
                        throw new java.io.UncheckedIOException(e);
                    }
                }
            }
            SweepOption option = options.stream().filter(o -> o.kit().equals(name)).findFirst().orElseThrow();
            synchronized (err) {
                err.println(String.format(Locale.ROOT, "sweep: %s (%d marks, largest change %.1f mm): %s, stock cost"
                                + " %s, %s vehicles, in %.1f s (%d of %d done)", name, option.marks(),
                        option.largestChangeMm(), summary.status(), summary.cost() == null ? "-"
                                : String.format(Locale.ROOT, "%.2f", summary.cost()),
                        summary.vehicles() == null ? "-" : summary.vehicles().toString(),
                        (System.nanoTime() - start) / 1e9, done.incrementAndGet(), options.size()));
                err.flush();
            }
            return summary;
        };
    }

    /** Why some part has no plan: each INFEASIBLE stage's reason, or null when every part has one. */
    static String reason(PlanResult result) {
        List<String> reasons = new ArrayList<>();
        for (SectionCutPlan s : result.cutting().sections()) {
            if (s.status() == Status.INFEASIBLE) {
                reasons.add("cutting " + s.section() + ": " + s.reason());
            }
        }
        if (result.nesting() != null && result.nesting().plan().status() == Status.INFEASIBLE) {
            reasons.add("nesting: no plan");
        }
        if (result.crates() != null && result.crates().status() == Status.INFEASIBLE) {
            reasons.add("crating: " + result.crates().reason());
        }
        if (result.loads() != null && result.loads().status() == Status.INFEASIBLE) {
            reasons.add("loading: " + result.loads().reason());
        }
        return reasons.isEmpty() ? null : String.join("; ", reasons);
    }

    private static SweepHtml.Heading heading(SweepInput input) {
        int structures = (int) input.members().stream().map(Member::structure).distinct().count();
        return new SweepHtml.Heading(input.kitJson().settings().name(), input.kitJson().settings().description(),
                input.members().size(), structures, input.sectionOrder().size());
    }
}
