package kitwright.packing;

import java.util.List;

/**
 * A filled crate of one type as a reusable pattern: where each item type sits, and how many of each.
 *
 * @param crateType index into the crate catalog
 * @param counts    items per item type
 * @param slots     positions in build order (a bundle's lane from the floor up, then boxes)
 * @param massKg    contents' mass
 */
record CrateLayout(int crateType, int[] counts, List<Slot> slots, double massKg) implements CoverPattern {

    /** One item's place: its type and its bounding box from the crate's inside corner. */
    record Slot(int itemType, double x, double y, double z, double length, double width, double height) {
    }

    CrateLayout {
        slots = List.copyOf(slots);
    }

    @Override
    public int containerType() {
        return crateType;
    }

    @Override
    public boolean isEmpty() {
        return slots.isEmpty();
    }

    double volume(List<ItemType> types) {
        double v = 0;
        for (int i = 0; i < counts.length; i++) {
            v += counts[i] * types.get(i).boxVolume();
        }
        return v;
    }
}
