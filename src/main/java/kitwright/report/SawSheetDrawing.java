package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.CutPattern;
import kitwright.report.SawLayout.Kind;
import kitwright.report.SawLayout.Segment;

/**
 * Draws one saw pattern as an inline SVG: the stock piece to scale (the same scale for every pattern of a
 * section), each cut piece in its mark's colour with the mark and length written on it, dark end trims, kerf slots
 * with a wedge above each saw cut, the offcut (a remnant hatched one way and named "remnant", scrap cross-hatched
 * with a dashed outline and named "scrap"), a ruler in millimetres from the left end, and the repeat count in a
 * dark badge ("× 12"). Colour only helps the eye: marks and lengths are written, offcuts are told apart by
 * hatching and by name, so the drawing reads the same in greyscale print.
 *
 * <p>Where labels go is decided by {@link SawLabels}. A pure function: the same pattern gives the same bytes;
 * text and attribute values are escaped by {@link Svg}.
 */
public final class SawSheetDrawing {
    static final double WIDTH = 900;
    static final double LEFT = 84;
    static final double RIGHT = 14;
    static final double BAR_HEIGHT = 46;
    static final double ROW_HEIGHT = 17;
    static final String INK = "#1f2a36";
    private static final String GREY = "#6b7682";
    /** A white outline under text, so labels stay legible over hatching and leader lines. */
    private static final Object[] HALO = {"paint-order", "stroke", "stroke", "#ffffff", "stroke-width", 3.5,
        "stroke-linejoin", "round"};

    private SawSheetDrawing() {
    }

