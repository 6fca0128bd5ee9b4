package kitwright.cutting;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Cuts spare bars from the offcuts of a plan, without buying more stock: an offcut long enough for a bar of the
 * kit is a free spare.
 *
 * <p>Method: the candidate marks take turns in the order given (most-used first is the caller's usual order), one
 * bar per turn, until no offcut holds a bar of any mark with turns left; each bar goes into the stock piece with
 * the shortest offcut that still holds it (best fit), so long remnants are cut into last. A bar fits when the
 * stock piece's pieces still satisfy sum(length + kerf) &lt;= L - 2*trim + kerf, in exact decimals
 * ({@link SawArithmetic}). The spare bars are cut after the planned ones. Status, value and bound of
 * the plan do not change, since no stock is added. O(S log P) for S spares and P stock pieces.
 */
public final class OffcutFiller {
    private OffcutFiller() {
    }

    /**
     * A mark that may be cut as spares.
     *
     * @param maxCount most spare bars of this mark (Integer.MAX_VALUE for no limit)
     */
    public record Candidate(String mark, double lengthMm, int maxCount) {
        public Candidate {
            if (!(lengthMm > 0) || maxCount < 0) {
                throw new IllegalArgumentException("bad spare candidate " + mark + ": " + lengthMm + " x " + maxCount);
            }
        }
    }

    /** The plan with spare bars cut from its offcuts; an INFEASIBLE plan is returned as it is. */
    public static SectionCutPlan fill(SectionCutPlan plan, List<Candidate> candidates) {
        if (plan.patterns().isEmpty() || candidates.isEmpty()) {
            return plan;
        }
        List<Piece> pieces = new ArrayList<>();
        for (CutPattern p : plan.patterns()) {
            BigDecimal free = SawArithmetic.capacity(plan.kerfMm(), plan.trimMm(), p.stockLengthMm())
                    .subtract(SawArithmetic.consumed(plan.kerfMm(), p.cuts()));
            for (int n = 0; n < p.count(); n++) {
                Piece piece = new Piece(pieces.size(), p, new ArrayList<>(p.cuts()), free);
                pieces.add(piece);
            }
        }
        TreeSet<Piece> byFree = new TreeSet<>(Comparator.<Piece, BigDecimal>comparing(q -> q.free)
                .thenComparingInt(q -> q.index));
        byFree.addAll(pieces);
        int[] left = candidates.stream().mapToInt(Candidate::maxCount).toArray();
        Map<String, Integer> added = new LinkedHashMap<>();
        boolean placed = true;
        while (placed) {
            placed = false;
            for (int c = 0; c < candidates.size(); c++) {
                Candidate candidate = candidates.get(c);
                if (left[c] == 0) {
                    continue;
                }
                BigDecimal size = SawArithmetic.exact(candidate.lengthMm()).add(SawArithmetic.exact(plan.kerfMm()));
                Piece probe = new Piece(-1, null, null, size);
                Piece target = byFree.ceiling(probe);
                if (target == null) {
                    left[c] = 0; // no offcut holds this mark any more
                    continue;
                }
                byFree.remove(target);
                target.cuts.add(new Cut(candidate.mark(), candidate.lengthMm()));
                target.free = target.free.subtract(size);
                byFree.add(target);
                left[c]--;
                added.merge(candidate.mark(), 1, Integer::sum);
                placed = true;
            }
        }
        if (added.isEmpty()) {
            return plan;
        }
        return new SectionCutPlan(plan.section(), plan.kerfMm(), plan.trimMm(), plan.minRemnantMm(),
                plan.objective(), plan.status(), plan.reason(), plan.value(), plan.lowerBound(), plan.gap(),
                plan.stockPieces(), regroup(plan, pieces), spares(plan.spares(), added));
    }

    /** Consecutive stock pieces cut alike become one pattern again. */
    private static List<CutPattern> regroup(SectionCutPlan plan, List<Piece> pieces) {
        List<CutPattern> out = new ArrayList<>();
        Piece run = null;
        int count = 0;
        for (Piece piece : pieces) {
            if (run != null && run.source.stockLengthMm() == piece.source.stockLengthMm()
                    && run.source.origin() == piece.source.origin() && run.cuts.equals(piece.cuts)) {
                count++;
                continue;
            }
            if (run != null) {
                out.add(pattern(plan, run, count));
            }
            run = piece;
            count = 1;
        }
        out.add(pattern(plan, run, count));
        return out;
    }

    private static CutPattern pattern(SectionCutPlan plan, Piece piece, int count) {
        double offcut = PlanAssembler.offcut(plan.kerfMm(), plan.trimMm(), piece.source.stockLengthMm(), piece.cuts);
        return new CutPattern(piece.source.stockLengthMm(), piece.source.origin(), count, piece.cuts, offcut,
                PlanAssembler.offcutKind(offcut, plan.minRemnantMm()));
    }

    private static List<Spare> spares(List<Spare> before, Map<String, Integer> added) {
        Map<String, Integer> all = new LinkedHashMap<>();
        for (Spare s : before) {
            all.merge(s.mark(), s.count(), Integer::sum);
        }
        added.forEach((mark, count) -> all.merge(mark, count, Integer::sum));
        List<Spare> out = new ArrayList<>();
        all.forEach((mark, count) -> out.add(new Spare(mark, count)));
        return out;
    }

    /** One stock piece being filled. */
    private static final class Piece {
        final int index;
        final CutPattern source;
        final List<Cut> cuts;
        /** L - 2*trim + kerf - sum(length + kerf) of its pieces, exact. */
        BigDecimal free;

        Piece(int index, CutPattern source, List<Cut> cuts, BigDecimal free) {
            this.index = index;
            this.source = source;
            this.cuts = cuts;
            this.free = free;
        }
    }
}
