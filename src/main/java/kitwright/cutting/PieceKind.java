package kitwright.cutting;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import kitwright.model.Bar;
import kitwright.model.Kit;

/**
 * What a cut piece is for, as cut-list.csv's {@code kind} column and the labels name it. The pieces of a mark are
 * alike, so they are told apart by their number in saw order: the first {@code quantity} are the kit's own bars,
 * the next {@link Kit#allowance} are the miscut allowance, and any beyond are spares (service-life spares, or bars
 * cut from offcuts). The one rule every writer uses, so that the saw sheet and the labels agree.
 */
public enum PieceKind {
    /** One of the kit's own bars. */
    CUT("cut"),
    /** An extra piece for saw errors (kit.json {@code miscutAllowance}). */
    ALLOWANCE("allowance"),
    /** A bar beyond the kit's quantity and its allowance. */
    SPARE("spare");

    private final String code;

    PieceKind(String code) {
        this.code = code;
    }

    /** The kind as the files write it: {@code cut}, {@code allowance} or {@code spare}. */
    public String code() {
        return code;
    }

    /**
     * The kind of the {@code n}-th piece (from 1, in saw order) cut of a mark of the kit; a piece of a mark the kit
     * does not know ({@code bar} null) is a plain cut.
     */
    public static PieceKind of(Kit kit, Bar bar, int n) {
        if (bar == null || n <= bar.quantity()) {
            return CUT;
        }
        return n <= bar.quantity() + kit.allowance(bar) ? ALLOWANCE : SPARE;
    }

    /**
     * Pieces of each kind a section's plan cuts, per mark of the section in the kit's order (marks that cut none
     * of that kind left out): the count the saw sheet's rows of that kind add up to.
     */
    public static Map<String, Integer> counts(Kit kit, SectionCutPlan section, PieceKind kind) {
        Map<String, Integer> cut = new HashMap<>();
        section.patterns().forEach(p -> p.cuts().forEach(c -> cut.merge(c.mark(), p.count(), Integer::sum)));
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (Bar bar : kit.bars()) {
            int n = cut.getOrDefault(bar.mark(), 0);
            int allowance = kit.allowance(bar);
            int ofKind = switch (kind) {
                case CUT -> Math.min(n, bar.quantity());
                case ALLOWANCE -> Math.max(0, Math.min(n - bar.quantity(), allowance));
                case SPARE -> Math.max(0, n - bar.quantity() - allowance);
            };
            if (ofKind > 0) {
                counts.put(bar.mark(), ofKind);
            }
        }
        return counts;
    }
}
