package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestedTube;

/**
 * Drawings of bundles as inline SVG (no script, no external reference), in the order a drawing office would use:
 * <ol>
 *   <li>a side view with the start end on the left, the length to scale and the diameters enlarged by a stated
 *   factor, guests dashed (hidden lines), and the places of the cross-sections marked A, B, C, D;</li>
 *   <li>under it, to the same length scale, one bar per tube from its start to its end, labelled with its mark and
 *   length, so it is plain where each tube sits along the bundle;</li>
 *   <li>up to four cross-sections to scale, one per stretch where the set of tubes changes (the fullest first),
 *   seen from the start end, each named with the tubes it cuts from the outside in.</li>
 * </ol>
 * Tubes are filled by the colour given for their mark (the report colours by section) or grey by nesting level;
 * every tube also carries its mark as text, so the drawing reads in greyscale print. Text is escaped by {@link Svg}.
 */
public final class BundleDrawing {
    private static final double WIDTH = 760;
    private static final double LEFT = 20;
    private static final double SIDE_TOP = 28;
    private static final double BAND = 56;
    private static final double ROW = 14;
    private static final double SECTION_SIZE = 116;
    private static final double SLOT = 180;
    private static final int MAX_SECTIONS = 4;
    private static final String INK = "#1f2a36";
    private static final String SOFT = "#4a5563";
    private static final String[] LEVEL_FILL = {"#d9d9d9", "#a6a6a6", "#e8e8e8", "#7f7f7f", "#f2f2f2"};
    private static final String[] DASH = {null, "6 3", "2 2", "8 2 2 2", "1 2"};

    /** Bundles with the same layout, drawn once. */
    public record Distinct(Bundle bundle, List<String> ids) {
        public Distinct {
            ids = List.copyOf(ids);
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

    /** The drawing of one bundle layout, tubes grey by nesting level; {@code ids} are the bundles built so. */
    public static String svg(Bundle bundle, List<String> ids) {
        return svg(bundle, ids, Map.of());
    }

    /**
     * The drawing of one bundle layout.
     *
     * @param ids   the bundles built this way (for the drawing's title)
     * @param fills fill colour by mark; a mark not in it is grey by its nesting level
     */
    public static String svg(Bundle bundle, List<String> ids, Map<String, String> fills) {
        List<PlacedTube> tubes = PlacedTube.of(bundle);
        List<double[]> slices = PlacedTube.slices(tubes, MAX_SECTIONS);
        double lengthScale = (WIDTH - 2 * LEFT) / bundle.lengthMm();
        double diameterScale = Math.max(lengthScale, BAND / bundle.envelopeDiameterMm());
        List<List<PlacedTube>> rows = rows(tubes, lengthScale);
        double extentsTop = SIDE_TOP + BAND + 22;
        double sectionsTop = extentsTop + rows.size() * ROW + 18;
        double height = sectionsTop + SECTION_SIZE + 40;

        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "bundle-drawing", "data-bundle", bundle.id(),
                "viewBox", "0 0 " + Svg.number(WIDTH) + " " + Svg.number(height), "role", "img",
                "font-family", "Helvetica Neue, Arial, Liberation Sans, DejaVu Sans, sans-serif");
        svg.element("title", "Bundle " + bundle.id() + (ids.size() > 1 ? " and " + (ids.size() - 1) + " alike" : "")
                + ": side view, tube lengths and cross-sections");
        svg.text(LEFT, 14, String.format(Locale.ROOT, "Side view, start end on the left: length to scale,"
                + " diameters \u00D7%.0f, guests dashed; cross-sections seen from the start end",
                diameterScale / lengthScale), "font-size", 10.5, "fill", SOFT);
        side(svg, tubes, slices, fills, SIDE_TOP + BAND / 2, lengthScale, diameterScale);
        extents(svg, rows, fills, extentsTop, lengthScale);
        for (int i = 0; i < slices.size(); i++) {
            section(svg, tubes, slices.get(i)[0], i, fills, LEFT + i * SLOT, sectionsTop,
                    SECTION_SIZE / bundle.envelopeDiameterMm());
        }
        svg.close("svg");
        return svg.toString();
    }

