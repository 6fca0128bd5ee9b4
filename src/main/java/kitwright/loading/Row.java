package kitwright.loading;

import java.util.ArrayList;
import java.util.List;

/**
 * One floor row across the deck: as deep as its first stack; stacks side by side in strips across the deck,
 * shorter stacks behind each other in a strip. Built greedily from the pending stacks in their order.
 *
 * @param depth  extent along the deck
 * @param area   floor area of the stacks placed
 * @param placed stacks placed, with their offset in the row and orientation
 */
record Row(double depth, double area, double mass, List<Placed> placed, boolean rotatedFirst) {
    private static final double EPS = 1e-6;

    /** A stack in the row: the stack as placed (maybe cut to the payload) and the pending stack it came from. */
    record Placed(Stack stack, Stack source, double x, double y, boolean rotated) {
    }

    /** The row started by {@code first} in the given orientation, or null when the payload takes nothing. */
    static Row build(Stack first, boolean rotated, List<Stack> pending, double deckWidth, double payloadRoom) {
        double depth = first.base().alongDeck(rotated);
        List<double[]> strips = new ArrayList<>(); // {y, width, used length}
        List<Placed> placed = new ArrayList<>();
        double room = payloadRoom;
        Stack head = first.within(room);
        if (head == null) {
            return null;
        }
        strips.add(new double[] {0, first.base().acrossDeck(rotated), first.base().alongDeck(rotated)});
        placed.add(new Placed(head, first, 0, 0, rotated));
        room -= head.mass();
        double area = head.base().footprint();
        double yUsed = first.base().acrossDeck(rotated);
        for (Stack s : pending) {
            if (s == first) {
                continue;
            }
            Stack cut = s.within(room);
            if (cut == null) {
                continue;
            }
            int strip = -1;
            boolean stripRotation = false;
            boolean newRotation = false;
            double newAcross = Double.MAX_VALUE;
            for (boolean r : new boolean[] {false, true}) {
                double along = s.base().alongDeck(r);
                double across = s.base().acrossDeck(r);
                if (along > depth + EPS) {
                    continue;
                }
                for (int k = 0; k < strips.size(); k++) {
                    double[] st = strips.get(k);
                    if (across <= st[1] + EPS && st[2] + along <= depth + EPS
                            && (strip < 0 || st[1] < strips.get(strip)[1])) {
                        strip = k;
                        stripRotation = r;
                    }
                }
                if (yUsed + across <= deckWidth + EPS && across < newAcross) {
                    newAcross = across;
                    newRotation = r;
                }
            }
            double x;
            double y;
            boolean r;
            if (strip >= 0) {
                double[] st = strips.get(strip);
                r = stripRotation;
                x = st[2];
                y = st[0];
                st[2] += s.base().alongDeck(r);
            } else if (newAcross < Double.MAX_VALUE) {
                r = newRotation;
                x = 0;
                y = yUsed;
                strips.add(new double[] {yUsed, newAcross, s.base().alongDeck(r)});
                yUsed += newAcross;
            } else {
                continue;
            }
            placed.add(new Placed(cut, s, x, y, r));
            room -= cut.mass();
            area += cut.base().footprint();
        }
        return new Row(depth, area, payloadRoom - room, placed, rotated);
    }

    /**
     * Whether this row beats another started by the same stack: more floor covered if rows like it were repeated
     * over the deck length left (never more than the pending stacks' footprints), then more of its own depth
     * covered, then more mass, then the unrotated first stack.
     */
    boolean betterThan(Row other, double lengthLeft, double pendingArea) {
        double mine = Math.min(pendingArea, area * Math.floor(lengthLeft / depth + 1e-9));
        double theirs = Math.min(pendingArea, other.area * Math.floor(lengthLeft / other.depth + 1e-9));
        if (Math.abs(mine - theirs) > EPS * Math.max(1, theirs)) {
            return mine > theirs;
        }
        double myDensity = area / depth;
        double theirDensity = other.area / other.depth;
        if (Math.abs(myDensity - theirDensity) > EPS * Math.max(1, theirDensity)) {
            return myDensity > theirDensity;
        }
        if (Math.abs(mass - other.mass) > EPS) {
            return mass > other.mass;
        }
        return !rotatedFirst && other.rotatedFirst;
    }
}
