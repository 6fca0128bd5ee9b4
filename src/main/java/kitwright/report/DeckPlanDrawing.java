package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.loading.PlacedCrate;
import kitwright.loading.VehicleLoad;
import kitwright.packing.Crate;

/**
 * Draws a vehicle's deck plan to scale, seen from above with the front of the deck on the left: the deck, every
 * stack of crates as its footprint labelled at its top left (clear of the centre-of-gravity line) with the crate
 * ids from the bottom up, the number high when crates stand on one another, and the crate type where it fits; stacks are shaded darker the higher they are and carry the count in text, so the plan
 * reads in greyscale. The centre of gravity is marked along the deck with its distance from the front; a ruler
 * counts metres from the front. A pure function; text is escaped by {@link Svg}; no script.
 */
public final class DeckPlanDrawing {
    static final double WIDTH = 900;
    private static final double LEFT = 46;
    private static final double RIGHT = 16;
    private static final double TOP = 26;
    private static final String INK = "#1f2a36";
    private static final String[] SHADES = {"#f2f4f6", "#d5dae0", "#b4bcc6", "#949eaa"};

    private DeckPlanDrawing() {
    }

    /**
     * @param drawingId identifier unique in the report (letters, digits and '-'), used for ids and data-vehicle
     * @param crates    the crates by id (for their outer sizes)
     */
    public static String draw(String drawingId, VehicleLoad load, Map<String, Crate> crates) {
        if (!drawingId.matches("[A-Za-z0-9-]+")) {
            throw new IllegalArgumentException("drawing id must be letters, digits and '-': " + drawingId);
        }
        double scale = (WIDTH - LEFT - RIGHT) / load.deckLengthMm();
        double deckHeight = load.deckWidthMm() * scale;
        double height = TOP + deckHeight + 86;
        Svg svg = new Svg();
        svg.open("svg", "xmlns", "http://www.w3.org/2000/svg", "class", "deck-plan", "data-vehicle", load.id(),
                "viewBox", "0 0 " + Svg.number(WIDTH) + " " + Svg.number(height), "role", "img",
                "aria-labelledby", drawingId + "-title");
        svg.element("title", "Vehicle " + load.id() + " (" + load.type() + "), deck plan to scale, front on the left",
                "id", drawingId + "-title");
        svg.rect(LEFT, TOP, load.deckLengthMm() * scale, deckHeight, "fill", "#ffffff", "stroke", INK,
                "stroke-width", 1.4);
        svg.rect(LEFT - 12, TOP, 8, deckHeight, "fill", INK);
        svg.text(LEFT - 16, TOP + deckHeight / 2, "front", "text-anchor", "middle", "font-size", 11, "fill", INK,
                "transform", "rotate(-90 " + Svg.number(LEFT - 20) + " " + Svg.number(TOP + deckHeight / 2) + ")");
        for (List<PlacedCrate> stack : stacks(load)) {
            stack(svg, stack, crates, scale);
        }
        double cog = LEFT + load.centreOfGravityMm() * scale;
        svg.open("g", "class", "centre-of-gravity", "data-cog-mm", Svg.number(load.centreOfGravityMm()));
        svg.line(cog, TOP - 6, cog, TOP + deckHeight + 6, "stroke", INK, "stroke-width", 1.6, "stroke-dasharray", "6 3");
        svg.empty("polygon", "points", Svg.number(cog - 6) + "," + Svg.number(TOP - 12) + " " + Svg.number(cog + 6) + ","
                + Svg.number(TOP - 12) + " " + Svg.number(cog) + "," + Svg.number(TOP - 2), "fill", INK);
        svg.text(cog + 9, TOP - 4, "centre of gravity " + ShopFormat.mm(load.centreOfGravityMm()) + " mm from front",
                "font-size", 11, "fill", INK, "paint-order", "stroke", "stroke", "#ffffff", "stroke-width", 3);
        // the combined centre (along and across) as a circled cross; y grows downwards in the drawing as on the deck
        double across = TOP + (load.deckWidthMm() / 2 + load.lateralCentreOfGravityMm()) * scale;
        svg.empty("circle", "cx", Svg.number(cog), "cy", Svg.number(across), "r", 6, "fill", "none", "stroke", INK,
                "stroke-width", 1.6, "data-lateral-mm", Svg.number(load.lateralCentreOfGravityMm()));
        svg.line(cog - 9, across, cog + 9, across, "stroke", INK, "stroke-width", 1.2);
        svg.close("g");
        ruler(svg, load.deckLengthMm(), scale, TOP + deckHeight);
        svg.text(LEFT, TOP + deckHeight + 42, load.id() + " \u00B7 " + load.type() + " \u00B7 " + load.crates().size()
                + " crate" + (load.crates().size() == 1 ? "" : "s") + " \u00B7 " + ShopFormat.kg(load.massKg())
                + " kg of " + ShopFormat.kg(load.payloadKg()) + " kg payload \u00B7 floor used "
                + ShopFormat.mm(load.floorLengthMm()) + " of " + ShopFormat.mm(load.deckLengthMm()) + " mm",
                "font-size", 12, "font-weight", 700, "fill", INK);
        svg.text(LEFT, TOP + deckHeight + 58, "Deck " + ShopFormat.mm(load.deckLengthMm()) + " \u00D7 "
                + ShopFormat.mm(load.deckWidthMm()) + " \u00D7 " + ShopFormat.mm(load.deckHeightMm())
                + " mm. Labels list the crates of a stack from the bottom up.", "font-size", 11, "fill", INK);
        svg.text(LEFT, TOP + deckHeight + 74, "Lateral centre " + AxleLoadText.lateral(load)
                + " mm from the centreline · " + AxleLoadText.of(load), "font-size", 11, "fill", INK);
        svg.close("svg");
        return svg.toString();
    }

