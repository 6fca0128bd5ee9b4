package kitwright.report;

import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.Map;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.plan.PlanResult;
import kitwright.report.cutting.CutListCsv;
import kitwright.report.cutting.OrderCsv;
import kitwright.report.cutting.RackAfterCsv;
import kitwright.report.cutting.RackPullCsv;
import kitwright.report.labels.LabelSet;
import kitwright.report.labels.LabelsHtml;
import kitwright.report.tour.LegSection;
import kitwright.report.tour.LegsCsv;
import kitwright.report.tour.LegsJson;
import kitwright.report.tour.TourSection;

/**
 * The files of a plan folder, as text by file name, in a fixed order: a pure function of the plan and the report
 * date, so the same inputs and date give byte-identical files. Timings are not here (see timing.json).
 */
public final class PlanFiles {
    public static final String REPORT_HTML = "report.html";
    public static final String PLAN_JSON = "plan.json";
    public static final String SUMMARY_JSON = "summary.json";

    private PlanFiles() {
    }

    /**
     * Every file of the plan folder as bytes, in a fixed order: the text files of {@link #of} (UTF-8), then
     * {@code plan.xlsx}, the workbook of their CSVs ({@link PlanWorkbook}).
     */
    public static Map<String, byte[]> written(PlanResult result, LocalDate date) {
        Map<String, String> text = of(result, date);
        Map<String, byte[]> files = new LinkedHashMap<>();
        text.forEach((name, content) -> files.put(name, content.getBytes(StandardCharsets.UTF_8)));
        files.put(PlanWorkbook.FILE, PlanWorkbook.of(text, date));
        return files;
    }

    /** The text files of the plan folder, by name, in a fixed order. */
    public static Map<String, String> of(PlanResult result, LocalDate date) {
        Kit kit = result.kit();
        Map<String, String> files = new LinkedHashMap<>();
        files.put(REPORT_HTML, HtmlReport.render(report(result, date)));
        files.put(PLAN_JSON, PrettyJson.write(planJson(result, date)));
        files.put(SUMMARY_JSON, PrettyJson.write(result.summary()));
        files.put("order.csv", OrderCsv.format(kit, result.cutting()));
        files.put("rack-pull.csv", RackPullCsv.format(kit, result.cutting()));
        files.put("cut-list.csv", CutListCsv.format(kit, result.cutting()));
        files.put("rack-after.csv", RackAfterCsv.format(kit, result.cutting()));
        files.putAll(NestingFiles.files(result.nesting().plan()));
        files.put(LabelsHtml.FILE, LabelsHtml.render(kit.name(), date.toString(), LabelSet.of(kit,
                result.cutting(), result.nesting().plan().bundles(), result.crates(), date.toString())));
        if (result.logisticsPlanned()) {
            files.put(LogisticsCsv.PACKING_LISTS, LogisticsCsv.packingLists(result.crates(),
                    result.nesting().plan().bundles()));
            files.put(LogisticsCsv.MANIFESTS, LogisticsCsv.manifests(result.loads()));
            files.put(LogisticsCsv.LOAD_LISTS, LogisticsCsv.loadLists(result.loads(), result.crates()));
        }
        if (result.tour() != null) {
            files.putAll(LegsCsv.files(result.tour()));
        }
        return files;
    }

    /** plan.json: every stage under the keys the issues fix ("cutting", "nesting", "crates", "loads"). */
    static Map<String, Object> planJson(PlanResult result, LocalDate date) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("kit", result.kit().name());
        root.put("date", date.toString());
        root.put("summary", result.summary());
        root.put("cutting", result.cutting());
        root.put("nesting", result.nesting().plan());
        root.put("crates", result.crates());
        root.put("loads", result.loads());
        if (result.tour() != null) {
            root.put("legs", LegsJson.of(result.tour())); // absent, not empty, without a tour
        }
        // Issue 7: service-life spares (null without a policy in kit.json) and the kit's figures.
        root.put("spares", PlanFiguresJson.spares(result.spares()));
        root.put("figures", PlanFiguresJson.figures(result.figures()));
        return root;
    }

    /** The HTML report: summary, purchase order and saw sheets, then bundles, crates and trucks, then cautions. */
    public static ReportModel report(PlanResult result, LocalDate date) {
        ReportModel.Builder builder = ReportModel.builder(result.kit(), date).cutting(result.cutting());
        builder.section(NestingSection.of(result.nesting(), result.kit()));
        if (result.logisticsPlanned()) {
            builder.section(LogisticsSection.of(result.crates(), result.loads(), result.nesting().plan().bundles(),
                    result.kit().crates(), MarkPalette.of(result.kit()).fills()));
            LogisticsCautions.all().forEach(c -> builder.caution(c.heading(), c.text()));
            if (result.tour() != null) {
                builder.section(TourSection.of(result.tour()));
                result.tour().legs().forEach(leg -> builder.section(LegSection.of(leg, result.kit().crates(),
                        MarkPalette.of(result.kit()).fills())));
            }
        } else {
            builder.caution("Crates and trucks not planned", "The kit has no crate or vehicle catalog, so"
                    + " crating and loading were skipped. Add crates.csv and vehicles.csv beside the tube catalog"
                    + " or name them in kit.json.");
            if (!result.kit().settings().tour().isEmpty()) {
                builder.caution("Tour legs not planned", "kit.json has a tour, but without a crate and a vehicle"
                        + " catalog its legs cannot be crated and loaded.");
            }
        }
        builder.section(KitFiguresSection.of(result.kit(), result.figures(), result.spares()));
        return builder.build();
    }
}