    private static String fill(PlacedTube p, Map<String, String> fills) {
        return fills.getOrDefault(p.tube().mark(), LEVEL_FILL[p.level() % LEVEL_FILL.length]);
    }

    private static String dash(PlacedTube p) {
        return DASH[p.level() % DASH.length];
    }

    private static void side(Svg svg, List<PlacedTube> tubes, List<double[]> slices, Map<String, String> fills,
                             double axis, double lengthScale, double diameterScale) {
        svg.open("g", "class", "side-view");
        for (PlacedTube p : tubes) {
            double h = p.tube().outerDiameterMm() * diameterScale;
            svg.rect(LEFT + p.start() * lengthScale, axis - p.y() * diameterScale - h / 2,
                    p.tube().lengthMm() * lengthScale, h, "fill", fill(p, fills), "fill-opacity",
                    p.level() == 0 ? null : 0.85, "stroke", INK, "stroke-width", p.level() == 0 ? 1.2 : 0.8,
                    "stroke-dasharray", dash(p));
        }
        double half = tubes.get(0).tube().outerDiameterMm() * diameterScale / 2;
        for (int i = 0; i < slices.size(); i++) {
            double x = LEFT + slices.get(i)[0] * lengthScale;
            svg.line(x, axis - half - 6, x, axis + half + 6, "stroke", INK, "stroke-width", 0.8,
                    "stroke-dasharray", "3 2");
            svg.text(x, axis + half + 17, sectionName(i), "text-anchor", "middle", "font-size", 11,
                    "font-weight", 700, "fill", INK);
        }
        svg.close("g");
    }

    /** Tubes in rows for the length bars: level by level, a tube joins the first row of its level it clears. */
    private static List<List<PlacedTube>> rows(List<PlacedTube> tubes, double lengthScale) {
        List<PlacedTube> order = new ArrayList<>(tubes);
        order.sort((a, b) -> a.level() != b.level() ? Integer.compare(a.level(), b.level())
                : Double.compare(a.start(), b.start()));
        List<List<PlacedTube>> rows = new ArrayList<>();
        List<Double> reach = new ArrayList<>();
        for (PlacedTube p : order) {
            double from = p.start() * lengthScale;
            int row = -1;
            for (int r = 0; r < rows.size() && row < 0; r++) {
                if (rows.get(r).get(0).level() == p.level() && reach.get(r) <= from + 0.5) {
                    row = r;
                }
            }
            if (row < 0) {
                rows.add(new ArrayList<>());
                reach.add(Double.NEGATIVE_INFINITY);
                row = rows.size() - 1;
            }
            rows.get(row).add(p);
            reach.set(row, Math.max(p.end() * lengthScale, from + labelOutside(p, lengthScale)));
        }
        return rows;
    }

    private static String lengthLabel(PlacedTube p) {
        return p.tube().mark() + " \u00B7 " + ShopFormat.mm(p.tube().lengthMm());
    }

    /** Width a label needs when it does not fit in its bar (then it stands right of the bar), else 0. */
    private static double labelOutside(PlacedTube p, double lengthScale) {
        double text = lengthLabel(p).length() * 5.4 + 6;
        double bar = p.tube().lengthMm() * lengthScale;
        return text <= bar ? 0 : bar + text;
    }

    private static void extents(Svg svg, List<List<PlacedTube>> rows, Map<String, String> fills, double top,
                                double lengthScale) {
        svg.open("g", "class", "tube-lengths");
        for (int r = 0; r < rows.size(); r++) {
            double y = top + r * ROW;
            for (PlacedTube p : rows.get(r)) {
                double x = LEFT + p.start() * lengthScale;
                double w = p.tube().lengthMm() * lengthScale;
                svg.open("g", "class", "tube-length", "data-mark", p.tube().mark());
                svg.rect(x, y, w, ROW - 3, "fill", fill(p, fills), "stroke", INK, "stroke-width", 0.7,
                        "stroke-dasharray", dash(p));
                boolean inside = labelOutside(p, lengthScale) == 0;
                svg.text(inside ? x + 4 : x + w + 3, y + ROW - 6, lengthLabel(p), "font-size", 9.5, "fill", INK);
                svg.close("g");
            }
        }
        svg.close("g");
    }

