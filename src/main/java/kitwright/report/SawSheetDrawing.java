package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.CutPattern;
import kitwright.report.SawLayout.Kind;
import kitwright.report.SawLayout.SawLine;
import kitwright.report.SawLayout.Segment;

/**
 * Draws one saw pattern as an inline SVG, the way a shop drawing shows a tube: the stock piece in side view to
 * scale along its length (the same scale for every pattern of a section), its outline in full lines and the bore
 * as hidden (dashed) lines at the wall's share of the diameter, and an end view of the section (outer and bore
 * circles, "Ø 48.3 × 3.2") at the left. Each cut piece is filled in its mark's colour with the mark and length
 * written on it; each saw line is a chain line through a slot as wide as the kerf; the end trims are dark stubs
 * named "trim"; a remnant is drawn as plain tube (stock going back to the rack, "remnant 534 mm, to rack"), scrap
 * as a grey stretch with a dashed outline named "scrap". Under the tube the stops the operator sets are written as
 * running dimensions from the stock piece's left end (ISO 129-1 running dimensioning: one origin, each value at
 * its extension line); where two lines lie too close for both values the nearer is left to the list of stops
 * beside the drawing, which has them all. Colour only helps the eye: marks, lengths, trim, remnant and scrap are
 * words, so the drawing reads the same in greyscale print.
 *
 * <p>Where labels go is decided by {@link SawLabels}. A pure function: the same pattern gives the same bytes;
 * text and attribute values are escaped by {@link Svg}.
 */
public final class SawSheetDrawing {
    static final double WIDTH = 900;
    static final double LEFT = 84;
    static final double RIGHT = 14;
    static final double BAR_HEIGHT = 44;
    static final double ROW_HEIGHT = 17;
    static final String INK = "#1d1f21";
    /** Hidden lines, chain lines and dimension lines: a lighter ink. */
    static final String LINE = "#55595e";
    static final String TRIM = "#5f5a55";
    static final String SCRAP = "#d9d6d2";
    static final String STEEL = "#c9cdd1";
    static final double STOP_FONT = 10;
    /** Running dimensions closer than this (drawing units) share no text: the list beside has both. */
    static final double STOP_PITCH = STOP_FONT + 1.5;
    private static final double SLOT_MIN = 1.8;
    /** A white outline under text, so labels stay legible over lines. */
    private static final Object[] HALO = {"paint-order", "stroke", "stroke", "#ffffff", "stroke-width", 3.5,
        "stroke-linejoin", "round"};

    /** The section seen end-on; null fields are not allowed, an unknown section is a null Tube. */
    public record Tube(double outerDiameterMm, double wallMm) {
        public Tube {
            if (!(outerDiameterMm > 0) || !(wallMm > 0) || 2 * wallMm > outerDiameterMm) {
                throw new IllegalArgumentException("tube needs 0 < 2 wall <= outer diameter");
            }
        }
    }

    private SawSheetDrawing() {
    }

    /** The drawing of one pattern with no end view (the section's diameter and wall not known). */
    public static String draw(String patternId, String title, CutPattern pattern, double kerfMm, double trimMm,
                              double scaleLengthMm, MarkPalette palette) {
        return draw(patternId, title, pattern, kerfMm, trimMm, scaleLengthMm, palette, null);
    }

