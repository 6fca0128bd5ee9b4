package kitwright.report;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.nesting.Handling;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;

/**
 * The files the nesting stage adds to a result folder, as text (pure; the caller writes them): {@code nests.csv},
 * {@code assembly-order.csv} and {@code bundles.html} (self-contained: inline CSS and SVG, no script, the fit rule
 * and the cautions, one drawing per distinct bundle). HTML goes through a Mustache template, which escapes every
 * value; only the SVG, escaped by {@link BundleDrawing}, is inserted as it is.
 */
public final class NestingFiles {
    public static final String NESTS_CSV = "nests.csv";
    public static final String ASSEMBLY_ORDER_CSV = "assembly-order.csv";
    public static final String BUNDLES_HTML = "bundles.html";

    private static final Mustache TEMPLATE = new DefaultMustacheFactory()
            .compile("kitwright/report/nesting-bundles.mustache");

    private NestingFiles() {
    }

    /** File name to content, in a fixed order. */
    public static Map<String, String> files(NestResult result, String kitName, String date) {
        Map<String, String> files = new LinkedHashMap<>();
        try {
            StringWriter nests = new StringWriter();
            NestingCsv.writeNests(result.plan(), nests);
            files.put(NESTS_CSV, nests.toString());
            StringWriter order = new StringWriter();
            NestingCsv.writeAssemblyOrder(result.plan(), order);
            files.put(ASSEMBLY_ORDER_CSV, order.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringWriter does not fail
        }
        files.put(BUNDLES_HTML, html(result, kitName, date));
        return files;
    }

    static String html(NestResult result, String kitName, String date) {
        NestPlan plan = result.plan();
        Map<String, Object> scope = new LinkedHashMap<>();
        scope.put("kit", kitName);
        scope.put("date", date);
        scope.put("pieces", result.pieces());
        scope.put("bundles", plan.bundles().size());
        scope.put("lowerBound", String.format(Locale.ROOT, "%.2f", plan.lowerBound()));
        scope.put("status", plan.status().name());
        scope.put("bundledVolume", String.format(Locale.ROOT, "%.3f", result.bundledVolumeM3()));
        scope.put("looseVolume", String.format(Locale.ROOT, "%.3f", result.looseVolumeM3()));
        scope.put("liftLimit", String.format(Locale.ROOT, "%.0f", Handling.ONE_PERSON_LIFT_KG));
        scope.put("heavyFlag", Handling.TWO_PEOPLE_OR_HOIST);
        scope.put("heavyBundles", plan.bundles().stream().filter(b -> !Handling.flag(b.massKg()).isEmpty()).count());
        scope.put("reason", result.reason());
        scope.put("rule", result.rule());
        List<Map<String, String>> drawings = new ArrayList<>();
        for (BundleDrawing.Distinct d : BundleDrawing.distinct(plan)) {
            drawings.add(Map.of("svg", BundleDrawing.svg(d.bundle(), d.ids())));
        }
        scope.put("drawings", drawings);
        StringWriter out = new StringWriter();
        TEMPLATE.execute(out, scope);
        return out.toString();
    }
}
