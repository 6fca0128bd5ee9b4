package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import kitwright.nesting.Bundle;
import kitwright.nesting.Handling;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestedTube;

/**
 * Drawings of bundles as inline SVG (no script, no external reference): cross-sections to scale, one per stretch
 * of the bundle where the set of tubes changes (up to four), and a side view with the length to scale and the
 * diameters enlarged by a stated factor. Tube walls are filled in grey by nesting level, guests in the side view are
 * drawn dashed (hidden lines), and every tube is labelled with its mark, so the drawing reads in greyscale print.
 */
public final class BundleDrawing {
    private static final int WIDTH = 760;
    private static final int SECTION_SIZE = 170;
    private static final int MAX_SECTIONS = 4;
    private static final String[] WALL_FILL = {"#d9d9d9", "#a6a6a6", "#e8e8e8", "#7f7f7f", "#f2f2f2"};
    private static final String[] DASH = {"", "6 3", "2 2", "8 2 2 2", "1 2"};

    /** Bundles with the same layout, drawn once. */
    public record Distinct(Bundle bundle, List<String> ids) {
        public Distinct {
            ids = List.copyOf(ids);
        }
    }

    /** A tube with its position in the bundle's own frame. */
    private record Placed(NestedTube tube, int level, double x, double y, double start) {
        double end() {
            return start + tube.lengthMm();
        }
    }

    private BundleDrawing() {
    }

    /** Bundles grouped by identical layout (marks, lengths, centres and offsets to 0.01 mm), in plan order. */
    public static List<Distinct> distinct(NestPlan plan) {
        Map<String, List<Bundle>> groups = new LinkedHashMap<>();
        for (Bundle b : plan.bundles()) {
            groups.computeIfAbsent(signature(b.host()), k -> new ArrayList<>()).add(b);
        }
        List<Distinct> out = new ArrayList<>();
        for (List<Bundle> g : groups.values()) {
            out.add(new Distinct(g.get(0), g.stream().map(Bundle::id).toList()));
        }
        return out;
    }