    /**
     * The drawing of one pattern.
     *
     * @param patternId     identifier unique in the report (letters, digits and '-'), used for ids and data-pattern
     * @param title         what the drawing shows, for screen readers
     * @param scaleLengthMm the stock length that spans the full drawing width (the section's longest)
     */
    public static String draw(String patternId, String title, CutPattern pattern, double kerfMm, double trimMm,
                              double scaleLengthMm, MarkPalette palette) {
        if (!patternId.matches("[A-Za-z0-9-]+")) {
            throw new IllegalArgumentException("pattern id must be letters, digits and '-': " + patternId);
        }
        SawLayout layout = SawLayout.of(pattern, kerfMm, trimMm);
        double scale = (WIDTH - LEFT - RIGHT) / Math.max(scaleLengthMm, pattern.stockLengthMm());
        SawLabels labels = SawLabels.of(layout, pattern, scale, LEFT, WIDTH);
        double barTop = 14 + labels.rows() * ROW_HEIGHT + (labels.rows() > 0 ? 8 : 0);
        double height = barTop + BAR_HEIGHT + 34;

        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "saw-drawing", "data-pattern", patternId,
                "viewBox", "0 0 " + Svg.number(WIDTH) + " " + Svg.number(height), "role", "img",
                "aria-labelledby", patternId + "-title");
        svg.element("title", title, "id", patternId + "-title");
        hatches(svg, patternId);
        badge(svg, pattern.count(), barTop);
        for (Segment s : layout.segments()) {
            segment(svg, s, pattern, scale, barTop, palette, patternId);
        }
        svg.rect(LEFT, barTop, pattern.stockLengthMm() * scale, BAR_HEIGHT, "fill", "none", "stroke", INK,
                "stroke-width", 1.4);
        inside(svg, labels, barTop);
        wedges(svg, layout, scale, barTop);
        callouts(svg, labels, barTop);
        ruler(svg, pattern.stockLengthMm(), scale, barTop + BAR_HEIGHT);
        svg.close("svg");
        return svg.toString();
    }

    /** The hatches of the offcut; ids carry the drawing's id, as ids must be unique in the page. */
    private static void hatches(Svg svg, String id) {
        svg.open("defs");
        svg.open("pattern", "id", id + "-remnant", "patternUnits", "userSpaceOnUse", "width", 7, "height", 7,
                "patternTransform", "rotate(45)");
        svg.rect(0, 0, 7, 7, "fill", "#ffffff");
        svg.line(0, 0, 0, 7, "stroke", "#4a5563", "stroke-width", 1.6);
        svg.close("pattern");
        svg.open("pattern", "id", id + "-scrap", "patternUnits", "userSpaceOnUse", "width", 6, "height", 6,
                "patternTransform", "rotate(45)");
        svg.rect(0, 0, 6, 6, "fill", "#ffffff");
        svg.line(0, 0, 0, 6, "stroke", "#4a5563", "stroke-width", 1.1);
        svg.line(0, 0, 6, 0, "stroke", "#4a5563", "stroke-width", 1.1);
        svg.close("pattern");
        svg.close("defs");
    }

    private static void badge(Svg svg, int count, double barTop) {
        svg.rect(4, barTop, LEFT - 18, BAR_HEIGHT, "rx", 5, "fill", INK);
        svg.text((LEFT - 14) / 2 + 4, barTop + BAR_HEIGHT / 2 + 7, "\u00D7\u2009" + count, "class", "count",
                "text-anchor", "middle", "fill", "#ffffff", "font-size", 20, "font-weight", 700);
    }

    private static void segment(Svg svg, Segment s, CutPattern pattern, double scale, double barTop,
                                MarkPalette palette, String id) {
        double x = LEFT + s.startMm() * scale;
        double w = s.lengthMm() * scale;
        switch (s.kind()) {
            case TRIM -> svg.rect(s.startMm() == 0 ? x : x + w - Math.max(w, 2.5), barTop, Math.max(w, 2.5),
                    BAR_HEIGHT, "class", "trim", "fill", "#59636e");
            case KERF -> svg.rect(x + w / 2 - Math.max(w, 1.4) / 2, barTop, Math.max(w, 1.4), BAR_HEIGHT,
                    "class", "kerf", "fill", INK);
            case PIECE -> {
                svg.open("g", "class", "piece", "data-mark", s.mark());
                svg.element("title", s.mark() + " \u00B7 " + ShopFormat.sawMmUnit(s.lengthMm()) + " \u00B7 cut "
                        + s.sequence());
                svg.rect(x, barTop, w, BAR_HEIGHT, "fill", palette.fill(s.mark()), "stroke", INK,
                        "stroke-width", 0.8);
                svg.close("g");
            }
            case OFFCUT -> {
                boolean remnant = "remnant".equals(pattern.offcutKind());
                svg.open("g", "class", remnant ? "offcut remnant" : "offcut scrap", "data-offcut",
                        pattern.offcutKind());
                svg.rect(x, barTop, Math.max(w, 1.5), BAR_HEIGHT, "fill",
                        "url(#" + id + (remnant ? "-remnant" : "-scrap") + ")", "stroke", INK, "stroke-width", 0.8,
                        "stroke-dasharray", remnant ? null : "3 2");
                String label = SawLabels.offcutText(pattern);
                if (SawLabels.textWidth(label, SawLabels.FONT) + 10 <= w) {
                    text(svg, x + w / 2, barTop + BAR_HEIGHT / 2 + 4.5, label, SawLabels.FONT, remnant, "offcut-label",
                            true);
                }
                svg.close("g");
            }
            default -> throw new IllegalStateException("unknown segment " + s.kind());
        }
    }

    private static void inside(Svg svg, SawLabels labels, double barTop) {
        double middle = barTop + BAR_HEIGHT / 2;
        for (SawLabels.Inside label : labels.inside()) {
            if (label.second() == null) {
                text(svg, label.centreX(), middle + 4.5, label.first(), SawLabels.FONT, true, "run-label", true);
            } else {
                text(svg, label.centreX(), middle - 3, label.first(), SawLabels.FONT, true, "mark-label", false);
                text(svg, label.centreX(), middle + 13, label.second(), SawLabels.FONT - 0.5, false,
                        "length-label", false);
            }
        }
    }

    private static void text(Svg svg, double x, double y, String text, double size, boolean bold, String clazz,
                             boolean halo) {
        Object[] base = {"class", clazz, "text-anchor", "middle", "font-size", size, "font-weight",
            bold ? 700 : 400, "fill", INK};
        if (!halo) {
            svg.text(x, y, text, base);
            return;
        }
        Object[] all = new Object[base.length + HALO.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(HALO, 0, all, base.length, HALO.length);
        svg.text(x, y, text, all);
    }

    /** A small wedge above the stock piece at every saw cut: both squaring cuts and every kerf. */
    private static void wedges(Svg svg, SawLayout layout, double scale, double barTop) {
        List<Double> cuts = new ArrayList<>();
        for (Segment s : layout.segments()) {
            if (s.kind() == Kind.KERF) {
                cuts.add(s.startMm() + s.lengthMm() / 2);
            } else if (s.kind() == Kind.TRIM) {
                cuts.add(s.startMm() == 0 ? s.endMm() : s.startMm());
            }
        }
        cuts.sort(Double::compare);
        for (double mm : cuts) {
            double x = LEFT + mm * scale;
            svg.empty("path", "class", "saw-cut", "d", "M" + Svg.number(x - 4) + " " + Svg.number(barTop - 7)
                    + "L" + Svg.number(x + 4) + " " + Svg.number(barTop - 7) + "L" + Svg.number(x) + " "
                    + Svg.number(barTop - 1) + "Z", "fill", INK);
        }
    }

    /** Leaders (or a bracket over a run of equal pieces) first, then the labels with a halo over them. */
    private static void callouts(Svg svg, SawLabels labels, double barTop) {
        for (SawLabels.Callout c : labels.callouts()) {
            double baseline = barTop - 12 - c.row() * ROW_HEIGHT;
            double foot = barTop - 1;
            if (c.toX() > c.fromX()) {
                double bracket = barTop - 9;
                svg.empty("path", "d", "M" + Svg.number(c.fromX()) + " " + Svg.number(foot) + "V"
                        + Svg.number(bracket) + "H" + Svg.number(c.toX()) + "V" + Svg.number(foot), "fill", "none",
                        "stroke", GREY, "stroke-width", 0.9);
                foot = bracket;
            }
            svg.line((c.fromX() + c.toX()) / 2, foot, c.centreX(), baseline + 3, "stroke", GREY, "stroke-width", 0.8);
        }
        for (SawLabels.Callout c : labels.callouts()) {
            double baseline = barTop - 12 - c.row() * ROW_HEIGHT;
            text(svg, c.centreX(), baseline, c.text(), SawLabels.CALLOUT_FONT, c.bold(), "callout", true);
        }
    }

    /** Ticks every 100, 250, 500, 1000, 2000 or 5000 mm (whichever is at least 55 units apart) and the end. */
    private static void ruler(Svg svg, double lengthMm, double scale, double barBottom) {
        double y = barBottom + 7;
        double end = LEFT + lengthMm * scale;
        svg.line(LEFT, y, end, y, "stroke", GREY, "stroke-width", 0.8);
        double step = 5000;
        for (double candidate : new double[] {100, 250, 500, 1000, 2000, 5000}) {
            if (candidate * scale >= 55) {
                step = candidate;
                break;
            }
        }
        String endLabel = ShopFormat.sawMmUnit(lengthMm);
        double endLabelWidth = SawLabels.textWidth(endLabel, 10.5);
        for (double mm = 0; mm < lengthMm - 1e-6; mm += step) {
            double x = LEFT + mm * scale;
            svg.line(x, y, x, y + 5, "stroke", GREY, "stroke-width", 0.8);
            if (end - x >= endLabelWidth + SawLabels.textWidth(ShopFormat.mm(mm), 10.5) / 2 + 8) {
                svg.text(x, y + 18, ShopFormat.mm(mm), "class", "ruler", "text-anchor", mm == 0 ? "start" : "middle",
                        "font-size", 10.5, "fill", "#4a5563");
            }
        }
        svg.line(end, y - 3, end, y + 6, "stroke", INK, "stroke-width", 1.2);
        svg.text(end, y + 18, endLabel, "class", "ruler", "text-anchor", "end", "font-size", 10.5,
                "font-weight", 700, "fill", INK);
    }
}
