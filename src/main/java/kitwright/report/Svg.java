package kitwright.report;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * A small builder for inline SVG that escapes every piece of text and every attribute value it is given, so a
 * mark named {@code <b>&"} ends up as text in the drawing and never as markup. Coordinates are written with at
 * most two decimals in a locale-independent form, so the same drawing always gives the same bytes.
 *
 * <p>Use: {@code new Svg().open("g", "class", "piece").text(x, y, mark, "class", "label").close("g")}; attribute
 * arguments come in name/value pairs. Element and attribute names are written as given and must be constants of
 * the calling code; only values and text content can come from the user.
 */
public final class Svg {
    private final StringBuilder out = new StringBuilder();
    private int depth;

    /** Opens an element: {@code <name a="v" ...>}. */
    public Svg open(String name, Object... attributes) {
        start(name, attributes);
        out.append('>');
        depth++;
        return this;
    }

    /** Closes the innermost open element. */
    public Svg close(String name) {
        if (depth == 0) {
            throw new IllegalStateException("no open element to close: " + name);
        }
        depth--;
        out.append("</").append(name).append('>');
        return this;
    }

    /** An element without content: {@code <name a="v" .../>}. */
    public Svg empty(String name, Object... attributes) {
        start(name, attributes);
        out.append("/>");
        return this;
    }

    /** An element holding escaped text: {@code <name a="v">text</name>}. */
    public Svg element(String name, String text, Object... attributes) {
        start(name, attributes);
        out.append('>').append(escape(text)).append("</").append(name).append('>');
        return this;
    }

    /** A rectangle. */
    public Svg rect(double x, double y, double width, double height, Object... attributes) {
        return empty("rect", join(new Object[] {"x", x, "y", y, "width", width, "height", height}, attributes));
    }

    /** A straight line. */
    public Svg line(double x1, double y1, double x2, double y2, Object... attributes) {
        return empty("line", join(new Object[] {"x1", x1, "y1", y1, "x2", x2, "y2", y2}, attributes));
    }

    /** A text element at (x, y) holding escaped text. */
    public Svg text(double x, double y, String text, Object... attributes) {
        return element("text", text, join(new Object[] {"x", x, "y", y}, attributes));
    }

    /** The SVG written so far; every element opened must have been closed. */
    @Override
    public String toString() {
        if (depth != 0) {
            throw new IllegalStateException(depth + " element(s) left open");
        }
        return out.toString();
    }

    private void start(String name, Object[] attributes) {
        if (attributes.length % 2 != 0) {
            throw new IllegalArgumentException("attributes come in name/value pairs: " + attributes.length);
        }
        out.append('<').append(name);
        for (int i = 0; i < attributes.length; i += 2) {
            Object value = attributes[i + 1];
            if (value == null) {
                continue;
            }
            out.append(' ').append(attributes[i]).append("=\"").append(escape(format(value))).append('"');
        }
    }

    private static Object[] join(Object[] first, Object[] second) {
        Object[] all = new Object[first.length + second.length];
        System.arraycopy(first, 0, all, 0, first.length);
        System.arraycopy(second, 0, all, first.length, second.length);
        return all;
    }

    /** A coordinate or any other value as text: numbers with at most two decimals, no exponent. */
    static String format(Object value) {
        if (value instanceof Double || value instanceof Float) {
            return number(((Number) value).doubleValue());
        }
        return String.valueOf(value);
    }

    /** A number with at most two decimals and no trailing zeros: 12.50 gives "12.5", 3.0 gives "3". */
    public static String number(double value) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("not a finite coordinate: " + value);
        }
        BigDecimal rounded = BigDecimal.valueOf(value).setScale(2, RoundingMode.HALF_UP).stripTrailingZeros();
        if (rounded.signum() == 0) {
            return "0";
        }
        return rounded.scale() < 0 ? rounded.setScale(0).toPlainString() : rounded.toPlainString();
    }

    /**
     * Escapes text and attribute values for XML and HTML: {@code & < > " '}; control characters that XML forbids
     * become U+FFFD.
     */
    public static String escape(String text) {
        StringBuilder sb = new StringBuilder(text.length() + 8);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c < 0x20 && c != '\t' && c != '\n' && c != '\r' ? '\uFFFD' : c);
            }
        }
        return sb.toString();
    }
}
