package kitwright.loading;

import java.util.List;
import kitwright.model.VehicleType;

/**
 * What the stacking rules of {@link DeckFiller} imply for any load, used by the bounds: a crate may stand only on
 * a stackable crate at least as long and as wide, within that crate's top load and the deck height.
 */
final class StackingRules {
    private static final double EPS = 1e-6;

    private StackingRules() {
    }

    /** Whether {@code upper} may stand directly on {@code lower} on a deck of the given height. */
    static boolean mayStandOn(CrateClass upper, CrateClass lower, double deckHeight) {
        return lower.stackable() && upper.lengthMm() <= lower.lengthMm() + EPS
                && upper.widthMm() <= lower.widthMm() + EPS && upper.massKg() <= lower.maxTopLoadKg() + EPS
                && upper.heightMm() + lower.heightMm() <= deckHeight + EPS;
    }

    /** No other crate of the load can stand on c: every crate of class c tops its own stack. */
    static boolean alwaysTop(CrateClass c, List<CrateClass> classes, double maxDeckHeight) {
        for (CrateClass o : classes) {
            boolean another = o.index() != c.index() || c.demand() > 1;
            if (another && mayStandOn(o, c, maxDeckHeight)) {
                return false;
            }
        }
        return true;
    }

    /** c can stand on no other crate of the load: every crate of class c stands on the floor. */
    static boolean alwaysFloor(CrateClass c, List<CrateClass> classes, double maxDeckHeight) {
        for (CrateClass o : classes) {
            boolean another = o.index() != c.index() || c.demand() > 1;
            if (another && mayStandOn(c, o, maxDeckHeight)) {
                return false;
            }
        }
        return true;
    }

    /**
     * How many crates of class c fit side by side on the deck (an upper bound): floor(L/l) * floor(W/w) when only
     * one orientation fits (for equal rectangles of fixed orientation each holds its own point of the grid
     * (i*l, j*w), so no packing beats the grid), else floor(L*W / (l*w)); 0 when c does not fit.
     */
    static long sideBySide(CrateClass c, VehicleType v) {
        if (!DeckFiller.fitsVehicle(c, v)) {
            return 0;
        }
        boolean along = DeckFiller.fits(c, false, v.deckLengthMm(), v.deckWidthMm());
        boolean across = DeckFiller.fits(c, true, v.deckLengthMm(), v.deckWidthMm());
        if (along && across) {
            return (long) Math.floor(v.deckLengthMm() * v.deckWidthMm() / c.footprint() + EPS);
        }
        boolean turned = !along;
        return (long) Math.floor(v.deckLengthMm() / c.alongDeck(turned) + EPS)
                * (long) Math.floor(v.deckWidthMm() / c.acrossDeck(turned) + EPS);
    }

    /** Whether c fits v in one orientation only (so it lies along a fixed direction). */
    static boolean fixedOrientation(CrateClass c, VehicleType v) {
        return DeckFiller.fits(c, false, v.deckLengthMm(), v.deckWidthMm())
                != DeckFiller.fits(c, true, v.deckLengthMm(), v.deckWidthMm());
    }

    /** The orientation of a fixed-orientation crate: true when it must be turned. */
    static boolean turned(CrateClass c, VehicleType v) {
        return !DeckFiller.fits(c, false, v.deckLengthMm(), v.deckWidthMm());
    }
}
