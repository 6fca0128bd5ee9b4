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
 * @param remnant       whether the offcut goes back to the rack (false for scrap or no offcut)
 */
public record SawLayout(double stockLengthMm, List<Segment> segments, boolean remnant) {

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
        return new SawLayout(length, segments, offcut && "remnant".equals(pattern.offcutKind()));
    }

    /**
     * A saw line the operator sets the length stop for, in saw order.
     *
     * @param number 1-based saw order
     * @param stopMm distance from the stock piece's left end to the line: the face of the cut on the side of the
     *               piece just measured, the kerf falling on the other side (into the trim for the squaring cut)
     * @param kerfMm width of the kerf slot the cut leaves in the drawing's stretch (0 for a trim line, whose kerf
     *               lies inside the trim)
     * @param frees  what the cut frees: "trim" (the squaring cut), a piece's mark, the last piece's mark and the far
     *               trim ("D4 + trim"), or "remnant" (the remnant squared to the length on its tag)
     */
    public record SawLine(int number, double stopMm, double kerfMm, String frees) {
    }

    /**
     * The saw lines in saw order: the squaring cut at the end trim (when the trim is above 0), the cut after every
     * piece, the last piece's end when it runs up to the far trim (its kerf falls into the trim), and the far trim
     * line when a remnant goes back to the rack (squared to the length on its tag); scrap needs no squaring, so a
     * scrap offcut ends without a line at the far trim.
     */
    public List<SawLine> sawLines() {
        List<SawLine> lines = new ArrayList<>();
        Segment before = null;
        for (int i = 0; i < segments.size(); i++) {
            Segment s = segments.get(i);
            if (s.kind() == Kind.TRIM && i == 0 && s.lengthMm() > 0) {
                lines.add(new SawLine(lines.size() + 1, s.endMm(), 0, "trim"));
            } else if (s.kind() == Kind.KERF && before != null) {
                lines.add(new SawLine(lines.size() + 1, s.startMm(), s.lengthMm(), before.mark()));
            } else if (s.kind() == Kind.TRIM && i > 0 && s.lengthMm() > 0 && before != null) {
                if (before.kind() == Kind.PIECE) {
                    // the last piece ends on the far trim line or less than a kerf before it: the kerf goes into
                    // the trim, and the stop is the piece's end
                    lines.add(new SawLine(lines.size() + 1, before.endMm(), 0, before.mark() + " + trim"));
                } else if (remnant) {
                    lines.add(new SawLine(lines.size() + 1, s.startMm(), 0, "remnant"));
                }
            }
            if (s.kind() == Kind.PIECE || s.kind() == Kind.OFFCUT) {
                before = s;
            }
        }
        return List.copyOf(lines);
    }

    /** The cut pieces alone, in saw order. */
    public List<Segment> pieces() {
        return segments.stream().filter(s -> s.kind() == Kind.PIECE).toList();
    }
}
