package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class SvgTest {
    @Test
    void textAndAttributeValuesAreEscaped() {
        String svg = new Svg().open("g", "data-mark", "<b>&\"'").text(1, 2.5, "<b>&\"'").close("g").toString();
        assertThat(svg).isEqualTo("<g data-mark=\"&lt;b&gt;&amp;&quot;&#39;\">"
                + "<text x=\"1\" y=\"2.5\">&lt;b&gt;&amp;&quot;&#39;</text></g>");
    }

    @Test
    void controlCharactersBecomeReplacementCharacters() {
        assertThat(Svg.escape("a\u0001b\tc")).isEqualTo("a\uFFFDb\tc");
    }

    @Test
    void numbersHaveAtMostTwoDecimalsAndNoExponent() {
        assertThat(Svg.number(3.0)).isEqualTo("3");
        assertThat(Svg.number(12.5)).isEqualTo("12.5");
        assertThat(Svg.number(1e-9)).isEqualTo("0");
        assertThat(Svg.number(-0.0)).isEqualTo("0");
        assertThat(Svg.number(1.0e7)).isEqualTo("10000000");
        assertThat(Svg.number(0.125)).isEqualTo("0.13");
    }

    @Test
    void nullAttributesAreLeftOut() {
        assertThat(new Svg().empty("rect", "fill", "red", "stroke-dasharray", null).toString())
                .isEqualTo("<rect fill=\"red\"/>");
    }

    @Test
    void unbalancedElementsAreRefused() {
        assertThatThrownBy(() -> new Svg().open("g").toString()).isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> new Svg().close("g")).isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> new Svg().empty("rect", "fill")).isInstanceOf(IllegalArgumentException.class);
    }
}
