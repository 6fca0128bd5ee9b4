package kitwright.report.sweep;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import kitwright.report.Look;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import kitwright.report.ShopFormat;
import kitwright.sweep.SweepOption;
import kitwright.sweep.SweepRow;

/**
 * Writes {@code sweep.html}: a self-contained page (inline CSS in the report's style, inline SVG, no script, no
 * network) with the trade-off charts beside the cautions, the table of options and a histogram of member changes
 * per option. Rendered by Mustache, which escapes every value; the SVG is escaped by its builder.
 */
public final class SweepHtml {
    private static final String TEMPLATE = "kitwright/sweep/sweep.html.mustache";

    private SweepHtml() {
    }

    /** What the page says about the input. */
    public record Heading(String kitName, String description, int memberCount, int structureCount,
                          int sectionCount) {
    }

    record LegendItem(String name, String color) {
    }

    record Chart(String key, String title, String note, String svg, List<LegendItem> legend) {
    }

    record RowView(int marks, String kit, String maxChange, String meanChange, String reuseRatio, String cost,
                   String crateCost, String tripCost, String totalCost, String offcut, String bundles, String crates,
                   String vehicles, String co2e, String status, String statusClass, String reason, boolean pareto) {
    }

    record Histogram(String kit, int marks, String maxChange, String svg) {
    }

    record Page(String kitName, String description, int memberCount, int structureCount, int sectionCount,
                int firstMarks, int lastMarks, List<Chart> charts, List<RowView> rows, List<Histogram> histograms) {
        /** The shared stylesheet ({@link Look}), the report's look, inlined before the page's own rules. */
        String look() {
            return Look.css();
        }
    }

    public static String render(Heading heading, List<SweepOption> options, List<SweepRow> rows)
            throws java.io.IOException {
        Mustache template = new DefaultMustacheFactory().compile(TEMPLATE);
        StringWriter out = new StringWriter();
        template.execute(out, page(heading, options, rows)).flush();
        return out.toString();
    }

    static Page page(Heading h, List<SweepOption> options, List<SweepRow> rows) {
        List<Chart> charts = new ArrayList<>();
        List<SweepCharts.Series> cost = List.of(
                new SweepCharts.Series("stock", "#15202b", rows.stream().map(SweepRow::cost).toList()),
                new SweepCharts.Series("crates", "#3f5a72", rows.stream().map(SweepRow::crateCost).toList()),
                new SweepCharts.Series("trips", "#7891a9", rows.stream().map(SweepRow::tripCost).toList()));
        charts.add(chart("total-cost", "Total cost against mark count", "Stock cost, crates and trips stacked.",
                SweepCharts.bars(rows, cost, "", 0, "total cost against mark count"), cost));
        charts.add(chart("trade-off", "Total cost against largest change", "Filled and joined: the Pareto options"
                        + " (labelled with their mark count); open: dominated by one of them.",
                SweepCharts.tradeOff(rows), List.of()));
        List<SweepCharts.Series> offcut = List.of(new SweepCharts.Series("offcut", "#8f3b1b",
                rows.stream().map(r -> (Double) r.offcutPct()).toList()));
        charts.add(chart("offcut", "Offcut against mark count", "Offcut (scrap and remnants) in percent of the"
                + " stock length cut.", SweepCharts.bars(rows, offcut, " %", 1, "offcut against mark count"),
                offcut));
        List<SweepCharts.Series> trucks = List.of(new SweepCharts.Series("vehicles", "#5a4a6e",
                rows.stream().map(r -> r.vehicles() == null ? null : r.vehicles().doubleValue()).toList()));
        charts.add(chart("vehicles", "Trucks against mark count", "Vehicles or containers loaded.",
                SweepCharts.bars(rows, trucks, "", 0, "vehicles against mark count"), trucks));
        List<RowView> views = rows.stream().map(SweepHtml::view).toList();
        List<Histogram> histograms = options.stream().map(o -> new Histogram(o.kit(), o.marks(),
                ShopFormat.fixed(o.largestChangeMm(), 1), SweepCharts.histogram(o))).toList();
        int first = rows.isEmpty() ? 0 : rows.get(0).marks();
        int last = rows.isEmpty() ? 0 : rows.get(rows.size() - 1).marks();
        return new Page(h.kitName(), h.description(), h.memberCount(), h.structureCount(), h.sectionCount(), first,
                last, charts, views, histograms);
    }

    private static Chart chart(String key, String title, String note, String svg, List<SweepCharts.Series> series) {
        return new Chart(key, title, note, svg, series.size() < 2 ? List.of()
                : series.stream().map(s -> new LegendItem(s.name(), s.color())).toList());
    }

    private static RowView view(SweepRow r) {
        return new RowView(r.marks(), r.kit(), ShopFormat.fixed(r.maxChangeMm(), 1),
                ShopFormat.fixed(r.meanChangeMm(), 2), number(r.reuseRatio(), 2), money(r.cost()),
                money(r.crateCost()), money(r.tripCost()), money(r.totalCost()), ShopFormat.fixed(r.offcutPct(), 2),
                count(r.bundles()), count(r.crates()), count(r.vehicles()), number(r.co2eKg(), 1), r.status().name(),
                r.status().name().toLowerCase(Locale.ROOT), r.reason(), r.pareto());
    }

    private static String money(Double v) {
        return v == null ? ShopFormat.UNKNOWN : ShopFormat.money(v);
    }

    private static String number(Double v, int places) {
        return v == null ? ShopFormat.UNKNOWN : ShopFormat.fixed(v, places);
    }

    private static String count(Integer v) {
        return v == null ? ShopFormat.UNKNOWN : ShopFormat.count(v);
    }
}