    /** The drawing of one bundle layout; {@code ids} are the bundles built this way (for the title). */
    public static String svg(Bundle bundle, List<String> ids) {
        List<Placed> tubes = new ArrayList<>();
        place(bundle.host(), 0, 0, 0, 0, tubes);
        List<double[]> slices = slices(tubes);
        double hostDiameter = bundle.envelopeDiameterMm();
        double scale = (SECTION_SIZE - 20) / hostDiameter;
        int sideTop = 70 + SECTION_SIZE + 45;
        double lengthScale = (WIDTH - 40) / bundle.lengthMm();
        double diameterScale = Math.max(lengthScale, 70 / hostDiameter);
        List<String> marks = tubes.stream().map(p -> p.tube().mark()).distinct().toList();
        int height = sideTop + (int) (hostDiameter * diameterScale) + 40 + 16 * marks.size() + 20;
        StringBuilder svg = new StringBuilder();
        svg.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"saw-drawing\""
                + " width=\"%d\" height=\"%d\" viewBox=\"0 0 %d %d\" font-family=\"sans-serif\" font-size=\"11\""
                + " role=\"img\">%n",
                WIDTH, height, WIDTH, height));
        svg.append("<title>").append(escape("Bundle " + bundle.id() + " layout")).append("</title>\n");
        String count = ids.size() > 1 ? "  (" + ids.size() + " alike: " + ids.get(0) + " to " + ids.get(ids.size() - 1)
                + ")" : "";
        text(svg, 20, 20, 14, "bold", "Bundle " + bundle.id() + count);
        String flag = Handling.flag(bundle.massKg());
        text(svg, 20, 38, 11, "normal", String.format(Locale.ROOT, "envelope %.1f mm x %.0f mm, %d tubes, %.1f kg%s",
                hostDiameter, bundle.lengthMm(), tubes.size(), bundle.massKg(), flag.isEmpty() ? "" : " - " + flag));
        text(svg, 20, 56, 10, "normal", "Cross-sections to scale, seen from the start end:");
        for (int i = 0; i < slices.size(); i++) {
            int left = 20 + i * (SECTION_SIZE + 10);
            double at = slices.get(i)[0];
            section(svg, tubes, at, left + SECTION_SIZE / 2.0, 70 + SECTION_SIZE / 2.0, scale);
            text(svg, left, 70 + SECTION_SIZE + 12, 10, "normal",
                    sectionName(i) + "-" + sectionName(i) + " at " + Math.round(at) + " mm");
        }
        text(svg, 20, sideTop - 8, 10, "normal", String.format(Locale.ROOT,
                "Side view: length to scale, diameters enlarged x%.0f; guests dashed", diameterScale / lengthScale));
        side(svg, tubes, slices, 20, sideTop + hostDiameter * diameterScale / 2, lengthScale, diameterScale);
        int legendTop = sideTop + (int) (hostDiameter * diameterScale) + 30;
        for (int i = 0; i < marks.size(); i++) {
            String mark = marks.get(i);
            List<Placed> of = tubes.stream().filter(p -> p.tube().mark().equals(mark)).toList();
            NestedTube t = of.get(0).tube();
            int level = of.get(0).level();
            int y = legendTop + 16 * i;
            svg.append(String.format(Locale.ROOT, "<rect x=\"20\" y=\"%d\" width=\"18\" height=\"10\" fill=\"%s\""
                    + " stroke=\"#000\" stroke-dasharray=\"%s\"/>%n", y - 9, WALL_FILL[level % WALL_FILL.length],
                    DASH[level % DASH.length]));
            text(svg, 44, y, 10, "normal", String.format(Locale.ROOT, "%s: %d x, outside %.1f mm, bore %.1f mm,"
                    + " %.0f mm long, level %d", mark, of.size(), t.outerDiameterMm(), t.boreMm(), t.lengthMm(), level));
        }
        svg.append("</svg>\n");
        return svg.toString();
    }

    private static void place(NestedTube tube, int level, double x, double y, double start, List<Placed> out) {
        out.add(new Placed(tube, level, x, y, start));
        for (NestedTube g : tube.guests()) {
            place(g, level + 1, x + g.centerXMm(), y + g.centerYMm(), start + g.offsetMm(), out);
        }
    }

    /**
     * Positions along the bundle where the cross-section differs: {position, total length of that cross-section,
     * tubes in it, longest stretch}. Cross-sections over less than 2 % of the length (the end allowances) are left
     * out; of the rest the fullest are kept (then the longest), in order along the bundle.
     */
    private static List<double[]> slices(List<Placed> tubes) {
        TreeSet<Double> cuts = new TreeSet<>();
        for (Placed p : tubes) {
            cuts.add(p.start());
            cuts.add(p.end());
        }
        Map<String, double[]> sets = new LinkedHashMap<>();
        Double previous = null;
        for (double c : cuts) {
            if (previous != null && c - previous > 1e-6) {
                double mid = (previous + c) / 2;
                StringBuilder key = new StringBuilder();
                int present = 0;
                for (Placed p : tubes) {
                    if (p.start() < mid && mid < p.end()) {
                        present++;
                        key.append(p.tube().mark().length()).append(':').append(p.tube().mark()).append('@')
                                .append(NestingTables.number(p.x(), 1)).append(',')
                                .append(NestingTables.number(p.y(), 1)).append(';');
                    }
                }
                int count = present;
                double[] slice = sets.computeIfAbsent(key.toString(), k -> new double[] {mid, 0, count, 0});
                slice[1] += c - previous;
                if (c - previous > slice[3]) {
                    slice[0] = mid; // drawn in the middle of its longest stretch
                    slice[3] = c - previous;
                }
            }
            previous = c;
        }
        double length = cuts.last() - cuts.first();
        List<double[]> all = new ArrayList<>(sets.values().stream().filter(v -> v[1] >= 0.02 * length).toList());
        if (all.isEmpty()) {
            all.addAll(sets.values());
        }
        all.sort((a, b) -> a[2] != b[2] ? Double.compare(b[2], a[2]) : Double.compare(b[1], a[1]));
        List<double[]> kept = new ArrayList<>(all.subList(0, Math.min(MAX_SECTIONS, all.size())));
        kept.sort((a, b) -> Double.compare(a[0], b[0]));
        return kept;
    }

    private static void section(StringBuilder svg, List<Placed> tubes, double at, double cx, double cy,
                                double scale) {
        for (Placed p : tubes) {
            if (!(p.start() < at && at < p.end())) {
                continue;
            }
            double x = cx + p.x() * scale;
            double y = cy - p.y() * scale;
            double r = p.tube().outerDiameterMm() / 2 * scale;
            double ri = p.tube().boreMm() / 2 * scale;
            svg.append(String.format(Locale.ROOT, "<path d=\"%s%s\" fill=\"%s\" fill-rule=\"evenodd\" stroke=\"#000\""
                    + " stroke-width=\"0.8\"/>%n", circle(x, y, r), circle(x, y, ri),
                    WALL_FILL[p.level() % WALL_FILL.length]));
            if (p.tube().guests().stream().noneMatch(g -> g.offsetMm() < at - p.start()
                    && at - p.start() < g.offsetMm() + g.lengthMm()) && ri > 6) {
                int size = (int) Math.max(7, Math.min(11, ri * 0.6));
                svg.append(String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"%d\""
                        + " text-anchor=\"middle\" dominant-baseline=\"middle\">%s</text>%n", x, y, size,
                        escape(p.tube().mark())));
            }
        }
    }

    private static void side(StringBuilder svg, List<Placed> tubes, List<double[]> slices, double left, double axis,
                             double lengthScale, double diameterScale) {
        for (Placed p : tubes) {
            double x = left + p.start() * lengthScale;
            double w = p.tube().lengthMm() * lengthScale;
            double h = p.tube().outerDiameterMm() * diameterScale;
            double y = axis - p.y() * diameterScale - h / 2;
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.2f\" y=\"%.2f\" width=\"%.2f\" height=\"%.2f\""
                    + " fill=\"%s\" fill-opacity=\"0.5\" stroke=\"#000\" stroke-width=\"0.8\" stroke-dasharray=\"%s\"/>%n",
                    x, y, w, h, WALL_FILL[p.level() % WALL_FILL.length], DASH[p.level() % DASH.length]));
            if (h >= 9 && w >= 24) {
                svg.append(String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"8\">%s</text>%n",
                        x + 2 + 8 * p.level(), y + 8, escape(p.tube().mark())));
            }
        }
        double top = axis - tubes.get(0).tube().outerDiameterMm() * diameterScale / 2 - 4;
        double bottom = axis + tubes.get(0).tube().outerDiameterMm() * diameterScale / 2 + 4;
        for (int i = 0; i < slices.size(); i++) {
            double x = left + slices.get(i)[0] * lengthScale;
            svg.append(String.format(Locale.ROOT, "<line x1=\"%.2f\" y1=\"%.2f\" x2=\"%.2f\" y2=\"%.2f\" stroke=\"#000\""
                    + " stroke-dasharray=\"1 3\"/>%n", x, top, x, bottom));
            text(svg, x - 3, bottom + 10, 10, "bold", sectionName(i));
        }
    }

    private static String circle(double x, double y, double r) {
        return String.format(Locale.ROOT, "M%.2f %.2fa%.2f %.2f 0 1 0 %.2f 0a%.2f %.2f 0 1 0 %.2f 0Z",
                x - r, y, r, r, 2 * r, r, r, -2 * r);
    }

    private static void text(StringBuilder svg, double x, double y, int size, String weight, String content) {
        svg.append(String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"%d\" font-weight=\"%s\">%s</text>%n",
                x, y, size, weight, escape(content)));
    }

    private static String sectionName(int i) {
        return String.valueOf((char) ('A' + i));
    }

    private static String signature(NestedTube t) {
        StringBuilder sb = new StringBuilder().append(t.mark().length()).append(':').append(t.mark()).append('|').append(NestingTables.number(t.lengthMm(), 2))
                .append('|').append(NestingTables.number(t.centerXMm(), 2)).append('|')
                .append(NestingTables.number(t.centerYMm(), 2)).append('|').append(NestingTables.number(t.offsetMm(), 2))
                .append('[');
        for (NestedTube g : t.guests()) {
            sb.append(signature(g)).append(';');
        }
        return sb.append(']').toString();
    }

    /** XML text escaping for element content and attribute values. */
    static String escape(String s) {
        StringBuilder out = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }
}
