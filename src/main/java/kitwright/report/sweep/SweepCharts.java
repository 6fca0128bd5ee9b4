package kitwright.report.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import kitwright.report.Svg;
import kitwright.sweep.SweepOption;
import kitwright.sweep.SweepRow;

/**
 * The sweep page's drawings as inline SVG (escaped by {@link Svg}, no script): bars of a figure against the mark
 * count (stacked where the figure is a sum), total cost against largest change with the Pareto options marked, and
 * a histogram of member changes per option. Axes start at 0 and carry three to six round ticks.
 */
final class SweepCharts {
    static final int WIDTH = 540;
    static final int HEIGHT = 230;
    private static final double LEFT = 62;
    private static final double RIGHT = 14;
    private static final double TOP = 14;
    private static final double BOTTOM = 38;
    private static final String INK = "#1d1f21";
    private static final String SOFT = "#4f5359";
    private static final String RULE = "#dfe1e3";

    private SweepCharts() {
    }

    /** A stacked part of each bar. */
    record Series(String name, String color, List<Double> values) {
        Series {
            values = java.util.Collections.unmodifiableList(new ArrayList<>(values));
        }
    }

    /** Bars against the mark count: one bar per option, its series stacked; an unknown value draws nothing. */
    static String bars(List<SweepRow> rows, List<Series> series, String unit, int decimals, String label) {
        double max = 0;
        for (int i = 0; i < rows.size(); i++) {
            max = Math.max(max, total(series, i));
        }
        double step = decimals == 0 ? Math.max(1, step(max)) : step(max); // whole counts get whole ticks
        double top = Math.max(step, Math.ceil(max / step) * step);
        Svg svg = open(label);
        axes(svg, top, step, unit, decimals);
        double plot = WIDTH - LEFT - RIGHT;
        double slot = plot / Math.max(1, rows.size());
        double width = Math.max(2, slot * 0.7);
        for (int i = 0; i < rows.size(); i++) {
            SweepRow r = rows.get(i);
            double x = LEFT + i * slot + (slot - width) / 2;
            double base = 0;
            for (Series s : series) {
                Double v = s.values().get(i);
                if (v == null) {
                    continue;
                }
                double y0 = y(base, top);
                double y1 = y(base + v, top);
                svg.open("rect", "x", x, "y", y1, "width", width, "height", Math.max(0, y0 - y1), "fill", s.color())
                        .element("title", r.kit() + ": " + s.name() + " " + fixed(v, decimals) + unit)
                        .close("rect");
                base += v;
            }
            if (r.status() == kitwright.model.Status.INFEASIBLE) {
                svg.text(x + width / 2, y(0, top) - 4, "\u00d7", "text-anchor", "middle", "fill", "#8f3b1b",
                        "font-size", 12);
            }
            if (rows.size() <= 24 || i % 2 == 0) {
                svg.text(x + width / 2, HEIGHT - BOTTOM + 14, Integer.toString(r.marks()), "text-anchor", "middle",
                        "font-size", 10, "fill", SOFT);
            }
        }
        svg.text(LEFT + plot / 2, HEIGHT - 6, "marks in the kit (K)", "text-anchor", "middle", "font-size", 11,
                "fill", SOFT);
        return svg.close("svg").toString();
    }

    /** Total cost (y) against largest change (x); Pareto options filled, joined and labelled. */
    static String tradeOff(List<SweepRow> rows) {
        double maxX = 0;
        double maxY = 0;
        for (SweepRow r : rows) {
            if (r.totalCost() != null) {
                maxX = Math.max(maxX, r.maxChangeMm());
                maxY = Math.max(maxY, r.totalCost());
            }
        }
        double stepY = step(maxY);
        double topY = Math.max(stepY, Math.ceil(maxY / stepY) * stepY);
        double stepX = step(maxX);
        double topX = Math.max(stepX, Math.ceil(maxX / stepX) * stepX);
        Svg svg = open("total cost against largest change");
        axes(svg, topY, stepY, "", 0);
        double plot = WIDTH - LEFT - RIGHT;
        for (double t = 0; t <= topX + 1e-9; t += stepX) {
            double x = LEFT + plot * t / topX;
            svg.line(x, HEIGHT - BOTTOM, x, HEIGHT - BOTTOM + 4, "stroke", SOFT);
            svg.text(x, HEIGHT - BOTTOM + 15, trim(t), "text-anchor", "middle", "font-size", 10, "fill", SOFT);
        }
        svg.text(LEFT + plot / 2, HEIGHT - 6, "largest change of any member (mm)", "text-anchor", "middle",
                "font-size", 11, "fill", SOFT);
        StringBuilder front = new StringBuilder();
        rows.stream().filter(SweepRow::pareto).sorted(java.util.Comparator.comparingDouble(SweepRow::maxChangeMm))
                .forEach(r -> front.append(front.length() == 0 ? "M" : " L")
                        .append(Svg.number(LEFT + plot * r.maxChangeMm() / topX)).append(' ')
                        .append(Svg.number(y(r.totalCost(), topY))));
        if (front.length() > 0) {
            svg.empty("path", "d", front.toString(), "fill", "none", "stroke", "#8f3b1b", "stroke-width", 1.5,
                    "stroke-dasharray", "4 3");
        }
        for (SweepRow r : rows) {
            if (r.totalCost() == null) {
                continue;
            }
            double x = LEFT + plot * r.maxChangeMm() / topX;
            double y = y(r.totalCost(), topY);
            svg.open("circle", "cx", x, "cy", y, "r", r.pareto() ? 5 : 3.5, "fill", r.pareto() ? "#8f3b1b" : "#fff",
                    "stroke", r.pareto() ? "#8f3b1b" : SOFT, "stroke-width", 1.2, "class",
                    r.pareto() ? "pareto" : "dominated")
                    .element("title", r.kit() + ": largest change " + trim(r.maxChangeMm()) + " mm, total cost "
                            + fixed(r.totalCost(), 2) + (r.pareto() ? " (Pareto)" : ""))
                    .close("circle");
            if (r.pareto()) {
                svg.text(x + 7, y - 6, Integer.toString(r.marks()), "font-size", 10, "fill", INK);
            }
        }
        return svg.close("svg").toString();
    }

