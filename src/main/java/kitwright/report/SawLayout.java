package kitwright.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.SawArithmetic;

/**
 * Where every piece, kerf, trim and offcut of a saw pattern lies along the stock piece, by the saw model of the
 * cutting plan: {@code trimMm} comes off each end and includes its own squaring cut; piece i starts at
 * {@code trim + sum over earlier pieces of (length + kerf)}; a kerf separates consecutive pieces, and one more
 * kerf frees the offcut when there is one; the offcut runs from there to the far trim line.
 *
 * @param stockLengthMm the stock piece's length
 * @param segments      trims, pieces, kerfs and the offcut, from the left end, in saw order
 */
public record SawLayout(double stockLengthMm, List<Segment> segments) {

    /** What a stretch of the stock piece becomes. */
    public enum Kind { TRIM, PIECE, KERF, OFFCUT }

    /**
     * One stretch of the stock piece.
     *
     * @param sequence 1-based saw order of a piece, 0 for anything else
     * @param mark     the piece's mark, or null
     */
    public record Segment(Kind kind, double startMm, double lengthMm, int sequence, String mark) {
        public double endMm() {
            return startMm + lengthMm;
        }
    }

    public SawLayout {
        segments = List.copyOf(segments);
    }

    /**
     * Lays out a pattern. The offcut's length is the pattern's own {@code offcutMm} (the plan's figure, floored at
     * 0); when the pieces run up to the far trim line there is no offcut and no kerf after the last piece.
     */
    public static SawLayout of(CutPattern pattern, double kerfMm, double trimMm) {
        double length = pattern.stockLengthMm();
        // positions in exact decimals, so that a kerf never drifts past the far trim line
        BigDecimal farTrimLine = SawArithmetic.exact(length).subtract(SawArithmetic.exact(trimMm));
        BigDecimal kerf = SawArithmetic.exact(kerfMm);
        List<Segment> segments = new ArrayList<>();
        segments.add(new Segment(Kind.TRIM, 0, trimMm, 0, null));
        BigDecimal position = SawArithmetic.exact(trimMm);
        List<Cut> cuts = pattern.cuts();
        boolean offcut = pattern.offcutMm() > 0;
        for (int i = 0; i < cuts.size(); i++) {
            Cut cut = cuts.get(i);
            segments.add(new Segment(Kind.PIECE, position.doubleValue(), cut.lengthMm(), i + 1, cut.mark()));
            position = position.add(SawArithmetic.exact(cut.lengthMm()));
            boolean last = i == cuts.size() - 1;
            if (!last || offcut) {
                BigDecimal slot = kerf.min(farTrimLine.subtract(position).max(BigDecimal.ZERO));
                segments.add(new Segment(Kind.KERF, position.doubleValue(), slot.doubleValue(), 0, null));
                position = position.add(kerf);
            }
        }
        if (offcut) {
            BigDecimal start = position.min(farTrimLine);
            segments.add(new Segment(Kind.OFFCUT, start.doubleValue(), farTrimLine.subtract(start).doubleValue(), 0,
                    null));
        }
        segments.add(new Segment(Kind.TRIM, farTrimLine.doubleValue(), trimMm, 0, null));
        return new SawLayout(length, segments);
    }

    /** The cut pieces alone, in saw order. */
    public List<Segment> pieces() {
        return segments.stream().filter(s -> s.kind() == Kind.PIECE).toList();
    }
}
