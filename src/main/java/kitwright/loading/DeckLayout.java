package kitwright.loading;

import java.util.List;
import kitwright.packing.CoverPattern;

/**
 * A loaded deck of one vehicle type as a reusable pattern.
 *
 * @param vehicleType   index into the vehicle catalog
 * @param counts        crates per crate class
 * @param slots         crate positions, stack by stack from the bottom up
 * @param massKg        gross mass of the crates
 * @param floorLengthMm from the front of the deck to the rear face of the last crate
 */
record DeckLayout(int vehicleType, int[] counts, List<Slot> slots, double massKg, double floorLengthMm)
        implements CoverPattern {

    /**
     * One crate's place: its class, its outer box corner, orientation, its stack and level (0 = floor), and its
     * floor row (rows lie one behind the other from the front; each holds whole stacks).
     */
    record Slot(int crateClass, double x, double y, double z, boolean rotated, int stack, int level, int row) {
    }

    DeckLayout {
        slots = List.copyOf(slots);
    }

    @Override
    public int containerType() {
        return vehicleType;
    }

    @Override
    public boolean isEmpty() {
        return slots.isEmpty();
    }
}
