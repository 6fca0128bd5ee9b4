package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class ShopFormatTest {
    /**
     * Digits grouped in threes by a thin space, never a comma or a point (SI Brochure, 9th edition 2019, 5.4.4);
     * written here as U+202F NARROW NO-BREAK SPACE, so that a group is never split across lines (Unicode).
     * A literal, not the production constant, so that a changed separator fails here.
     */
    private static final String G = "\u202F";

    @Test
    void millimetresHaveNoSpuriousDecimalsAndGroupedThousands() {
        assertThat(ShopFormat.mm(12000.0)).isEqualTo("12" + G + "000");
        assertThat(ShopFormat.mm(1234)).isEqualTo("1" + G + "234");
        assertThat(ShopFormat.mm(999)).isEqualTo("999");
        assertThat(ShopFormat.mm(1234.25)).isEqualTo("1" + G + "234.3");
        assertThat(ShopFormat.mm(2.0000000001)).isEqualTo("2");
        assertThat(ShopFormat.mm(0.5)).isEqualTo("0.5");
        assertThat(ShopFormat.mm(-0.01)).isEqualTo("0");
        assertThat(ShopFormat.mm(1234567.8)).isEqualTo("1" + G + "234" + G + "567.8");
        assertThat(ShopFormat.mmUnit(2486)).isEqualTo("2" + G + "486\u00A0mm");
    }

    @Test
    void moneyAndPercentKeepTheirDecimals() {
        assertThat(ShopFormat.money(1234.5)).isEqualTo("1" + G + "234.50");
        assertThat(ShopFormat.money(0)).isEqualTo("0.00");
        assertThat(ShopFormat.percent(0.08312)).isEqualTo("8.3");
        assertThat(ShopFormat.percent(0)).isEqualTo("0.0");
        assertThat(ShopFormat.metres(73250)).isEqualTo("73.25");
        assertThat(ShopFormat.count(-1234)).isEqualTo("-1" + G + "234");
        assertThat(ShopFormat.seconds(10.0)).isEqualTo("10");
        assertThat(ShopFormat.kg(Double.NaN)).isEqualTo("\u2014"); // an em dash for a figure not known
    }

    @Test
    void theDefaultLocaleDoesNotChangeTheText() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertThat(ShopFormat.mm(1234.5)).isEqualTo("1" + G + "234.5");
            assertThat(ShopFormat.money(1234.5)).isEqualTo("1" + G + "234.50");
            assertThat(Svg.number(12.345)).isEqualTo("12.35");
        } finally {
            Locale.setDefault(before);
        }
    }
}
