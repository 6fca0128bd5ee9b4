package kitwright.compare;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;

/**
 * Geometry of the page's horizontal bar charts: one group of bars per option, one bar per series, each bar a stack
 * of segments. Coordinates are computed here and handed to the template as text, so the SVG needs no script.
 */
final class CompareCharts {
    static final int WIDTH = 600;
    private static final int LABEL_RIGHT = 170;
    private static final int BAR_LEFT = 178;
    private static final int BAR_MAX = 300;
    private static final int BAR_HEIGHT = 16;
    private static final int BAR_GAP = 3;
    private static final int GROUP_GAP = 12;
    private static final int PADDING = 10;
    private static final int LABEL_MAX_CHARS = 24;

    // Fills of the look (kitwright/style/look.css): each at least 3:1 against the paper (WCAG 2.1, SC 1.4.11
    // non-text contrast), and the parts of a stacked bar at least 2:1 apart from each other in luminance, so that they
    // separate in greyscale print; the legend names every fill.
    static final String STOCK = "#15202b";
    static final String CRATES = "#3f5a72";
    static final String TRIPS = "#7891a9";
    static final String SCRAP = "#8f3b1b";
    static final String REMNANT = "#c0843a";
    static final String BOUGHT = "#3f5b3a";
    static final String KIT = "#7e9a6f";
    static final String VEHICLES = "#5a4a6e";

    private CompareCharts() {
    }

    /** A stacked part of a bar: a name (legend, tooltip), a colour and how to read the value from an option. */
    record Segment(String name, String color, Function<OptionSummary, Double> value) {
    }

    /**
     * One bar per option: its segments stacked, and how its value text reads. The text shows {@code shown} when
     * that is given and known (a figure of the table, so that the bar and the table read the same, where the sum of
     * rounded segments could differ in the last digit), else the sum of the segments.
     */
    record Series(String name, List<Segment> segments, String unit, int decimals,
                  Function<OptionSummary, Double> shown) {
        Series(String name, List<Segment> segments, String unit, int decimals) {
            this(name, segments, unit, decimals, null);
        }
    }

    /** Chart of several series over the options. */
    record Spec(String key, String title, String note, List<Series> series) {
    }

    record Rect(String x, String y, String width, String height, String color, String tooltip) {
    }

    record Text(String x, String y, String text, String anchor, String cssClass, String tooltip) {
    }

    record LegendItem(String name, String color) {
    }

    /** What the template draws: the SVG size, its rectangles and texts, the legend below it. */
    record Chart(String key, String title, String note, int width, int height, String axisX, String axisBottom,
                 List<Rect> rects, List<Text> texts, List<LegendItem> legend) {
    }

    static Chart draw(Spec spec, List<OptionSummary> options) {
        double max = 0;
        for (OptionSummary o : options) {
            for (Series s : spec.series()) {
                max = Math.max(max, total(s, o));
            }
        }
        double scale = max > 0 ? BAR_MAX / max : 0;
        List<Rect> rects = new ArrayList<>();
        List<Text> texts = new ArrayList<>();
        int k = spec.series().size();
        int groupHeight = k * BAR_HEIGHT + (k - 1) * BAR_GAP;
        double y = PADDING;
        for (OptionSummary o : options) {
            String name = o.kit() + (Comparison.ranked(o) ? "" : " (infeasible)");
            texts.add(new Text(num(LABEL_RIGHT), num(y + groupHeight / 2.0 + 4), shorten(name), "end", "label",
                    name));
            for (Series s : spec.series()) {
                double x = BAR_LEFT;
                boolean known = true;
                for (Segment seg : s.segments()) {
                    Double v = seg.value().apply(o);
                    if (v == null) {
                        known = false;
                        continue;
                    }
                    double w = Math.max(0, v * scale);
                    rects.add(new Rect(num(x), num(y), num(w), num(BAR_HEIGHT), seg.color(),
                            o.kit() + ": " + seg.name() + " " + CompareHtml.format(v, s.decimals(), s.unit())));
                    x += w;
                }
                Double shown = s.shown() == null ? null : s.shown().apply(o);
                double figure = known && shown != null ? shown : total(s, o);
                String value = known || figure > 0
                        ? CompareHtml.format(figure, s.decimals(), s.unit()) + (known ? "" : " (part not known)")
                        : "not known";
                texts.add(new Text(num(x + 6), num(y + BAR_HEIGHT - 4), value, "start", "value",
                        o.kit() + ": " + s.name()));
                y += BAR_HEIGHT + BAR_GAP;
            }
            y += GROUP_GAP - BAR_GAP;
        }
        int height = (int) Math.ceil(y - GROUP_GAP + PADDING);
        List<LegendItem> legend = new ArrayList<>();
        for (Series s : spec.series()) {
            for (Segment seg : s.segments()) {
                legend.add(new LegendItem(seg.name(), seg.color()));
            }
        }
        return new Chart(spec.key(), spec.title(), spec.note(), WIDTH, height, num(BAR_LEFT),
                num(height - PADDING / 2.0), rects, texts, legend);
    }

    /** The four charts of the page: cost, waste, mass and vehicles. */
    static List<Spec> specs() {
        return List.of(
                new Spec("cost", "Cost per option", "Stock cost with the crate and trip costs stacked on it.",
                        List.of(new Series("cost", List.of(
                                new Segment("stock", STOCK, OptionSummary::cost),
                                new Segment("crates", CRATES, OptionSummary::crateCost),
                                new Segment("trips", TRIPS, OptionSummary::tripCost)), "", 2))),
                new Spec("waste", "Waste per option", "Offcut in percent of the stock length cut: scrap and "
                        + "remnants that go back to the rack.",
                        List.of(new Series("offcut", List.of(
                                new Segment("scrap", SCRAP, o -> o.scrapPct()),
                                new Segment("remnant", REMNANT, o -> o.remnantPct())), "%", 2,
                                o -> o.offcutPct()))),
                new Spec("mass", "Mass per option", "Mill stock bought (the base of embodied carbon) against "
                        + "the kit's bars and joints.",
                        List.of(new Series("bought", List.of(
                                        new Segment("stock bought", BOUGHT, OptionSummary::boughtMassKg)), "kg", 0),
                                new Series("kit", List.of(
                                        new Segment("kit", KIT, OptionSummary::kitMassKg)), "kg", 0))),
                new Spec("vehicles", "Vehicles per option", "Vehicles or containers loaded.",
                        List.of(new Series("vehicles", List.of(
                                new Segment("vehicles", VEHICLES, o -> o.vehicles() == null ? null
                                        : o.vehicles().doubleValue())), "", 0))));
    }

    private static double total(Series s, OptionSummary o) {
        double sum = 0;
        for (Segment seg : s.segments()) {
            Double v = seg.value().apply(o);
            sum += v == null ? 0 : Math.max(0, v);
        }
        return sum;
    }

    private static String shorten(String name) {
        return name.length() <= LABEL_MAX_CHARS ? name : name.substring(0, LABEL_MAX_CHARS - 1) + "\u2026";
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }
}
