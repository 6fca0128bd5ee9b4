package kitwright.packing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.TreeSet;
import kitwright.model.CrateType;

/**
 * Fills one crate of a given type from the items on offer, building its layout from the floor up.
 *
 * <ol>
 *   <li>Bundles are offered largest diameter first, then longest first, up to what the crate could hold by cells,
 *   length and mass.</li>
 *   <li>{@link LaneBuilder} puts them into lanes along the crate length by best-fit decreasing; a lane's cell is
 *   its first (largest) bundle's diameter, thinner bundles fill its far end.</li>
 *   <li>Lanes go into the cross-section in row groups of one cell diameter, square or staggered, widest first
 *   ({@link RowGroupLanes}), or square on the skyline of what is already placed, those that bear longest first
 *   ({@link SkylineLanes}). Either way a lane above the floor goes only as far along as what is under it bears
 *   it, the rest becoming a lane of its own, and a lane that would pass the crate's net capacity (max gross -
 *   tare) is cut short.</li>
 *   <li>Joint boxes fill the end of the crate behind the longest lane, then the space above the top row, by
 *   guillotine blocks ({@link BoxGrid}; on the skyline they first go on top of the lanes in rows,
 *   {@link SkylineBoxes}). When both bundles and boxes are on offer, three more layouts put the boxes first: in
 *   as few full tiers on the floor as hold them, or one tier fewer (the rest go behind and above the lanes), with
 *   the lanes above; or in stacks in the narrowest strip along the left wall that holds them, with the lanes
 *   from the floor beside it. The caller chooses.</li>
 *   <li>{@link Support#settle} keeps, from the floor up, only the items that rest on items below.</li>
 * </ol>
 * Guarantee: every item lies inside the inner walls, circles of bundles that share a stretch of length do not
 * overlap (each lane keeps to its own cell or skyline strip, and a bundle let down through a hole takes the free
 * cells it fills), boxes and lanes occupy disjoint regions, every item above the floor is supported
 * ({@link Support}), and the contents' mass is within the net capacity. Not a proof of the best filling: a
 * constructive heuristic, fast enough to be called for every crate type at every step of the crate choice.
 */
final class CrateFiller {
    /** Lanes at least this fraction of a group's cell diameter join the group rather than start a new one. */
    static final double MERGE = 0.9;
    private static final double EPS = 1e-6;

    /**
     * The layouts of one crate of {@code crate} (catalog index {@code crateIndex}) from {@code available}: lanes
     * first in row groups, and on the skyline when that holds other counts, with boxes in the space left; and,
     * when both bundles and boxes are on offer, the boxes first (floor tiers, or a column along one wall) with the
     * lanes beside or above. The caller keeps the one that suits it.
     */
    List<CrateLayout> fills(int crateIndex, CrateType crate, List<ItemType> types, int[] available) {
        CrateLayout[] lanesFirst = lanesFirst(crateIndex, crate, types, available);
        boolean boxes = types.stream().anyMatch(t -> t.kind() == ItemKind.BOX && available[t.index()] > 0);
        boolean bundles = types.stream().anyMatch(t -> t.kind() == ItemKind.BUNDLE && available[t.index()] > 0);
        List<CrateLayout> result = new ArrayList<>(List.of(lanesFirst[0]));
        if (!Arrays.equals(lanesFirst[1].counts(), lanesFirst[0].counts())) {
            result.add(lanesFirst[1]);
        }
        if (boxes && bundles) {
            result.add(build(crateIndex, crate, types, available, Start.BOX_TIERS, Placing.ROW_GROUPS));
            if (tiers(crate, types, available) > 1) {
                result.add(build(crateIndex, crate, types, available, Start.BOX_TIERS_ONE_FEWER,
                        Placing.ROW_GROUPS));
            }
            result.add(build(crateIndex, crate, types, available, Start.BOX_COLUMN, Placing.ROW_GROUPS));
        }
        return List.copyOf(result);
    }

    /**
     * The lanes-first layout (see {@link #fills}), lanes in row groups or on the skyline, whichever holds more
     * bounding-box volume (then more mass).
     */
    CrateLayout fill(int crateIndex, CrateType crate, List<ItemType> types, int[] available) {
        CrateLayout[] lanesFirst = lanesFirst(crateIndex, crate, types, available);
        CrateLayout rows = lanesFirst[0];
        CrateLayout skyline = lanesFirst[1];
        double gain = skyline.volume(types) - rows.volume(types);
        return gain > EPS || (Math.abs(gain) <= EPS && skyline.massKg() > rows.massKg() + EPS) ? skyline : rows;
    }

    /** The lanes-first layouts: {in row groups, on the skyline}. */
    private CrateLayout[] lanesFirst(int crateIndex, CrateType crate, List<ItemType> types, int[] available) {
        return new CrateLayout[] {build(crateIndex, crate, types, available, Start.LANES, Placing.ROW_GROUPS),
            build(crateIndex, crate, types, available, Start.LANES, Placing.SKYLINE)};
    }

