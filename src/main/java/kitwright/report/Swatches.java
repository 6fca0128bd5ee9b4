package kitwright.report;

/**
 * Small SVG keys for the saw-sheet legend: a colour swatch per mark, and the symbols of the drawings (cut piece,
 * end trim, kerf with its saw-cut wedge, remnant hatched one way, scrap cross-hatched). Built with {@link Svg}.
 */
final class Swatches {
    private Swatches() {
    }

    /** A 22 x 14 swatch of a mark's fill colour with the drawing's outline. */
    static String mark(String fill) {
        return new Svg().open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "swatch", "viewBox",
                        "0 0 22 14", "width", 22, "height", 14, "aria-hidden", "true")
                .rect(0.5, 0.5, 21, 13, "fill", fill, "stroke", SawSheetDrawing.INK, "stroke-width", 0.8)
                .close("svg").toString();
    }

    /**
     * The symbol key, one symbol per line.
     *
     * @param id prefix for the hatch patterns, unique in the report
     */
    static String key(String id) {
        String ink = SawSheetDrawing.INK;
        Svg svg = new Svg().open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "symbol-key",
                "viewBox", "0 0 200 120", "width", 200, "height", 120, "role", "img", "aria-label",
                "Key: cut piece, end trim, kerf and saw cut, remnant, scrap");
        svg.open("defs");
        svg.open("pattern", "id", id + "-remnant", "patternUnits", "userSpaceOnUse", "width", 7, "height", 7,
                "patternTransform", "rotate(45)");
        svg.rect(0, 0, 7, 7, "fill", "#ffffff").line(0, 0, 0, 7, "stroke", "#4a5563", "stroke-width", 1.6);
        svg.close("pattern");
        svg.open("pattern", "id", id + "-scrap", "patternUnits", "userSpaceOnUse", "width", 6, "height", 6,
                "patternTransform", "rotate(45)");
        svg.rect(0, 0, 6, 6, "fill", "#ffffff").line(0, 0, 0, 6, "stroke", "#4a5563", "stroke-width", 1.1)
                .line(0, 0, 6, 0, "stroke", "#4a5563", "stroke-width", 1.1);
        svg.close("pattern");
        svg.close("defs");
        double row = 24;
        double x = 30;
        svg.rect(2, 3, 22, 16, "fill", MarkPalette.colour(0), "stroke", ink, "stroke-width", 0.8);
        svg.text(x, 15, "cut piece: mark and length", "font-size", 12, "fill", ink);
        svg.rect(11, row + 3, 4, 16, "fill", "#59636e");
        svg.text(x, row + 15, "end trim", "font-size", 12, "fill", ink);
        svg.empty("path", "d", "M9 " + Svg.number(2 * row) + "L17 " + Svg.number(2 * row) + "L13 "
                + Svg.number(2 * row + 6) + "Z", "fill", ink);
        svg.rect(12.3, 2 * row + 7, 1.4, 14, "fill", ink);
        svg.text(x, 2 * row + 15, "saw cut and kerf", "font-size", 12, "fill", ink);
        svg.rect(2, 3 * row + 3, 22, 16, "fill", "url(#" + id + "-remnant)", "stroke", ink, "stroke-width", 0.8);
        svg.text(x, 3 * row + 15, "remnant: back to the rack", "font-size", 12, "fill", ink);
        svg.rect(2, 4 * row + 3, 22, 16, "fill", "url(#" + id + "-scrap)", "stroke", ink, "stroke-width", 0.8,
                "stroke-dasharray", "3 2");
        svg.text(x, 4 * row + 15, "scrap", "font-size", 12, "fill", ink);
        return svg.close("svg").toString();
    }
}