    /** Crates grouped by their corner on the deck (one stack each), bottom first. */
    private static List<List<PlacedCrate>> stacks(VehicleLoad load) {
        Map<List<Double>, List<PlacedCrate>> stacks = new LinkedHashMap<>();
        for (PlacedCrate p : load.crates()) {
            stacks.computeIfAbsent(List.of(p.xMm(), p.yMm()), k -> new ArrayList<>()).add(p);
        }
        List<List<PlacedCrate>> list = new ArrayList<>();
        for (List<PlacedCrate> s : stacks.values()) {
            s.sort(java.util.Comparator.comparingDouble(PlacedCrate::zMm));
            list.add(s);
        }
        return list;
    }

    private static void stack(Svg svg, List<PlacedCrate> stack, Map<String, Crate> crates, double scale) {
        PlacedCrate base = stack.get(0);
        Crate c = crates.get(base.ref());
        if (c == null) {
            return;
        }
        double along = base.rotated() ? c.outerWidthMm() : c.outerLengthMm();
        double across = base.rotated() ? c.outerLengthMm() : c.outerWidthMm();
        double x = LEFT + base.xMm() * scale;
        double y = TOP + base.yMm() * scale;
        double w = along * scale;
        double h = across * scale;
        List<String> ids = stack.stream().map(PlacedCrate::ref).toList();
        svg.open("g", "class", "stack", "data-crates", String.join(" ", ids));
        List<String> topDown = new ArrayList<>(ids);
        java.util.Collections.reverse(topDown);
        svg.element("title", String.join(" on ", topDown) + (base.rotated() ? " (turned)" : ""));
        svg.rect(x, y, w, h, "fill", SHADES[Math.min(stack.size(), SHADES.length) - 1], "stroke", INK,
                "stroke-width", 1);
        // labels at the top left of the footprint, clear of the centre-of-gravity line through the middle
        String label = String.join("/", ids) + (stack.size() > 1 ? " (" + stack.size() + " high)" : "");
        double font = 12.5;
        if (label.length() * font * 0.6 > w - 10) {
            label = ids.get(0) + (stack.size() > 1 ? " +" + (stack.size() - 1) : "");
        }
        if (label.length() * font * 0.6 > w - 10) {
            font = Math.max(6, (w - 6) / (label.length() * 0.6));
        }
        double inset = Math.min(6, w / 10);
        svg.text(x + inset, y + Math.min(h / 2, 6 + font), label, "font-size", font, "font-weight", 700, "fill", INK,
                "paint-order", "stroke", "stroke", "#ffffff", "stroke-width", 3, "stroke-linejoin", "round");
        String type = c.type() + (base.rotated() ? ", turned" : "");
        if (h >= 2 * font + 16 && type.length() * 10 * 0.56 <= w - 2 * inset) {
            svg.text(x + inset, y + 2 * font + 10, type, "font-size", 10, "fill", INK, "paint-order", "stroke",
                    "stroke", "#ffffff", "stroke-width", 3, "stroke-linejoin", "round");
        }
        svg.close("g");
    }

    private static void ruler(Svg svg, double lengthMm, double scale, double top) {
        double y = top + 8;
        svg.line(LEFT, y, LEFT + lengthMm * scale, y, "stroke", INK, "stroke-width", 0.8);
        int step = lengthMm > 8000 ? 1000 : 500;
        for (int mm = 0; mm <= lengthMm + 1e-6; mm += step) {
            double x = LEFT + mm * scale;
            svg.line(x, y, x, y + (mm % 1000 == 0 ? 6 : 3), "stroke", INK, "stroke-width", 0.8);
            if (mm % 1000 == 0) {
                svg.text(x, y + 17, ShopFormat.metres(mm) + " m", "text-anchor", "middle", "font-size", 9,
                        "fill", INK);
            }
        }
    }
}