    /**
     * The drawing of one pattern.
     *
     * @param patternId     identifier unique in the report (letters, digits and '-'), used for ids and data-pattern
     * @param title         what the drawing shows, for screen readers
     * @param scaleLengthMm the stock length that spans the full drawing width (the section's longest)
     * @param tube          the section for the end view and the bore lines, or null when not known
     */
    public static String draw(String patternId, String title, CutPattern pattern, double kerfMm, double trimMm,
                              double scaleLengthMm, MarkPalette palette, Tube tube) {
        if (!patternId.matches("[A-Za-z0-9-]+")) {
            throw new IllegalArgumentException("pattern id must be letters, digits and '-': " + patternId);
        }
        SawLayout layout = SawLayout.of(pattern, kerfMm, trimMm);
        double scale = (WIDTH - LEFT - RIGHT) / Math.max(scaleLengthMm, pattern.stockLengthMm());
        SawLabels labels = SawLabels.of(layout, pattern, scale, LEFT, WIDTH);
        double barTop = 14 + labels.rows() * ROW_HEIGHT + (labels.rows() > 0 ? 8 : 0);
        double bottom = barTop + BAR_HEIGHT;
        double height = bottom + 14 + longestStop(layout) + 6;

        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "saw-drawing", "data-pattern", patternId,
                "viewBox", "0 0 " + Svg.number(WIDTH) + " " + Svg.number(height), "role", "img",
                "aria-labelledby", patternId + "-title");
        svg.element("title", title, "id", patternId + "-title");
        endView(svg, tube, barTop);
        double end = LEFT + pattern.stockLengthMm() * scale;
        for (Segment s : layout.segments()) {
            segment(svg, s, scale, barTop);
        }
        for (Segment s : layout.segments()) {
            if (s.kind() == Kind.PIECE) {
                piece(svg, s, scale, barTop, palette);
            }
        }
        offcut(svg, layout, pattern, scale, barTop);
        outline(svg, end, barTop, tube);
        sawLines(svg, layout.sawLines(), scale, barTop);
        inside(svg, labels, barTop);
        callouts(svg, labels, barTop);
        stops(svg, layout.sawLines(), scale, bottom);
        svg.close("svg");
        return svg.toString();
    }

    /** The end view: outer circle, bore circle, the steel between them shaded, and the size under it. */
    private static void endView(Svg svg, Tube tube, double barTop) {
        if (tube == null) {
            return;
        }
        double r = BAR_HEIGHT / 2;
        double cx = LEFT / 2 - 2;
        double cy = barTop + r;
        svg.open("g", "class", "end-view", "data-outer-diameter-mm", ShopFormat.mm(tube.outerDiameterMm()),
                "data-wall-mm", ShopFormat.mm(tube.wallMm()));
        svg.element("title", "end view: tube \u00D8 " + ShopFormat.mm(tube.outerDiameterMm()) + " \u00D7 "
                + ShopFormat.mm(tube.wallMm()) + " mm");
        svg.empty("circle", "cx", cx, "cy", cy, "r", r, "fill", STEEL, "stroke", INK, "stroke-width", 1.2);
        svg.empty("circle", "cx", cx, "cy", cy, "r", r * bore(tube), "fill", "#ffffff", "stroke", INK,
                "stroke-width", 0.9);
        svg.line(cx - r - 4, cy, cx + r + 4, cy, "stroke", LINE, "stroke-width", 0.6, "stroke-dasharray", "7 2 1.5 2");
        svg.line(cx, cy - r - 4, cx, cy + r + 4, "stroke", LINE, "stroke-width", 0.6, "stroke-dasharray", "7 2 1.5 2");
        svg.text(cx, barTop + BAR_HEIGHT + 14, "\u00D8\u2009" + ShopFormat.mm(tube.outerDiameterMm()) + " \u00D7 "
                + ShopFormat.mm(tube.wallMm()), "class", "section-size", "text-anchor", "middle", "font-size", 10,
                "fill", INK);
        svg.close("g");
    }

    /** The bore's share of the outer diameter, at least a fifth so that a thick wall still shows a bore. */
    private static double bore(Tube tube) {
        return Math.max(0.2, 1 - 2 * tube.wallMm() / tube.outerDiameterMm());
    }

    /** Trims, kerf slots and the offcut; pieces come after, in their own groups. */
    private static void segment(Svg svg, Segment s, double scale, double barTop) {
        double x = LEFT + s.startMm() * scale;
        double w = s.lengthMm() * scale;
        switch (s.kind()) {
            case TRIM -> {
                if (s.lengthMm() > 0) {
                    double drawn = Math.max(w, 2.5);
                    svg.rect(s.startMm() == 0 ? x : x + w - drawn, barTop, drawn, BAR_HEIGHT, "class", "trim",
                            "fill", TRIM);
                }
            }
            case KERF, PIECE, OFFCUT -> {
                // kerfs are drawn with their saw line, pieces and the offcut in their own groups
            }
            default -> throw new IllegalStateException("unknown segment " + s.kind());
        }
    }

    private static void piece(Svg svg, Segment s, double scale, double barTop, MarkPalette palette) {
        double x = LEFT + s.startMm() * scale;
        double w = s.lengthMm() * scale;
        svg.open("g", "class", "piece", "data-mark", s.mark());
        svg.element("title", s.mark() + " \u00B7 " + ShopFormat.sawMmUnit(s.lengthMm()) + " \u00B7 piece "
                + s.sequence());
        svg.rect(x, barTop, w, BAR_HEIGHT, "fill", palette.fill(s.mark()), "data-length-mm",
                ShopFormat.sawMm(s.lengthMm()));
        svg.close("g");
    }

    /** The tube's outline in full lines and its bore as hidden lines, over the whole stock length. */
    private static void outline(Svg svg, double end, double barTop, Tube tube) {
        double wall = tube == null ? 0 : Math.max(2.5, BAR_HEIGHT * (1 - bore(tube)) / 2);
        if (wall > 0) {
            for (double y : new double[] {barTop + wall, barTop + BAR_HEIGHT - wall}) {
                svg.line(LEFT, y, end, y, "class", "bore", "stroke", LINE, "stroke-width", 0.7,
                        "stroke-dasharray", "6 3");
            }
        }
        svg.rect(LEFT, barTop, end - LEFT, BAR_HEIGHT, "class", "tube", "fill", "none", "stroke", INK,
                "stroke-width", 1.4);
    }

    /** Each saw line: a white slot as wide as the kerf (at least visible) and a chain line through it. */
    private static void sawLines(Svg svg, List<SawLine> lines, double scale, double barTop) {
        for (SawLine line : lines) {
            double x = LEFT + line.stopMm() * scale;
            svg.open("g", "class", "saw-line", "data-line", line.number(), "data-stop-mm",
                    ShopFormat.sawMm(line.stopMm()));
            if (line.kerfMm() > 0) {
                double slot = Math.max(line.kerfMm() * scale, SLOT_MIN);
                svg.rect(x, barTop - 0.7, slot, BAR_HEIGHT + 1.4, "class", "kerf", "fill", "#ffffff");
                x += slot / 2;
            }
            svg.line(x, barTop - 7, x, barTop + BAR_HEIGHT + 7, "stroke", INK, "stroke-width", 0.8,
                    "stroke-dasharray", "6 2 1.5 2");
            svg.close("g");
        }
    }

    /** The offcut: plain tube for a remnant, a grey stretch with a dashed outline for scrap, and its words. */
    private static void offcut(Svg svg, SawLayout layout, CutPattern pattern, double scale, double barTop) {
        for (Segment s : layout.segments()) {
            if (s.kind() != Kind.OFFCUT) {
                continue;
            }
            boolean remnant = layout.remnant();
            double x = LEFT + s.startMm() * scale;
            double w = Math.max(s.lengthMm() * scale, 1.5);
            svg.open("g", "class", remnant ? "offcut remnant" : "offcut scrap", "data-offcut",
                    pattern.offcutKind(), "data-length-mm", ShopFormat.sawMm(pattern.offcutMm()));
            if (remnant) {
                svg.rect(x, barTop, w, BAR_HEIGHT, "fill", "#ffffff");
            } else {
                svg.rect(x, barTop, w, BAR_HEIGHT, "fill", SCRAP);
                svg.rect(x + 1.5, barTop + 1.5, Math.max(w - 3, 0.5), BAR_HEIGHT - 3, "fill", "none",
                        "stroke", INK, "stroke-width", 0.8, "stroke-dasharray", "3 2");
            }
            String label = SawLabels.offcutText(pattern);
            if (SawLabels.textWidth(label, SawLabels.FONT) + 10 <= w) {
                text(svg, x + w / 2, barTop + BAR_HEIGHT / 2 + 4.5, label, SawLabels.FONT, remnant,
                        "offcut-label", true);
            }
            svg.close("g");
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

    /** Leaders (or a bracket over a run of equal pieces) first, then the labels with a halo over them. */
    private static void callouts(Svg svg, SawLabels labels, double barTop) {
        for (SawLabels.Callout c : labels.callouts()) {
            double baseline = barTop - 12 - c.row() * ROW_HEIGHT;
            double foot = barTop - 1;
            if (c.toX() > c.fromX()) {
                double bracket = barTop - 9;
                svg.empty("path", "d", "M" + Svg.number(c.fromX()) + " " + Svg.number(foot) + "V"
                        + Svg.number(bracket) + "H" + Svg.number(c.toX()) + "V" + Svg.number(foot), "fill", "none",
                        "stroke", LINE, "stroke-width", 0.9);
                foot = bracket;
            }
            svg.line((c.fromX() + c.toX()) / 2, foot, c.centreX(), baseline + 3, "stroke", LINE, "stroke-width", 0.8);
        }
        for (SawLabels.Callout c : labels.callouts()) {
            double baseline = barTop - 12 - c.row() * ROW_HEIGHT;
            text(svg, c.centreX(), baseline, c.text(), SawLabels.CALLOUT_FONT, c.bold(), "callout", true);
        }
    }

    /** Width of the longest stop value written upright, for the drawing's height. */
    private static double longestStop(SawLayout layout) {
        double longest = SawLabels.textWidth("0", STOP_FONT);
        for (SawLine line : layout.sawLines()) {
            longest = Math.max(longest, SawLabels.textWidth(ShopFormat.sawMm(line.stopMm()), STOP_FONT));
        }
        return longest;
    }

    /**
     * Running dimensions: the origin (a small circle at the left end), an extension line under every saw line and
     * its stop written upright beside it, read from the right as drawings are. The last line's value is always
     * written; a value that would touch the one before it is left out of the drawing (the list has it).
     */
    private static void stops(Svg svg, List<SawLine> lines, double scale, double bottom) {
        double top = bottom + 9;
        double foot = bottom + 12;
        svg.open("g", "class", "stops");
        svg.empty("circle", "class", "origin", "cx", LEFT, "cy", top, "r", 2.4, "fill", "#ffffff", "stroke", INK,
                "stroke-width", 1);
        List<Integer> shown = new ArrayList<>();
        double last = LEFT;
        for (int i = 0; i < lines.size(); i++) {
            double x = LEFT + lines.get(i).stopMm() * scale;
            boolean lastLine = i == lines.size() - 1;
            if (i == 0 || x - last >= STOP_PITCH) {
                shown.add(i);
                last = x;
            } else if (lastLine) {
                if (shown.size() > 1) {
                    shown.remove(shown.size() - 1);
                }
                shown.add(i);
            }
        }
        for (int i = 0; i < lines.size(); i++) {
            SawLine line = lines.get(i);
            double x = LEFT + line.stopMm() * scale;
            svg.line(x, bottom + 2, x, foot, "stroke", LINE, "stroke-width", 0.7);
            if (shown.contains(i)) {
                svg.text(x + STOP_FONT * 0.36, foot + 2, ShopFormat.sawMm(line.stopMm()), "class", "stop",
                        "data-line", line.number(), "text-anchor", "end", "font-size", STOP_FONT, "fill", INK,
                        "transform", "rotate(-90 " + Svg.number(x + STOP_FONT * 0.36) + " " + Svg.number(foot + 2)
                                + ")");
            }
        }
        svg.close("g");
    }
}
