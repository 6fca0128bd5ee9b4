package kitwright.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The miscut allowance rule, max(piecesPerMark, ceil(percent / 100 x quantity)), on hand-computed cases (invented
 * figures), with the shares that binary floating point gets wrong: 10 % of 30 is exactly 3, 0.1 % of 3000 is exactly
 * 3, 7 % of 100 is exactly 7 (7.000000000000001 in doubles would round up to 8).
 */
class MiscutAllowanceTest {

    @ParameterizedTest(name = "{0} per mark, {1} % of {2} bars: {3} pieces")
    @CsvSource({
        "0, 0, 40, 0",
        "1, 0, 40, 1",
        "0, 10, 30, 3",
        "0, 10, 31, 4",
        "0, 0.1, 3000, 3",
        "0, 7, 100, 7",
        "0, 12.5, 8, 1",
        "0, 12.5, 9, 2",
        "0, 33.3, 3, 1",
        "2, 10, 12, 2",
        "2, 10, 25, 3",
        "0, 100, 17, 17",
        "5, 0, 0, 5",
        "0, 50, 0, 0"
    })
    void theLargerOfThePiecesPerMarkAndTheShareRoundedUp(int pieces, double percent, int quantity, int expected) {
        assertThat(new MiscutAllowance(pieces, percent).piecesFor(quantity)).isEqualTo(expected);
    }

    @Test
    void outOfRangeValuesAreRefused() {
        assertThatThrownBy(() -> new MiscutAllowance(-1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new MiscutAllowance(0, -0.5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new MiscutAllowance(0, 100.01)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new MiscutAllowance(0, Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void settingsWithoutAnAllowanceHoldNone() {
        KitSettings defaults = KitSettings.defaults("k");
        assertThat(defaults.miscutAllowance()).isEqualTo(MiscutAllowance.NONE);
        assertThat(defaults.miscutAllowance().isNone()).isTrue();
        assertThat(defaults.withMiscutAllowance(null).miscutAllowance()).isEqualTo(MiscutAllowance.NONE);
        assertThat(defaults.withMiscutAllowance(new MiscutAllowance(1, 0)).withKerfMm(3).miscutAllowance())
                .as("the other with-ers keep the allowance").isEqualTo(new MiscutAllowance(1, 0));
    }
}
