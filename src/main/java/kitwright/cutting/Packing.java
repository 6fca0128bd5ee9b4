package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;

/** A solver-side plan: one pattern per stock piece used. */
record Packing(List<Pattern> pieces) {
    Packing {
        pieces = List.copyOf(pieces);
    }

    static final Packing EMPTY = new Packing(List.of());

    long cost(IntegerInstance instance) {
        long c = 0;
        for (Pattern p : pieces) {
            c += instance.cost[p.stock()];
        }
        return c;
    }

    /** Pieces yielded per item type. */
    int[] produced(int types) {
        int[] made = new int[types];
        for (Pattern p : pieces) {
            for (int i = 0; i < types; i++) {
                made[i] += p.count(i);
            }
        }
        return made;
    }

    /** Stock pieces used per stock type. */
    int[] used(int stocks) {
        int[] n = new int[stocks];
        for (Pattern p : pieces) {
            n[p.stock()]++;
        }
        return n;
    }

    Packing plus(Packing other) {
        List<Pattern> all = new ArrayList<>(pieces);
        all.addAll(other.pieces);
        return new Packing(all);
    }

    /** Whether the packing yields every demanded piece and keeps within the stock limits. */
    boolean covers(IntegerInstance instance, int[] demand, int[] available) {
        int[] made = produced(instance.types());
        for (int i = 0; i < made.length; i++) {
            if (made[i] < demand[i]) {
                return false;
            }
        }
        int[] used = used(instance.stocks());
        for (int k = 0; k < used.length; k++) {
            if (available[k] >= 0 && used[k] > available[k]) {
                return false;
            }
        }
        for (Pattern p : pieces) {
            if (!instance.fits(p)) {
                return false;
            }
        }
        return true;
    }

    /**
     * The same stock pieces cutting exactly the demand: surplus pieces stay in the offcut (taken from the last
     * stock pieces first, a stable rule), and stock pieces left empty are not used.
     */
    Packing withoutSurplus(IntegerInstance instance, int[] demand) {
        int types = instance.types();
        int[] surplus = produced(types);
        for (int i = 0; i < types; i++) {
            surplus[i] -= demand[i];
        }
        List<int[]> counts = new ArrayList<>();
        for (Pattern p : pieces) {
            counts.add(p.counts());
        }
        for (int i = 0; i < types; i++) {
            for (int b = counts.size() - 1; b >= 0 && surplus[i] > 0; b--) {
                int take = Math.min(surplus[i], counts.get(b)[i]);
                counts.get(b)[i] -= take;
                surplus[i] -= take;
            }
        }
        List<Pattern> kept = new ArrayList<>();
        for (int b = 0; b < pieces.size(); b++) {
            Pattern p = new Pattern(pieces.get(b).stock(), counts.get(b));
            if (!p.isEmpty()) {
                kept.add(p);
            }
        }
        return new Packing(kept);
    }
}
