package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class RowPatternTest {

    @Test
    @DisplayName("1000 x 1000, d = 100: square 100, staggered 105 (src/docs/sources.md, hand count)")
    void handCountedSquareMetre() {
        // square: floor(1000/100) * floor(1000/100) = 10 * 10
        assertThat(RowPattern.SQUARE.capacity(1000, 1000, 100)).isEqualTo(100);
        // staggered: 1 + floor((1000 - 100) / 86.60) = 11 rows, alternating floor(1000/100) = 10 and
        // floor((1000 - 50)/100) = 9: 6 * 10 + 5 * 9 = 105
        assertThat(RowPattern.STAGGERED.rows(1000, 100)).isEqualTo(11);
        assertThat(RowPattern.STAGGERED.perRow(0, 1000, 100)).isEqualTo(10);
        assertThat(RowPattern.STAGGERED.perRow(1, 1000, 100)).isEqualTo(9);
        assertThat(RowPattern.STAGGERED.capacity(1000, 1000, 100)).isEqualTo(105);
        assertThat(RowPattern.better(1000, 1000, 100)).isEqualTo(RowPattern.STAGGERED);
    }

    @Test
    @DisplayName("1000 x 500, d = 100: square 50 beats staggered 48 (hand count)")
    void squareWinsInALowSection() {
        // staggered: 1 + floor(400 / 86.60) = 5 rows: 10 + 9 + 10 + 9 + 10 = 48
        assertThat(RowPattern.SQUARE.capacity(1000, 500, 100)).isEqualTo(50);
        assertThat(RowPattern.STAGGERED.capacity(1000, 500, 100)).isEqualTo(48);
        assertThat(RowPattern.better(1000, 500, 100)).isEqualTo(RowPattern.SQUARE);
    }

    @Test
    @DisplayName("shifted rows keep the full count when W/d has a fractional part of 1/2 or more (hand count)")
    void shiftedRowFullWhenWidthAllows() {
        // W = 1050, d = 100: floor(1050/100) = 10 and floor((1050 - 50)/100) = 10
        assertThat(RowPattern.STAGGERED.perRow(1, 1050, 100)).isEqualTo(10);
        assertThat(RowPattern.STAGGERED.height(3, 100)).isCloseTo(100 + 2 * 86.6025, org.assertj.core.data.Offset
                .offset(1e-3));
    }

    @Test
    @DisplayName("neighbouring circles of the staggered rows touch: centres exactly d apart (geometry)")
    void staggeredNeighboursTouch() {
        double d = 48.3;
        double dy = RowPattern.STAGGERED.centreY(1, 0, d) - RowPattern.STAGGERED.centreY(0, 0, d);
        double dz = RowPattern.STAGGERED.centreZ(1, d) - RowPattern.STAGGERED.centreZ(0, d);
        assertThat(Math.hypot(dy, dz)).isCloseTo(d, org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    @DisplayName("fewest rows for n circles")
    void rowsFor() {
        assertThat(RowPattern.STAGGERED.rowsFor(19, 1000, 100)).isEqualTo(2);
        assertThat(RowPattern.STAGGERED.rowsFor(20, 1000, 100)).isEqualTo(3);
        assertThat(RowPattern.SQUARE.rowsFor(20, 1000, 100)).isEqualTo(2);
        assertThat(RowPattern.SQUARE.rowsFor(1, 50, 100)).isEqualTo(-1);
    }
}
