package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Map;
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
import kitwright.model.Kit;
import kitwright.model.NestTolerance;
import kitwright.model.Status;
import kitwright.nesting.Handling;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;
import kitwright.report.HtmlReport;
import kitwright.report.NestingFiles;
import kitwright.report.NestingSection;
import kitwright.report.ReportModel;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright nest KIT_DIR}: cuts the kit (the cutting stage), then nests every cut piece into bundles and
 * reports them. Output files appear whole or not at all.
 */
@Command(name = "nest", mixinStandardHelpOptions = true,
        description = {
            "Plans the cutting of a kit, then nests the cut tubes into bundles.",
            "Thinner tubes slide into thicker ones, side by side and end to end, so",
            "the kit travels in fewer bundles. Prints the bundles beside a lower bound",
            "and the status (OPTIMAL: no plan in kitwright's channel layouts has fewer).",
            "",
            "Fit rule: a tube fits another when its largest outside diameter plus",
            "the clearance (kit.json nestClearanceMm, default 2.0 mm, diametral) is",
            "at most the other's smallest bore. worst-case: steel by EN 10219-2",
            "(outside diameter +/-1 %%, 0.5 to 10 mm; wall +/-10 %% up to 5 mm,",
            "+/-0.5 mm above; above 406.4 mm diameter +/-10 %%, at most 2 mm)",
            "less the weld bead (catalog weld_bead_mm, else 1.0 mm",
            "for steel); other materials by the catalog's od_tolerance_mm and",
            "wall_tolerance_pct. nominal: nominal sizes. Out-of-roundness and",
            "straightness are not counted. Guests keep nestEndAllowanceMm (default",
            "10 mm) free at each end of their host; maxBundleMassKg is a hard limit.",
            "",
            "With --out DIR: report.html (with a drawing of each distinct bundle),",
            "nests.csv and assembly-order.csv (innermost first), written beside DIR",
            "and moved into place when complete. With --json FILE: the plan.json",
            "\"nesting\" object.",
            "",
            "Exit codes: 0 ok, 2 invalid input, 3 when a section cannot be cut or a",
            "single bar is heavier than maxBundleMassKg (the plan is still written)."
        },
        footer = {
            "",
            "Example: kitwright nest sample-kits/cinema-12 --tolerance nominal --out out/cinema-12-nest"
        })