    /**
     * What goes in first: lanes from the floor; boxes in as few floor tiers as hold them all, or in one tier fewer
     * (the rest behind and above the lanes); boxes in a column along one side wall.
     */
    private enum Start { LANES, BOX_TIERS, BOX_TIERS_ONE_FEWER, BOX_COLUMN }

    /**
     * How lanes go into the cross-section: in row groups of one diameter, square or staggered, thinner lanes taking
     * cells left free; or square on the skyline of what is already placed ({@link SkylineLanes}), which holds
     * mixed diameters and lengths better where the row groups leave holes.
     */
    private enum Placing { ROW_GROUPS, SKYLINE }

    private CrateLayout build(int crateIndex, CrateType crate, List<ItemType> types, int[] available, Start start,
                              Placing placing) {
        double length = crate.innerLengthMm();
        double width = crate.innerWidthMm();
        double height = crate.innerHeightMm();
        double net = crate.maxGrossKg() - crate.tareKg();
        int[] counts = new int[types.size()];
        List<CrateLayout.Slot> slots = new ArrayList<>();
        double[] mass = {0};
        int[] left = available.clone();
        double floor = start == Start.BOX_TIERS || start == Start.BOX_TIERS_ONE_FEWER
                ? floorTiers(crate, types, left, net, mass, counts, slots, start == Start.BOX_TIERS_ONE_FEWER) : 0;
        // how far along the floor tiers reach (the only slots so far)
        double tierEnd = slots.stream().mapToDouble(s -> s.x() + s.length()).max().orElse(0);
        double side = start == Start.BOX_COLUMN ? boxColumn(crate, types, left, net, mass, counts, slots) : 0;
        List<LaneBuilder.Lane> lanes = new ArrayList<>(new LaneBuilder().build(
                offeredBundles(crate, types, left, net - mass[0]), length));
        // widest cells first, and of a cell the lanes that bear longest lowest, so that upper lanes lie on lower
        // ones; on the skyline the lanes that bear longest go first whatever their cell
        Comparator<LaneBuilder.Lane> widest = Comparator.comparingDouble(LaneBuilder.Lane::cellMm).reversed();
        Comparator<LaneBuilder.Lane> bearing = Comparator.comparingDouble(CrateFiller::bearingLength).reversed();
        lanes.sort((placing == Placing.SKYLINE ? bearing.thenComparing(widest) : widest.thenComparing(bearing))
                .thenComparing(Comparator.comparingDouble(LaneBuilder.Lane::lengthMm).reversed()));
        double[] used = placing == Placing.SKYLINE
                ? SkylineLanes.place(lanes, types, side, length, width, height, net, mass, counts, slots, left)
                : RowGroupLanes.place(lanes, types, side, length, width, floor, height, net, mass, counts, slots);
        placeBoxes(crate, types, left, net, floor, tierEnd, side, used[0], used[1], mass, counts, slots);
        List<CrateLayout.Slot> standing = Support.settle(slots, types, width);
        int[] kept = new int[types.size()];
        double keptMass = 0;
        for (CrateLayout.Slot s : standing) {
            kept[s.itemType()]++;
            keptMass += types.get(s.itemType()).massKg();
        }
        return new CrateLayout(crateIndex, kept, standing, keptMass);
    }

    /** Length from x = 0 over which a lane is as wide as its cell (thinner bundles at its far end bear less). */
    private static double bearingLength(LaneBuilder.Lane lane) {
        double length = 0;
        for (ItemType t : lane.items()) {
            if (t.diameterMm() < lane.cellMm() - Support.TOUCH / 2) {
                break;
            }
            length += t.lengthMm();
        }
        return length;
    }

    /**
     * Boxes in full-height stacks in the narrowest strip along the left wall (y from 0) that holds every box on
     * offer (or the whole width); returns the strip's width, where the lanes begin.
     */
    private static double boxColumn(CrateType crate, List<ItemType> types, int[] left, double net, double[] mass,
                                    int[] counts, List<CrateLayout.Slot> slots) {
        List<ItemType> boxes = types.stream().filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        int wanted = boxes.stream().mapToInt(t -> left[t.index()]).sum();
        ItemType box = boxes.get(0);
        double width = crate.innerWidthMm();
        TreeSet<Double> strips = new TreeSet<>();
        for (double dim : new double[] {box.lengthMm(), box.widthMm(), box.heightMm()}) {
            for (int k = 1; k * dim <= width + EPS; k++) {
                strips.add(k * dim);
            }
        }
        double strip = width;
        for (double w : strips) {
            if (BoxGrid.capacity(crate.innerLengthMm(), w, crate.innerHeightMm(), box) >= wanted) {
                strip = w;
                break;
            }
        }
        BoxGrid.fill(0, 0, 0, crate.innerLengthMm(), strip, crate.innerHeightMm(), boxes, left, net, mass, counts,
                slots);
        return strip;
    }

