package kitwright.testing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.report.Look;

/** Checks of a page's look shared by the report and the comparison tests: its styles, contrast, no network. */
public final class PageLook {
    public static final double AA_TEXT = 4.5;
    private static final Pattern STYLE = Pattern.compile("(?s)<style>(.*?)</style>");

    private PageLook() {
    }

    /** Every style element's text of a page. */
    public static String styles(String html) {
        Matcher m = STYLE.matcher(html);
        StringBuilder css = new StringBuilder();
        while (m.find()) {
            css.append(m.group(1)).append('\n');
        }
        return css.toString();
    }

    /** The custom properties of the look's :root rule. */
    public static Map<String, String> properties() {
        return Wcag.rules(Look.css()).get(":root");
    }

    /**
     * Every text colour (color, and fill in rules for SVG text) against every background colour (background,
     * background-color, the paper) that the page's stylesheets declare, all pairs.
     */
    public static List<String> lowContrastPairs(String css, Set<String> moreTexts, Set<String> moreBackgrounds) {
        Map<String, String> vars = properties();
        Set<String> texts = new LinkedHashSet<>(moreTexts);
        Set<String> backgrounds = new LinkedHashSet<>(moreBackgrounds);
        // the look's backgrounds: the paper and every tint it declares, whether or not this page uses them
        vars.forEach((name, value) -> {
            if (name.equals("--paper") || name.endsWith("tint")) {
                backgrounds.addAll(Wcag.colours(value, vars));
            }
        });
        Wcag.rules(css).forEach((selector, declarations) -> declarations.forEach((property, value) -> {
            if (property.equals("color") || property.equals("fill") && selector.contains("text")) {
                texts.addAll(Wcag.colours(value, vars));
            } else if (property.equals("background") || property.equals("background-color")) {
                backgrounds.addAll(Wcag.colours(value, vars));
            }
        }));
        assertThat(texts).as("text colours found").hasSizeGreaterThan(2);
        assertThat(backgrounds).as("background colours found").hasSizeGreaterThanOrEqualTo(4);
        List<String> low = new ArrayList<>();
        for (String text : texts) {
            for (String background : backgrounds) {
                double ratio = Wcag.contrast(text, background);
                if (ratio < AA_TEXT) {
                    low.add(text + " on " + background + ": " + String.format("%.2f", ratio));
                }
            }
        }
        return low;
    }

    /** No @import, no link element, no url() or src/href to another host; the SVG namespace name is no fetch. */
    public static void assertNoNetwork(String name, String html) {
        assertThat(html).as(name).isNotEmpty();
        String page = html.replace("xmlns=\"http://www.w3.org/2000/svg\"", "");
        assertThat(page).as(name).doesNotContainIgnoringCase("@import").doesNotContainIgnoringCase("<link")
                .doesNotContainIgnoringCase("http:").doesNotContainIgnoringCase("https:")
                .doesNotContainIgnoringCase("@font-face");
        assertThat(Pattern.compile("(?i)url\\(\\s*['\"]?(?!#)").matcher(page).find()).as(name + ": url()").isFalse();
        assertThat(Pattern.compile("(?i)(src|href)\\s*=\\s*\"(?!#)").matcher(page).find()).as(name + ": src/href")
                .isFalse();
    }

}
