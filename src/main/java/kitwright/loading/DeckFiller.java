package kitwright.loading;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import kitwright.model.VehicleType;

/**
 * Loads one vehicle of a given type from the crates on offer.
 *
 * <ol>
 *   <li>Crates are offered largest footprint first, heaviest first, up to the payload and the deck volume.</li>
 *   <li>Stacks: each crate goes on the first stack whose top crate is stackable and at least as long and as wide
 *   (so every crate stands fully on the one below), where every crate below keeps its top load and the stack its
 *   deck height; else it starts a stack. Heavy crates thus end at the bottom.</li>
 *   <li>Floor rows: from the front, a row is as deep as its first stack; stacks stand side by side across the
 *   deck in strips, shorter ones behind each other in a strip. The first stack's orientation is the one whose
 *   row, repeated over the deck length left, would cover more floor (so 1200 x 800 footprints go 2 x 17 rather
 *   than 3 x 11 on 13.6 m).
 *   A stack that would pass the payload loses crates from its top.</li>
 * </ol>
 * Guarantee: every crate inside the deck (length, width, height), no two crates overlapping, every upper crate
 * standing fully on a stackable crate, top loads and payload kept. A constructive heuristic (shelf packing of
 * the floor, first-fit stacking), fast enough to be called for every vehicle type at every step.
 */
final class DeckFiller {
    private static final double EPS = 1e-6;
    /** How far above its payload a vehicle's load may go (rounding), kg; the bounds take the same. */
    static final double PAYLOAD_TOLERANCE_KG = EPS;

    DeckLayout fill(int vehicleIndex, VehicleType vehicle, List<CrateClass> classes, int[] available) {
        List<CrateClass> offered = offer(vehicle, classes, available);
        List<Stack> pending = stack(offered, vehicle.loadHeightMm());
        pending.sort(Comparator.<Stack>comparingDouble(s -> -Math.max(s.base().lengthMm(), s.base().widthMm()))
                .thenComparingDouble(s -> -s.base().footprint()).thenComparingDouble(s -> -s.mass()));
        int[] counts = new int[classes.size()];
        List<DeckLayout.Slot> slots = new ArrayList<>();
        double x = 0;
        double mass = 0;
        double floor = 0;
        int stackId = 0;
        int rowId = 0;
        while (!pending.isEmpty()) {
            Stack first = null;
            for (Stack s : pending) {
                if (fits(s.base(), false, vehicle.deckLengthMm() - x, vehicle.deckWidthMm())
                        || fits(s.base(), true, vehicle.deckLengthMm() - x, vehicle.deckWidthMm())) {
                    first = s;
                    break;
                }
            }
            if (first == null) {
                break;
            }
            Row best = null;
            for (boolean rotated : new boolean[] {false, true}) {
                if (fits(first.base(), rotated, vehicle.deckLengthMm() - x, vehicle.deckWidthMm())) {
                    Row row = Row.build(first, rotated, pending, vehicle.deckWidthMm(),
                            vehicle.payloadKg() - mass);
                    if (row != null && (best == null
                            || row.betterThan(best, vehicle.deckLengthMm() - x, pendingArea(pending)))) {
                        best = row;
                    }
                }
            }
            if (best == null) {
                pending.remove(first);
                continue;
            }
            for (Row.Placed p : best.placed()) {
                pending.remove(p.source());
                double z = 0;
                for (int level = 0; level < p.stack().crates().size(); level++) {
                    CrateClass c = p.stack().crates().get(level);
                    slots.add(new DeckLayout.Slot(c.index(), x + p.x(), p.y(), z, p.rotated(), stackId, level,
                            rowId));
                    counts[c.index()]++;
                    z += c.heightMm();
                }
                mass += p.stack().mass();
                floor = Math.max(floor, x + p.x() + p.stack().base().alongDeck(p.rotated()));
                stackId++;
            }
            x += best.depth();
            rowId++;
        }
        return new DeckLayout(vehicleIndex, counts, slots, mass, floor);
    }

    private static double pendingArea(List<Stack> pending) {
        return pending.stream().mapToDouble(s -> s.base().footprint()).sum();
    }

    static boolean fits(CrateClass c, boolean rotated, double length, double width) {
        return c.alongDeck(rotated) <= length + EPS && c.acrossDeck(rotated) <= width + EPS;
    }

    /** Whether a crate of this class can ride on the vehicle at all. */
    static boolean fitsVehicle(CrateClass c, VehicleType v) {
        return (fits(c, false, v.deckLengthMm(), v.deckWidthMm()) || fits(c, true, v.deckLengthMm(), v.deckWidthMm()))
                && c.heightMm() <= v.loadHeightMm() + EPS && c.massKg() <= v.payloadKg() + PAYLOAD_TOLERANCE_KG;
    }

    private static List<CrateClass> offer(VehicleType v, List<CrateClass> classes, int[] available) {
        List<CrateClass> fitting = classes.stream()
                .filter(c -> available[c.index()] > 0 && fitsVehicle(c, v))
                .sorted(Comparator.<CrateClass>comparingDouble(c -> -c.footprint())
                        .thenComparingDouble(c -> -c.massKg()).thenComparingInt(CrateClass::index))
                .toList();
        double deckVolume = v.deckLengthMm() * v.deckWidthMm() * v.loadHeightMm();
        double volume = 0;
        double mass = 0;
        List<CrateClass> offered = new ArrayList<>();
        for (CrateClass c : fitting) {
            for (int k = 0; k < available[c.index()] && volume <= deckVolume; k++) {
                if (mass + c.massKg() > v.payloadKg() + PAYLOAD_TOLERANCE_KG) {
                    break;
                }
                offered.add(c);
                mass += c.massKg();
                volume += c.volume();
            }
        }
        return offered;
    }

    /** First-fit stacking in the order offered. */
    private static List<Stack> stack(List<CrateClass> crates, double deckHeight) {
        List<Stack> stacks = new ArrayList<>();
        for (CrateClass c : crates) {
            int home = -1;
            for (int k = 0; k < stacks.size() && home < 0; k++) {
                if (stacks.get(k).takes(c, deckHeight)) {
                    home = k;
                }
            }
            if (home < 0) {
                stacks.add(Stack.of(c));
            } else {
                stacks.set(home, stacks.get(home).with(c));
            }
        }
        return stacks;
    }
}
