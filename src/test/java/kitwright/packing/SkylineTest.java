package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The skyline's segments, spots and waste step; hand-worked (invented sizes). */
class SkylineTest {

    @Test
    @DisplayName("a row rests on the highest segment under it; the lowest spot wins, then the leftmost")
    void lowestSpot() {
        Skyline sky = new Skyline(0, 1000, 6000);
        sky.raise(0, 300, 200, 6000);
        sky.raise(300, 700, 100, 4000);
        sky.raise(700, 1000, 150, 6000);
        // a 400-wide row: at y = 0 it rests at 200, at y = 300 at 100 (bearing 4000), at y = 700 it passes the wall
        Skyline.Spot spot = sky.bestSpot(1000, 400, 100, 800, 1000, 3000);
        assertThat(spot.y()).isEqualTo(300.0);
        assertThat(spot.h()).isEqualTo(100.0);
        assertThat(spot.bearing()).isEqualTo(4000.0);
    }

    @Test
    @DisplayName("equal neighbours merge; a spot too high for the lid is none")
    void mergeAndLid() {
        Skyline sky = new Skyline(0, 1000, 6000);
        sky.raise(0, 500, 300, 6000);
        sky.raise(500, 1000, 300, 6000);
        assertThat(sky.segments()).containsExactly(new Skyline.Segment(0, 1000, 300, 6000));
        assertThat(sky.bestSpot(1000, 400, 600, 800, 600, 600)).isNull();
    }

    @Test
    @DisplayName("waste raises the lowest segment under a span to its lower higher neighbour, bearing nothing,"
            + " and to the lid when no neighbour stands higher")
    void waste() {
        Skyline sky = new Skyline(0, 1000, 6000);
        sky.raise(0, 200, 300, 6000);
        sky.raise(200, 500, 100, 6000);
        sky.raise(500, 1000, 200, 6000);
        sky.waste(100, 400, 800);
        assertThat(sky.segments()).containsExactly(new Skyline.Segment(0, 200, 300, 6000),
                new Skyline.Segment(200, 500, 200, 0), new Skyline.Segment(500, 1000, 200, 6000));
        Skyline flat = new Skyline(0, 1000, 6000);
        flat.waste(0, 400, 800);
        assertThat(flat.segments()).containsExactly(new Skyline.Segment(0, 1000, 800, 0));
    }
}