    /** The members' changes (mark - target) of one option in twelve bins from -D to +D. */
    static String histogram(SweepOption option) {
        int bins = 12;
        long d = Math.max(1, option.largestChangeTenths());
        int[] counts = new int[bins];
        for (SweepOption.MemberMark m : option.members()) {
            int b = (int) Math.floor((m.changeTenths() + d) * (double) bins / (2 * d));
            counts[Math.max(0, Math.min(bins - 1, b))]++;
        }
        int most = java.util.Arrays.stream(counts).max().orElse(1);
        int w = 250;
        int h = 96;
        double left = 6;
        double plot = w - 12;
        double base = h - 20;
        Svg svg = new Svg().open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "histogram", "width", w,
                "height", h, "viewBox", "0 0 " + w + " " + h, "role", "img", "aria-label",
                option.kit() + ": member changes");
        for (int b = 0; b < bins; b++) {
            double bh = most == 0 ? 0 : (base - 6) * counts[b] / most;
            double x = left + plot * b / bins;
            double from = (-d + 2.0 * d * b / bins) / 10;
            double to = (-d + 2.0 * d * (b + 1) / bins) / 10;
            svg.open("rect", "x", x + 0.5, "y", base - bh, "width", plot / bins - 1, "height", bh, "fill", "#3f5a72")
                    .element("title", counts[b] + " members changed by " + fixed(from, 2) + " to " + fixed(to, 2)
                            + " mm")
                    .close("rect");
        }
        svg.line(left, base, left + plot, base, "stroke", SOFT);
        svg.line(left + plot / 2, base, left + plot / 2, base + 4, "stroke", SOFT);
        svg.text(left, h - 6, "\u2212" + trim(d / 10.0) + " mm", "font-size", 9.5, "fill", SOFT);
        svg.text(left + plot / 2, h - 6, "0", "text-anchor", "middle", "font-size", 9.5, "fill", SOFT);
        svg.text(left + plot, h - 6, "+" + trim(d / 10.0) + " mm", "text-anchor", "end", "font-size", 9.5,
                "fill", SOFT);
        return svg.close("svg").toString();
    }

    private static Svg open(String label) {
        return new Svg().open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "sweep-chart", "width", WIDTH,
                "height", HEIGHT, "viewBox", "0 0 " + WIDTH + " " + HEIGHT, "role", "img", "aria-label", label);
    }

    private static void axes(Svg svg, double top, double step, String unit, int decimals) {
        for (double t = 0; t <= top + 1e-9; t += step) {
            double y = y(t, top);
            svg.line(LEFT, y, WIDTH - RIGHT, y, "stroke", t == 0 ? SOFT : RULE);
            svg.text(LEFT - 6, y + 4, fixed(t, step < 1 ? Math.max(decimals, 1) : 0) + unit, "text-anchor", "end",
                    "font-size", 10, "fill", SOFT);
        }
    }

    private static double y(double value, double top) {
        return TOP + (HEIGHT - TOP - BOTTOM) * (1 - value / top);
    }

    private static double total(List<Series> series, int i) {
        double sum = 0;
        for (Series s : series) {
            Double v = s.values().get(i);
            sum += v == null ? 0 : Math.max(0, v);
        }
        return sum;
    }

    /** A round tick step (1, 2 or 5 times a power of ten) giving three to six ticks up to {@code max}. */
    static double step(double max) {
        if (!(max > 0)) {
            return 1;
        }
        double raw = max / 5;
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double f : new double[] {1, 2, 5, 10}) {
            if (f * power >= raw) {
                return f * power;
            }
        }
        return 10 * power;
    }

    private static String fixed(double v, int decimals) {
        return String.format(Locale.ROOT, "%,." + decimals + "f", v).replace(",", "\u202F");
    }

    private static String trim(double v) {
        return Svg.number(v);
    }
}
