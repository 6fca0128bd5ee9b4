package kitwright.loading;

import java.util.ArrayList;
import java.util.List;

/**
 * Crates standing on one another, bottom first.
 *
 * @param slackKg mass that may still go on top: the least top load left over the crates (0 when the top crate is
 *                not stackable)
 */
record Stack(List<CrateClass> crates, double heightMm, double mass, double slackKg) {
    private static final double EPS = 1e-6;

    Stack {
        crates = List.copyOf(crates);
    }

    static Stack of(CrateClass c) {
        return new Stack(List.of(c), c.heightMm(), c.massKg(), c.stackable() ? c.maxTopLoadKg() : 0);
    }

    CrateClass base() {
        return crates.get(0);
    }

    CrateClass top() {
        return crates.get(crates.size() - 1);
    }

    /** Whether c may go on top: stackable top no smaller than c, top loads and height kept. */
    boolean takes(CrateClass c, double deckHeight) {
        CrateClass top = top();
        return top.stackable() && c.lengthMm() <= top.lengthMm() + EPS && c.widthMm() <= top.widthMm() + EPS
                && heightMm + c.heightMm() <= deckHeight + EPS && c.massKg() <= slackKg + EPS;
    }

    Stack with(CrateClass c) {
        List<CrateClass> list = new ArrayList<>(crates);
        list.add(c);
        return new Stack(list, heightMm + c.heightMm(), mass + c.massKg(),
                Math.min(slackKg - c.massKg(), c.stackable() ? c.maxTopLoadKg() : 0));
    }

    /** The lowest crates of this stack whose mass stays within {@code room}, or null when even the base does not. */
    Stack within(double room) {
        if (mass <= room + EPS) {
            return this;
        }
        Stack s = null;
        for (CrateClass c : crates) {
            if ((s == null ? 0 : s.mass()) + c.massKg() > room + EPS) {
                break;
            }
            s = s == null ? of(c) : s.with(c);
        }
        return s;
    }
}