public final class NestCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "KIT_DIR",
            description = "The kit folder: kit.json (optional), bars.csv, and optionally structures.csv and"
                    + " joints.csv.")
    Path kitDir;

    @Option(names = "--tolerance", paramLabel = "RULE", converter = ToleranceConverter.class,
            description = "Fit rule: worst-case or nominal (default: kit.json nestTolerance, else worst-case).")
    NestTolerance tolerance;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Folder to write report.html, nests.csv and assembly-order.csv into; created, or"
                    + " replaced when kitwright wrote it before.")
    Path out;

    @Option(names = "--json", paramLabel = "FILE",
            description = "File to write the nesting plan to as JSON (the plan.json \"nesting\" object).")
    Path json;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", converter = IsoDateConverter.class,
            description = "Date printed on the report (default: today). Fix it to get byte-identical output.")
    LocalDate date;

    @Option(names = "--force",
            description = "Let --json replace a file that kitwright did not write (never an input of the run).")
    boolean force;

    @Spec
    CommandSpec spec;

    /** Reads "worst-case" or "nominal". */
    static final class ToleranceConverter implements CommandLine.ITypeConverter<NestTolerance> {
        @Override
        public NestTolerance convert(String value) {
            return NestTolerance.parse(value).orElseThrow(() -> new CommandLine.TypeConversionException(
                    "'" + value + "' is not a fit rule (expected worst-case or nominal)"));
        }
    }

    @Override
    public Integer call() throws InvalidInputException, IOException {
        Kit kit = KitReader.read(kitDir);
        RunInputs inputs = RunInputs.ofKit(kitDir);
        if (out != null) {
            OutputGuards.checkFolder(out, inputs);
        }
        if (json != null) {
            OutputGuards.checkJson(json, out, inputs, force);
        }
        if (tolerance != null) {
            kit = kit.withSettings(kit.settings().withNestTolerance(tolerance));
        }
        PrintWriter err = spec.commandLine().getErr();
        if (kit.materials().isEmpty()) {
            err.println("kitwright: warning: no materials, so bundle masses are 0 and maxBundleMassKg cannot be"
                    + " checked");
        }
        long start = System.nanoTime();
        CutProgress progress = (stage, section, bound, best) -> {
            err.printf(Locale.ROOT, "cut %s (%s): lower bound %.2f, best %s%n", section, stage, bound,
                    best == null ? "-" : String.format(Locale.ROOT, "%.2f", best));
            err.flush();
        };
        CutPlan cuts = SparesStage.cut(kit, false, null, progress).plan();
        err.println("nest: " + kit.name() + ", every cut piece into bundles");
        err.flush();
        long cut = System.nanoTime();
        NestResult result = Nester.run(kit, cuts,
                NestingOptions.DEFAULT.withWallSeconds(kit.settings().timeLimitSeconds()));
        long nested = System.nanoTime();
        err.printf(Locale.ROOT, "timing: cutting %.2f s, nesting %.2f s%n", (cut - start) / 1e9,
                (nested - cut) / 1e9);
        err.flush();
        NestPlan plan = result.plan();
        if (out != null) {
            LocalDate day = date != null ? date : LocalDate.now();
            try (OutputFolder folder = OutputFolder.create(out)) {
                folder.write("report.html", HtmlReport.render(ReportModel.builder(kit, day).cutting(cuts)
                        .section(NestingSection.of(result)).build()));
                for (Map.Entry<String, String> file : NestingFiles.files(plan).entrySet()) {
                    folder.write(file.getKey(), file.getValue());
                }
                folder.commit();
            }
        }
        if (json != null) {
            OutputGuards.writeJson(json, PrettyJson.write(plan), inputs, force);
        }
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.print(summary(kit, result));
        if (out != null) {
            stdout.println("Wrote " + out.resolve("report.html") + ", " + NestingFiles.NESTS_CSV + " and "
                    + NestingFiles.ASSEMBLY_ORDER_CSV);
        }
        if (json != null) {
            stdout.println("Wrote " + json);
        }
        stdout.flush();
        List<SectionCutPlan> uncut = cuts.sections().stream().filter(s -> s.status() == Status.INFEASIBLE).toList();
        for (SectionCutPlan s : uncut) {
            err.println("kitwright: section " + s.section() + " could not be cut, its bars are not nested: "
                    + s.reason());
        }
        if (result.reason() != null) {
            err.println("kitwright: no feasible nesting plan: " + result.reason());
        }
        err.flush();
        return uncut.isEmpty() && result.reason() == null ? ExitCode.OK.code() : ExitCode.NO_FEASIBLE_PLAN.code();
    }

    static String summary(Kit kit, NestResult result) {
        NestPlan plan = result.plan();
        long heavy = plan.bundles().stream().filter(b -> !Handling.flag(b.massKg()).isEmpty()).count();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Kit %s: %d cut pieces nest into %d bundles (lower bound %s; %s).%n",
                kit.name(), result.pieces(), plan.bundles().size(), PlanSummaryText.bound(plan.lowerBound()),
                result.statusText()));
        sb.append(String.format(Locale.ROOT, "Envelope volume %.3f m3 nested, %.3f m3 loose; %d bundles above %.0f kg"
                + " (%s).%n", result.bundledVolumeM3(), result.looseVolumeM3(), heavy, Handling.ONE_PERSON_LIFT_KG,
                Handling.TWO_PEOPLE_OR_HOIST));
        sb.append("Fit rule: ").append(result.rule()).append('\n');
        return sb.toString();
    }
}
