package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.model.Origin;
import kitwright.report.SawLayout.Kind;
import kitwright.report.SawLayout.Segment;
import org.junit.jupiter.api.Test;

/** Saw model (src/docs/sources.md): piece i starts at trim + sum of earlier (length + kerf); offcut after one more kerf. */
class SawLayoutTest {
    @Test
    void piecesStartWhereTheSawModelPutsThem() {
        // 6000 - 2*5 - (2000 + 1500) - 2*2 = 2486 (hand-computed)
        CutPattern p = new CutPattern(6000, Origin.MILL, 3,
                List.of(new Cut("A", 2000), new Cut("B", 1500)), 2486, "remnant");
        SawLayout layout = SawLayout.of(p, 2, 5);
        assertThat(layout.segments()).extracting(Segment::kind).containsExactly(
                Kind.TRIM, Kind.PIECE, Kind.KERF, Kind.PIECE, Kind.KERF, Kind.OFFCUT, Kind.TRIM);
        assertThat(layout.pieces()).extracting(Segment::startMm).containsExactly(5.0, 2007.0);
        assertThat(layout.pieces()).extracting(Segment::sequence).containsExactly(1, 2);
        Segment offcut = layout.segments().get(5);
        assertThat(offcut.startMm()).isEqualTo(3509.0);
        assertThat(offcut.lengthMm()).isEqualTo(2486.0);
        assertThat(offcut.endMm()).isEqualTo(5995.0);
        assertThat(layout.segments().get(6).startMm()).isEqualTo(5995.0);
    }

    @Test
    void piecesThatReachTheFarTrimLineNeedNoKerfAfterTheLast() {
        // sum(length + kerf) = 5992 = 6000 - 2*5 + 2: the limit of the saw model; offcut 6000-10-5988-4 < 0 -> 0
        CutPattern p = new CutPattern(6000, Origin.MILL, 1,
                List.of(new Cut("A", 2994), new Cut("A", 2994)), 0, "scrap");
        SawLayout layout = SawLayout.of(p, 2, 5);
        assertThat(layout.segments()).extracting(Segment::kind).containsExactly(
                Kind.TRIM, Kind.PIECE, Kind.KERF, Kind.PIECE, Kind.TRIM);
        assertThat(layout.pieces().get(1).endMm()).isEqualTo(5995.0);
    }
}
