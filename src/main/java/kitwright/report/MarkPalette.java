package kitwright.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.model.Bar;
import kitwright.model.Kit;

/**
 * One fill colour per mark, assigned in the kit's mark order so that a mark keeps its colour on every sheet and in
 * every drawing of a report (saw sheets, bundles, crate lanes). Colours are light enough for black labels to stay legible and for a greyscale print to show the labels
 * rather than dark blocks; the colour only helps the eye, every piece also carries its mark as text.
 *
 * <p>The first twelve colours are hand-picked soft hues; further marks step round the colour wheel by the golden
 * angle (about 137.5 degrees), which keeps neighbouring marks apart however many there are.
 */
public final class MarkPalette {
    private static final List<String> FIRST = List.of(
            "#9cc3e0", "#f3b67c", "#acd68a", "#ee9f9f", "#c4afd8", "#f2dc84",
            "#8fd0c3", "#e3b3d0", "#cfc58d", "#a8b6e6", "#f0c6a4", "#bcd7a5");

    private final Map<String, String> fills;

    private MarkPalette(Map<String, String> fills) {
        this.fills = fills;
    }

    /** A palette for these marks, in this order (duplicates keep their first colour). */
    public static MarkPalette of(List<String> marks) {
        Map<String, String> fills = new LinkedHashMap<>();
        for (String mark : marks) {
            if (!fills.containsKey(mark)) {
                fills.put(mark, colour(fills.size()));
            }
        }
        return new MarkPalette(fills);
    }

    /**
     * The kit's palette: every mark in the kit's order, so that a mark has one colour throughout the report (saw
     * sheets, bundle drawings, crate lanes, their legends).
     */
    public static MarkPalette of(Kit kit) {
        return of(kit.bars().stream().map(Bar::mark).toList());
    }

    /** This palette extended by further marks (those it holds keep their colour). */
    public MarkPalette with(List<String> marks) {
        List<String> all = new java.util.ArrayList<>(fills.keySet());
        all.addAll(marks);
        return of(all);
    }

    /** Fill by mark, in palette order. */
    public Map<String, String> fills() {
        return java.util.Collections.unmodifiableMap(fills);
    }

    /** The fill of a mark; a neutral grey for a mark the palette was not made for. */
    public String fill(String mark) {
        return fills.getOrDefault(mark, "#d9d9d9");
    }

    /** The marks in palette order. */
    public List<String> marks() {
        return List.copyOf(fills.keySet());
    }

    /** The n-th colour (0-based). */
    static String colour(int n) {
        if (n < FIRST.size()) {
            return FIRST.get(n);
        }
        double hue = (n * 137.50776405) % 360.0;
        double lightness = n % 2 == 0 ? 0.80 : 0.72;
        return hsl(hue, 0.55, lightness);
    }

    /** HSL to #rrggbb (hue in degrees, saturation and lightness 0 to 1). */
    static String hsl(double hue, double saturation, double lightness) {
        double chroma = (1 - Math.abs(2 * lightness - 1)) * saturation;
        double h = hue / 60.0;
        double x = chroma * (1 - Math.abs(h % 2 - 1));
        double r = 0;
        double g = 0;
        double b = 0;
        switch ((int) Math.floor(h) % 6) {
            case 0 -> { r = chroma; g = x; }
            case 1 -> { r = x; g = chroma; }
            case 2 -> { g = chroma; b = x; }
            case 3 -> { g = x; b = chroma; }
            case 4 -> { r = x; b = chroma; }
            default -> { r = chroma; b = x; }
        }
        double m = lightness - chroma / 2;
        return String.format(Locale.ROOT, "#%02x%02x%02x",
                Math.round((r + m) * 255), Math.round((g + m) * 255), Math.round((b + m) * 255));
    }
}
