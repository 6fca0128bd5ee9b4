package kitwright.testing;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Colour contrast by WCAG 2.1, definitions of relative luminance and contrast ratio: each sRGB channel c (0..1)
 * is linearised as c / 12.92 when c ≤ 0.04045, else ((c + 0.055) / 1.055)^2.4; L = 0.2126 R + 0.7152 G + 0.0722 B;
 * the contrast ratio is (L1 + 0.05) / (L2 + 0.05) with L1 the lighter. (WCAG 2.1 prints the threshold 0.03928 from
 * the older sRGB draft; both give the same result for 8-bit channels.) Also a small reader of the colours a
 * stylesheet declares, for the tests of the look.
 */
public final class Wcag {
    private static final Pattern RULE = Pattern.compile("([^{}]+)\\{([^{}]*)\\}");
    private static final Pattern HEX = Pattern.compile("#([0-9a-fA-F]{6}|[0-9a-fA-F]{3})\\b");
    private static final Pattern VAR = Pattern.compile("var\\((--[a-z0-9-]+)\\)");
    private static final Map<String, String> NAMED = Map.of("white", "#ffffff", "black", "#000000");

    private Wcag() {
    }

    /** Relative luminance of #rrggbb or #rgb. */
    public static double luminance(String hex) {
        String h = hex.substring(1);
        if (h.length() == 3) {
            h = "" + h.charAt(0) + h.charAt(0) + h.charAt(1) + h.charAt(1) + h.charAt(2) + h.charAt(2);
        }
        double[] c = new double[3];
        for (int i = 0; i < 3; i++) {
            double v = Integer.parseInt(h.substring(2 * i, 2 * i + 2), 16) / 255.0;
            c[i] = v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
        }
        return 0.2126 * c[0] + 0.7152 * c[1] + 0.0722 * c[2];
    }

    /** The contrast ratio of two colours, 1 to 21. */
    public static double contrast(String a, String b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    /** A stylesheet's rules: selector to declarations (property to value), comments and at-rule heads dropped. */
    public static Map<String, Map<String, String>> rules(String css) {
        String plain = css.replaceAll("(?s)/\\*.*?\\*/", "");
        Map<String, Map<String, String>> rules = new LinkedHashMap<>();
        Matcher m = RULE.matcher(plain);
        while (m.find()) {
            String selector = m.group(1).replaceAll("(?s).*[;{}]", "").replaceAll("@media[^{]*$", "").strip();
            Map<String, String> declarations = rules.computeIfAbsent(selector, k -> new LinkedHashMap<>());
            for (String d : m.group(2).split(";")) {
                int colon = d.indexOf(':');
                if (colon > 0) {
                    declarations.put(d.substring(0, colon).strip().toLowerCase(Locale.ROOT), d.substring(colon + 1)
                            .strip());
                }
            }
        }
        return rules;
    }

    /** The colours in a declared value (#hex, white, black, var(--x) by the custom properties given). */
    public static Set<String> colours(String value, Map<String, String> properties) {
        Set<String> out = new LinkedHashSet<>();
        String resolved = value;
        for (int i = 0; i < 5 && VAR.matcher(resolved).find(); i++) {
            resolved = VAR.matcher(resolved).replaceAll(r -> Matcher.quoteReplacement(
                    properties.getOrDefault(r.group(1), "")));
        }
        Matcher hex = HEX.matcher(resolved);
        while (hex.find()) {
            out.add(hex.group().toLowerCase(Locale.ROOT));
        }
        for (String word : resolved.toLowerCase(Locale.ROOT).split("[^a-z]+")) {
            if (NAMED.containsKey(word)) {
                out.add(NAMED.get(word));
            }
        }
        return out;
    }
}
