package kitwright.report;

/**
 * Small SVG keys for the saw-sheet legend: a colour swatch per mark, and the symbols of the drawings (cut piece,
 * saw line, end trim, remnant, scrap, stop), each named in words. Built with {@link Svg}.
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
     * The symbol key, one symbol per line, each named in words: cut piece, saw line with its kerf-wide slot, end
     * trim, remnant (plain tube with its bore dashed), scrap, and a stop measured from the left end.
     */
    static String key() {
        String ink = SawSheetDrawing.INK;
        String line = SawSheetDrawing.LINE;
        double row = 22;
        Svg svg = new Svg().open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "symbol-key",
                "viewBox", "0 0 250 " + Svg.number(6 * row + 6), "width", 250, "height", Svg.number(6 * row + 6),
                "role", "img", "aria-label", "Key: cut piece, saw line and kerf, end trim, remnant, scrap, stop");
        double x = 36;
        svg.rect(2, 3, 28, 14, "fill", MarkPalette.colour(0), "stroke", ink, "stroke-width", 1);
        svg.text(x, 14, "cut piece: mark and length", "font-size", 11.5, "fill", ink);
        double y = row;
        svg.rect(2, y + 3, 28, 14, "fill", MarkPalette.colour(0), "stroke", ink, "stroke-width", 1);
        svg.rect(15, y + 2.3, 2, 15.4, "fill", "#ffffff");
        svg.line(16, y, 16, y + 20, "stroke", ink, "stroke-width", 0.8, "stroke-dasharray", "6 2 1.5 2");
        svg.text(x, y + 14, "saw line, kerf wide", "font-size", 11.5, "fill", ink);
        y += row;
        svg.rect(2, y + 3, 28, 14, "fill", MarkPalette.colour(0), "stroke", ink, "stroke-width", 1);
        svg.rect(2, y + 3, 4, 14, "fill", SawSheetDrawing.TRIM);
        svg.text(x, y + 14, "end trim (\u201Ctrim 5\u201D)", "font-size", 11.5, "fill", ink);
        y += row;
        svg.rect(2, y + 3, 28, 14, "fill", "#ffffff", "stroke", ink, "stroke-width", 1);
        svg.line(2, y + 6, 30, y + 6, "stroke", line, "stroke-width", 0.7, "stroke-dasharray", "6 3");
        svg.line(2, y + 14, 30, y + 14, "stroke", line, "stroke-width", 0.7, "stroke-dasharray", "6 3");
        svg.text(x, y + 14, "remnant: plain tube, to the rack", "font-size", 11.5, "fill", ink);
        y += row;
        svg.rect(2, y + 3, 28, 14, "fill", SawSheetDrawing.SCRAP, "stroke", ink, "stroke-width", 1);
        svg.rect(3.5, y + 4.5, 25, 11, "fill", "none", "stroke", ink, "stroke-width", 0.8, "stroke-dasharray", "3 2");
        svg.text(x, y + 14, "scrap: to the bin", "font-size", 11.5, "fill", ink);
        y += row;
        svg.empty("circle", "cx", 5, "cy", y + 5, "r", 2.4, "fill", "#ffffff", "stroke", ink, "stroke-width", 1);
        svg.line(24, y + 1, 24, y + 7, "stroke", line, "stroke-width", 0.7);
        svg.text(27.5, y + 9, "740", "font-size", 9, "fill", ink, "text-anchor", "end",
                "transform", "rotate(-90 27.5 " + Svg.number(y + 9) + ")");
        svg.text(x, y + 14, "stop: mm from the left end (\u25CB)", "font-size", 11.5, "fill", ink);
        return svg.close("svg").toString();
    }
}
