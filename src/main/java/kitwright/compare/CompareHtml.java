package kitwright.compare;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import kitwright.report.Look;
import kitwright.report.ShopFormat;

/**
 * Writes {@code compare.html}: a self-contained page (inline CSS and SVG, no script, no network) with one row per
 * figure and one column per option, the best value of each row marked and every other option's difference to it,
 * bar charts of cost, waste, mass and vehicles, and the cautions. Rendered by Mustache, which escapes every value,
 * so kit names cannot inject markup.
 */
public final class CompareHtml {
    private static final String TEMPLATE = "kitwright/compare/compare.html.mustache";

    private CompareHtml() {
    }

    /** @param reason which stages are not proven and by how much, or null */
    record OptionHead(String name, String status, String statusClass, String reason) {
    }

    record CellView(String text, boolean best, String difference, String cssClass) {
    }

    record RowView(String key, String label, String unit, boolean ranked, List<CellView> cells) {
    }

    record Page(int optionCount, List<OptionHead> options, List<RowView> rows, List<CompareCharts.Chart> charts,
                List<String> cautions) {
        /** The shared stylesheet ({@link Look}), the report's look, inlined before the page's own rules. */
        String look() {
            return Look.css();
        }
    }

    public static void write(List<OptionSummary> options, Writer out) throws IOException {
        Mustache template = new DefaultMustacheFactory().compile(TEMPLATE);
        template.execute(out, page(Comparison.of(options))).flush();
    }

    public static String render(List<OptionSummary> options) throws IOException {
        StringWriter out = new StringWriter();
        write(options, out);
        return out.toString();
    }

    static Page page(Comparison comparison) {
        List<OptionHead> heads = comparison.options().stream()
                .map(o -> new OptionHead(o.kit(), o.status().name(),
                        "status-" + o.status().name().toLowerCase(Locale.ROOT), o.statusReason()))
                .toList();
        List<RowView> rows = new ArrayList<>();
        for (Comparison.Row row : comparison.rows()) {
            CompareMetric m = row.metric();
            List<CellView> cells = new ArrayList<>();
            for (Comparison.Cell c : row.cells()) {
                String text = c.value() == null ? ShopFormat.UNKNOWN : format(c.value(), m.decimals(), "");
                String css = c.isBest() ? "best" : c.difference() == null ? "plain" : "worse";
                cells.add(new CellView(text, c.isBest(), difference(m, c), css));
            }
            rows.add(new RowView(m.key(), m.label(), m.unit(), m.direction() != CompareMetric.Direction.NONE,
                    cells));
        }
        List<CompareCharts.Chart> charts = CompareCharts.specs().stream()
                .map(spec -> CompareCharts.draw(spec, comparison.options()))
                .toList();
        return new Page(comparison.options().size(), heads, rows, charts, cautions());
    }

    /** The difference to the best as shown under a value: absolute, and relative unless the unit is percent. */
    static String difference(CompareMetric m, Comparison.Cell c) {
        if (c.difference() == null || c.isBest()) {
            return null;
        }
        String absolute = signed(c.difference(), m.decimals());
        if ("%".equals(m.unit())) {
            return absolute + " points";
        }
        return c.relativePct() == null ? absolute : absolute + " (" + signed(c.relativePct(), 1) + " %)";
    }

    /**
     * A number with fixed decimals and its digits grouped in threes by a narrow no-break space, as in the plan's
     * report ({@link ShopFormat}), and the unit after a space when there is one.
     */
    static String format(double value, int decimals, String unit) {
        String number = ShopFormat.fixed(value, decimals);
        return unit.isEmpty() ? number : number + " " + unit;
    }

    private static String signed(double value, int decimals) {
        String text = format(Math.abs(value), decimals, "");
        return (value < 0 ? "\u2212" : "+") + text;
    }

    private static List<String> cautions() {
        return List.of(
                "kitwright plans material and logistics only. It does not check structural capacity, joints, "
                        + "lifting or load securing: those are for a qualified engineer under local codes and "
                        + "regulations (e.g. EN 12195-1 for load restraint).",
                "Embodied carbon is counted on the mill stock bought (bought mass \u00d7 the material's factor "
                        + "from materials.csv, whose source column names where each factor comes from); rack "
                        + "offcuts and joints add none here. Factors vary by producer and recycled content: use the "
                        + "supplier's environmental product declaration for decisions.",
                "Offcut, scrap and remnant are percentages of the stock length cut (mill and rack). Remnants go "
                        + "back to the rack and keep a value; scrap does not.",
                "Each option is planned from its own kit folder and catalogs. An INFEASIBLE option lacks a plan for "
                        + "some part and is not ranked; FEASIBLE means a valid plan with a gap to its lower bound, "
                        + "so its figures may still improve.",
                "Members are the structures' demand and are not ranked. Money is in the catalogs' currency; "
                        + "compare options priced from the same catalogs.");
    }
}
