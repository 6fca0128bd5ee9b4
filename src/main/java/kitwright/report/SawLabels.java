package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.CutPattern;
import kitwright.report.SawLayout.Kind;
import kitwright.report.SawLayout.Segment;

/**
 * Where the labels of a saw drawing go. A piece wide enough carries its mark and length inside; a run of equal
 * pieces too narrow for that gets one label across the run ("12 × D4 · 275") when the run is wide enough, else a
 * callout above the stock piece with a bracket over the run; a single narrow piece or offcut, and each end trim
 * ("trim 5"), gets a callout with a leader. Callouts go into rows above the stock piece, each into the lowest row where it overlaps no other label
 * (a greedy interval placement, left to right).
 *
 * @param inside   labels drawn on the stock piece
 * @param callouts labels drawn above it
 * @param rows     rows of callouts needed (0 when none)
 */
record SawLabels(List<Inside> inside, List<Callout> callouts, int rows) {
    static final double FONT = 12.5;
    static final double CALLOUT_FONT = FONT - 1;

    /**
     * A label on the stock piece, centred at x.
     *
     * @param second second line (the length under the mark), or null for a one-line label over a run
     */
    record Inside(double centreX, String first, String second) {
    }

    /**
     * A label above the stock piece pointing at [fromX, toX] (equal for a single piece).
     *
     * @param row 0 for the row nearest the stock piece
     */
    record Callout(double fromX, double toX, String text, boolean bold, int row, double centreX) {
    }

    SawLabels {
        inside = List.copyOf(inside);
        callouts = List.copyOf(callouts);
    }

    /** Rough width of a label in a sans-serif face: 0.62 em per character (digits and capitals). */
    static double textWidth(String text, double fontSize) {
        return text.codePointCount(0, text.length()) * fontSize * 0.62;
    }

    static boolean fitsInside(double width, String... lines) {
        double widest = 0;
        for (String line : lines) {
            widest = Math.max(widest, textWidth(line, FONT));
        }
        return widest + 8 <= width;
    }

    /** A callout before it is given a row. */
    private record Pending(double fromX, double toX, String text, boolean bold) {
    }

    /** Plans the labels of a pattern drawn at {@code scale} units per millimetre from x = {@code left}. */
    static SawLabels of(SawLayout layout, CutPattern pattern, double scale, double left, double width) {
        List<Inside> inside = new ArrayList<>();
        List<Pending> pending = new ArrayList<>();
        List<Segment> segments = layout.segments();
        int i = 0;
        while (i < segments.size()) {
            Segment s = segments.get(i);
            double x = left + s.startMm() * scale;
            double w = s.lengthMm() * scale;
            int next = i + 1;
            if (s.kind() == Kind.TRIM && s.lengthMm() > 0) {
                double at = s.startMm() == 0 ? x : x + w;
                pending.add(new Pending(at, at, "trim " + ShopFormat.sawMm(s.lengthMm()), false));
            } else if (s.kind() == Kind.OFFCUT && textWidth(offcutText(pattern), FONT) + 10 > w) {
                pending.add(new Pending(x + w / 2, x + w / 2, offcutText(pattern), false));
            } else if (s.kind() == Kind.PIECE) {
                String length = ShopFormat.sawMm(s.lengthMm());
                String text = s.mark() + " \u00B7 " + length;
                List<Segment> run = run(segments, i);
                if (fitsInside(w, s.mark(), length)) {
                    inside.add(new Inside(x + w / 2, s.mark(), length));
                } else if (run.size() == 1) {
                    pending.add(new Pending(x + w / 2, x + w / 2, text, true));
                } else {
                    Segment last = run.get(run.size() - 1);
                    double runEnd = left + last.endMm() * scale;
                    String runText = run.size() + " \u00D7 " + text;
                    if (textWidth(runText, FONT) + 8 <= runEnd - x) {
                        inside.add(new Inside((x + runEnd) / 2, runText, null));
                    } else {
                        pending.add(new Pending(x, runEnd, runText, true));
                    }
                    next = segments.indexOf(last) + 1;
                }
            }
            i = next;
        }
        List<Callout> callouts = new ArrayList<>();
        List<Double> rowEnds = new ArrayList<>();
        for (Pending p : pending) {
            double half = textWidth(p.text(), CALLOUT_FONT) / 2 + 4;
            double centre = Math.max(half + 2, Math.min(width - half, (p.fromX() + p.toX()) / 2));
            int row = 0;
            while (row < rowEnds.size() && rowEnds.get(row) > centre - half) {
                row++;
            }
            if (row == rowEnds.size()) {
                rowEnds.add(0.0);
            }
            rowEnds.set(row, centre + half);
            callouts.add(new Callout(p.fromX(), p.toX(), p.text(), p.bold(), row, centre));
        }
        return new SawLabels(inside, callouts, rowEnds.size());
    }

    /** "remnant 534 mm, to rack" or "scrap 36 mm": what the offcut is and where it goes, in words. */
    static String offcutText(CutPattern pattern) {
        return pattern.offcutKind() + " " + ShopFormat.sawMmUnit(pattern.offcutMm())
                + ("remnant".equals(pattern.offcutKind()) ? ", to rack" : "");
    }

    /** The piece at {@code from} and the equal pieces (same mark and length) right after it, kerfs between. */
    private static List<Segment> run(List<Segment> segments, int from) {
        Segment first = segments.get(from);
        List<Segment> run = new ArrayList<>(List.of(first));
        for (int j = from + 1; j < segments.size(); j++) {
            Segment s = segments.get(j);
            if (s.kind() == Kind.KERF) {
                continue;
            }
            if (s.kind() != Kind.PIECE || !s.mark().equals(first.mark()) || s.lengthMm() != first.lengthMm()) {
                break;
            }
            run.add(s);
        }
        return run;
    }
}