    private static void section(Svg svg, List<PlacedTube> tubes, double at, int index, Map<String, String> fills,
                                double left, double top, double scale) {
        double cx = left + SECTION_SIZE / 2;
        double cy = top + SECTION_SIZE / 2;
        List<PlacedTube> cut = tubes.stream().filter(p -> p.start() < at && at < p.end()).toList();
        svg.open("g", "class", "cross-section", "data-at-mm", Math.round(at));
        for (PlacedTube p : cut) {
            double x = cx + p.x() * scale;
            double y = cy - p.y() * scale;
            double r = p.tube().outerDiameterMm() / 2 * scale;
            double ri = p.tube().boreMm() / 2 * scale;
            svg.empty("path", "d", circle(x, y, r) + circle(x, y, ri), "fill", fill(p, fills), "fill-rule",
                    "evenodd", "stroke", INK, "stroke-width", 0.8);
            boolean innermost = cut.stream().noneMatch(q -> q.level() > p.level()
                    && Math.hypot(q.x() - p.x(), q.y() - p.y()) < p.tube().boreMm() / 2);
            if (innermost && ri > 6) {
                double size = Math.max(7, Math.min(11, ri * 0.6));
                svg.text(x, y + size * 0.35, p.tube().mark(), "font-size", size, "text-anchor", "middle",
                        "fill", INK);
            }
        }
        svg.text(left, top + SECTION_SIZE + 15, sectionName(index) + "\u2013" + sectionName(index) + " at "
                + ShopFormat.mm(Math.round(at)) + " mm", "font-size", 10.5, "font-weight", 700, "fill", INK);
        svg.text(left, top + SECTION_SIZE + 29, outsideIn(cut), "font-size", 9.5, "fill", SOFT);
        svg.close("g");
    }

    /** The tubes of a cross-section from the outside in: "A1 ⊃ B1 ⊃ 3 × E2". */
    private static String outsideIn(List<PlacedTube> cut) {
        Map<Integer, Map<String, Integer>> levels = new java.util.TreeMap<>();
        for (PlacedTube p : cut) {
            levels.computeIfAbsent(p.level(), k -> new LinkedHashMap<>()).merge(p.tube().mark(), 1, Integer::sum);
        }
        List<String> parts = new ArrayList<>();
        for (Map<String, Integer> marks : levels.values()) {
            List<String> level = new ArrayList<>();
            marks.forEach((mark, n) -> level.add(n == 1 ? mark : n + " \u00D7 " + mark));
            parts.add(String.join(" + ", level));
        }
        return String.join(" \u2283 ", parts);
    }

    private static String circle(double x, double y, double r) {
        return "M" + Svg.number(x - r) + " " + Svg.number(y) + "a" + Svg.number(r) + " " + Svg.number(r) + " 0 1 0 "
                + Svg.number(2 * r) + " 0a" + Svg.number(r) + " " + Svg.number(r) + " 0 1 0 " + Svg.number(-2 * r)
                + " 0Z";
    }

    private static String sectionName(int i) {
        return String.valueOf((char) ('A' + i));
    }

    private static String signature(NestedTube t) {
        StringBuilder sb = new StringBuilder().append(t.mark().length()).append(':').append(t.mark()).append('|')
                .append(NestingTables.number(t.lengthMm(), 2)).append('|')
                .append(NestingTables.number(t.centerXMm(), 2)).append('|')
                .append(NestingTables.number(t.centerYMm(), 2)).append('|')
                .append(NestingTables.number(t.offsetMm(), 2)).append('[');
        for (NestedTube g : t.guests()) {
            sb.append(signature(g)).append(';');
        }
        return sb.append(']').toString();
    }
}