    /**
     * How many tiers of boxes, each as high as the box's smallest side, the crate floor needs for every box on
     * offer (as many as the crate's height allows); 0 when the box's smallest side is taller than the crate.
     */
    private static int tiers(CrateType crate, List<ItemType> types, int[] left) {
        List<ItemType> boxes = types.stream().filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        int wanted = boxes.stream().mapToInt(t -> left[t.index()]).sum();
        ItemType box = boxes.get(0);
        double tier = Math.min(box.lengthMm(), Math.min(box.widthMm(), box.heightMm()));
        if (tier > crate.innerHeightMm() + EPS) {
            return 0;
        }
        int tiers = 1;
        while ((tiers + 1) * tier <= crate.innerHeightMm() + EPS
                && BoxGrid.capacity(crate.innerLengthMm(), crate.innerWidthMm(), tiers * tier, box) < wanted) {
            tiers++;
        }
        return tiers;
    }

    /**
     * Tiers of boxes on the crate floor, as few as hold every box on offer ({@link #tiers}), or one fewer
     * ({@code oneFewer}); none when the box's smallest side is taller than the crate. Returns their height.
     */
    private static double floorTiers(CrateType crate, List<ItemType> types, int[] left, double net, double[] mass,
                                     int[] counts, List<CrateLayout.Slot> slots, boolean oneFewer) {
        List<ItemType> boxes = types.stream().filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        ItemType box = boxes.get(0);
        double tier = Math.min(box.lengthMm(), Math.min(box.widthMm(), box.heightMm()));
        int tiers = tiers(crate, types, left);
        if (tiers == 0) {
            return 0;
        }
        if (oneFewer) {
            tiers = Math.max(1, tiers - 1);
        }
        int before = slots.size();
        BoxGrid.fill(0, 0, 0, crate.innerLengthMm(), crate.innerWidthMm(), tiers * tier, boxes, left, net, mass,
                counts, slots);
        double top = 0;
        for (int k = before; k < slots.size(); k++) {
            top = Math.max(top, slots.get(k).z() + slots.get(k).height());
        }
        return top;
    }

    /** Bundles offered to this crate, largest diameter and longest first, bounded by cells, length and mass. */
    private static List<ItemType> offeredBundles(CrateType crate, List<ItemType> types, int[] available, double net) {
        double length = crate.innerLengthMm();
        double width = crate.innerWidthMm();
        double height = crate.innerHeightMm();
        List<ItemType> bundles = types.stream()
                .filter(t -> t.kind() == ItemKind.BUNDLE && available[t.index()] > 0)
                .filter(t -> t.lengthMm() <= length + EPS && t.diameterMm() <= Math.min(width, height) + EPS)
                .sorted(Comparator.comparingDouble(ItemType::diameterMm).reversed()
                        .thenComparing(Comparator.comparingDouble(ItemType::lengthMm).reversed())
                        .thenComparingInt(ItemType::index))
                .toList();
        double volumeCap = length * width * height;
        double volume = 0;
        double mass = 0;
        List<ItemType> offered = new ArrayList<>();
        for (ItemType t : bundles) {
            double d = t.diameterMm();
            long cells = Math.max(RowPattern.SQUARE.capacity(width, height, d),
                    RowPattern.STAGGERED.capacity(width, height, d));
            long cap = Math.min(available[t.index()], cells * RowPattern.floor(length / t.lengthMm()));
            for (long k = 0; k < cap && volume <= volumeCap; k++) {
                if (mass + t.massKg() > net + EPS) {
                    break;
                }
                offered.add(t);
                mass += t.massKg();
                volume += t.lengthMm() * d * d * RowPattern.ROW_PITCH;
            }
        }
        return offered;
    }

    /**
     * Boxes in the regions the lanes leave whole: behind the longest lane (on the floor tiers as far as they
     * reach, from the crate floor beyond them), then above the top row of lanes.
     *
     * @param floor   top of the floor tiers of boxes (0 without)
     * @param tierEnd how far along the floor tiers reach (0 without)
     * @param side    width of the column of boxes along the left wall (0 without)
     * @param endX    end of the longest lane
     * @param top     top of the highest lane
     */
    private static void placeBoxes(CrateType crate, List<ItemType> types, int[] left, double net, double floor,
                                   double tierEnd, double side, double endX, double top, double[] mass,
                                   int[] counts, List<CrateLayout.Slot> slots) {
        List<ItemType> boxes = types.stream()
                .filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        if (boxes.isEmpty()) {
            return;
        }
        double length = crate.innerLengthMm();
        double width = crate.innerWidthMm();
        double height = crate.innerHeightMm();
        // the end of the crate behind the longest lane, full width: on the floor tiers as far as they reach, then
        // from the crate floor
        double beyond = Math.max(endX, tierEnd);
        if (floor > 0 && beyond > endX) {
            BoxGrid.fill(endX, side, floor, beyond - endX, width - side, height - floor, boxes, left, net, mass,
                    counts, slots);
        }
        BoxGrid.fill(beyond, side, 0, length - beyond, width - side, height, boxes, left, net, mass, counts, slots);
        // above the top row of lanes, as long as the longest lane
        if (endX > 0) {
            BoxGrid.fill(0, side, top, endX, width - side, height - top, boxes, left, net, mass, counts, slots);
        }
    }
}
