package kitwright.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.ItemKind;

/**
 * Draws a crate's cross-section to scale, looking along its length: the timber walls (outer box less inner box,
 * taken as equal on both sides), every lane of bundles as its envelope circle with the number of bundles lying end
 * to end in it, and every stack position of joint boxes hatched with its count. Circles have a dark ring (filled
 * with a tint when the caller gives one) and boxes are hatched, so the drawing reads in greyscale; the caption
 * says what is inside. A pure function:
 * the same crate gives the same bytes; text is escaped by {@link Svg}; no script.
 */
public final class CrateSectionDrawing {
    static final double WIDTH = 420;
    private static final double MARGIN = 34;
    private static final String INK = "#1f2a36";
    private static final String WALL = "#c9cfd6";

    private CrateSectionDrawing() {
    }

    /** A lane or box stack as seen in the cross-section, with the items along it. */
    private record Spot(ItemKind kind, double y, double z, double width, double height, List<String> refs) {
    }

    /**
     * @param drawingId identifier unique in the report (letters, digits and '-'), used for ids and data-crate
     */
    public static String draw(String drawingId, Crate crate) {
        return draw(drawingId, crate, Map.of());
    }

    /**
     * @param drawingId identifier unique in the report (letters, digits and '-'), used for ids and data-crate
     * @param laneFills fill of a lane by the ref of a bundle in it (the report colours by the host's mark); lanes
     *                  not in it are white
     */
    public static String draw(String drawingId, Crate crate, Map<String, String> laneFills) {
        if (!drawingId.matches("[A-Za-z0-9-]+")) {
            throw new IllegalArgumentException("drawing id must be letters, digits and '-': " + drawingId);
        }
        double scale = (WIDTH - 2 * MARGIN) / crate.outerWidthMm();
        double drawnHeight = crate.outerHeightMm() * scale;
        double height = MARGIN + drawnHeight + 46;
        double wallY = (crate.outerWidthMm() - crate.innerWidthMm()) / 2;
        double wallZ = (crate.outerHeightMm() - crate.innerHeightMm()) / 2;
        double left = MARGIN + wallY * scale;
        double floor = MARGIN + drawnHeight - wallZ * scale;

        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "crate-section", "data-crate", crate.id(),
                "data-crate-type", crate.type(),
                "viewBox", "0 0 " + Svg.number(WIDTH) + " " + Svg.number(height), "role", "img",
                "aria-labelledby", drawingId + "-title");
        svg.element("title", "Crate " + crate.id() + " (" + crate.type() + "), cross-section to scale",
                "id", drawingId + "-title");
        svg.open("defs");
        svg.open("pattern", "id", drawingId + "-box", "patternUnits", "userSpaceOnUse", "width", 5, "height", 5,
                "patternTransform", "rotate(45)");
        svg.rect(0, 0, 5, 5, "fill", "#ffffff");
        svg.line(0, 0, 0, 5, "stroke", "#4a5563", "stroke-width", 1);
        svg.close("pattern");
        svg.close("defs");
        svg.rect(MARGIN, MARGIN, crate.outerWidthMm() * scale, drawnHeight, "fill", WALL, "stroke", INK,
                "stroke-width", 1.2);
        svg.rect(left, floor - crate.innerHeightMm() * scale, crate.innerWidthMm() * scale,
                crate.innerHeightMm() * scale, "fill", "#ffffff", "stroke", INK, "stroke-width", 0.8);
        for (Spot s : spots(crate)) {
            spot(svg, s, left, floor, scale, drawingId, laneFills);
        }
        svg.text(WIDTH / 2, MARGIN - 10, "inner " + ShopFormat.mm(crate.innerWidthMm()) + " mm wide", "text-anchor",
                "middle", "font-size", 11, "fill", INK);
        svg.text(MARGIN - 8, floor - crate.innerHeightMm() * scale / 2, ShopFormat.mm(crate.innerHeightMm()) + " mm",
                "text-anchor", "middle", "font-size", 11, "fill", INK, "transform", "rotate(-90 "
                        + Svg.number(MARGIN - 12) + " " + Svg.number(floor - crate.innerHeightMm() * scale / 2) + ")");
        int bundles = crate.items(ItemKind.BUNDLE).size();
        int boxes = crate.items(ItemKind.BOX).size();
        svg.text(MARGIN, MARGIN + drawnHeight + 20, crate.id() + " \u00B7 " + crate.type() + " \u00B7 "
                + bundles + " bundle" + (bundles == 1 ? "" : "s") + ", " + boxes + " joint box"
                + (boxes == 1 ? "" : "es"), "font-size", 12, "font-weight", 700, "fill", INK);
        svg.text(MARGIN, MARGIN + drawnHeight + 36, "inner " + ShopFormat.mm(crate.innerLengthMm()) + " \u00D7 "
                + ShopFormat.mm(crate.innerWidthMm()) + " \u00D7 " + ShopFormat.mm(crate.innerHeightMm()) + " mm \u00B7 "
                + ShopFormat.kg(crate.grossKg()) + " kg of " + ShopFormat.kg(crate.maxGrossKg()) + " kg gross",
                "font-size", 11, "fill", INK);
        svg.close("svg");
        return svg.toString();
    }

    /** Items grouped by their place in the cross-section, in crate order. */
    private static List<Spot> spots(Crate crate) {
        Map<List<Object>, Spot> spots = new LinkedHashMap<>();
        for (CrateItem i : crate.items()) {
            List<Object> key = List.of(i.kind(), i.yMm(), i.zMm(), i.widthMm(), i.heightMm());
            spots.computeIfAbsent(key, k -> new Spot(i.kind(), i.yMm(), i.zMm(), i.widthMm(), i.heightMm(),
                    new java.util.ArrayList<>())).refs().add(i.ref());
        }
        return List.copyOf(spots.values());
    }

    private static void spot(Svg svg, Spot s, double left, double floor, double scale, String id,
                             Map<String, String> laneFills) {
        double x = left + s.y() * scale;
        double w = s.width() * scale;
        double h = s.height() * scale;
        double y = floor - (s.z() + s.height()) * scale;
        String refs = String.join(" ", s.refs());
        if (s.kind() == ItemKind.BUNDLE) {
            svg.open("g", "class", "lane", "data-bundles", s.refs().size());
            svg.element("title", "lane of " + s.refs().size() + " end to end: " + refs);
            svg.empty("circle", "cx", x + w / 2, "cy", y + h / 2, "r", w / 2, "fill",
                    laneFills.getOrDefault(s.refs().get(0), "#ffffff"), "stroke", INK,
                    "stroke-width", 0.9);
            if (s.refs().size() > 1 && w >= 11) {
                svg.text(x + w / 2, y + h / 2 + Math.min(w * 0.3, 4), String.valueOf(s.refs().size()),
                        "text-anchor", "middle", "font-size", Math.min(w * 0.7, 11), "fill", INK);
            }
        } else {
            svg.open("g", "class", "box-stack", "data-boxes", s.refs().size());
            svg.element("title", s.refs().size() + " joint box(es) end to end: " + refs);
            svg.rect(x, y, w, h, "fill", "url(#" + id + "-box)", "stroke", INK, "stroke-width", 0.9);
            if (w >= 16 && h >= 12) {
                svg.text(x + w / 2, y + h / 2 + 4, "\u00D7" + s.refs().size(), "text-anchor", "middle",
                        "font-size", 10, "fill", INK, "paint-order", "stroke", "stroke", "#ffffff", "stroke-width", 3);
            }
        }
        svg.close("g");
    }
}
