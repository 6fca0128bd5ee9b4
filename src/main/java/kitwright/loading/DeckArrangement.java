package kitwright.loading;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.model.AxleGeometry;
import kitwright.model.VehicleType;
import kitwright.packing.Crate;
import kitwright.packing.ItemKind;

/**
 * Arranges a filled deck for the road: the order of its floor rows, where each row stands across the deck, where
 * the whole load stands along it, and the order the crates go in.
 *
 * <ol>
 *   <li><b>Row order.</b> Rows holding joint boxes go to the rear, next to the doors, so the joints come off first;
 *   the other rows heaviest first from the front (heaviest forward; within a stack the heavier crates are already
 *   low, {@link DeckFiller}). Rows stay back to back, each whole, so nothing leaves its support.</li>
 *   <li><b>Lateral balance.</b> Each row moves across the deck, as a whole, within the free width: first each to
 *   put its own centre on the centreline, then, where a row cannot (a full-width row of unequal crates), the others
 *   make up its moment as far as their free width allows. The offset of the load's centre is a linear function of
 *   the shifts, each in an interval, so this reaches the least offset such shifts allow. When the offset stays
 *   above 10 % of the deck width the load says why.</li>
 *   <li><b>Axle loads</b> (when the catalog gives the geometry): the load moves back from the headboard by the least
 *   distance that keeps the front (or kingpin) and rear loads within their limits and the front above its least
 *   value, by the lever rule ({@link AxleGeometry#loads}); the loads are linear in the distance, so the limits
 *   give an interval. When the interval is empty, the limit that cannot be kept is named; with the row order of
 *   step 1 failing, the rows are tried in their filled order.</li>
 *   <li><b>Loading order.</b> Front to back, bottom up: crate i goes in before every crate behind or above it, so
 *   unloading from the doors in the reverse order never takes a crate from under another.</li>
 * </ol>
 */
final class DeckArrangement {
    private static final double EPS = 1e-6;
    /** The lateral target of the issue: within 10 % of the deck width of the centreline. */
    static final double LATERAL_SHARE = 0.10;

    /** A crate to place: the crate, its class and its slot as filled. */
    record Entry(Crate crate, CrateClass crateClass, DeckLayout.Slot slot) {
    }

    /** The arranged deck, or the reason no arrangement keeps the axle limits. */
    record Arranged(List<kitwright.loading.PlacedCrate> crates, double massKg, double centreMm, double lateralMm,
                    String balanceNote, VehicleLoad.AxleLoads axleLoads, double floorLengthMm, String failure) {
    }

    private DeckArrangement() {
    }

    static Arranged arrange(VehicleType vehicle, List<Entry> entries) {
        Map<Integer, List<Entry>> rows = new LinkedHashMap<>();
        entries.forEach(e -> rows.computeIfAbsent(e.slot().row(), k -> new ArrayList<>()).add(e));
        List<List<Entry>> filled = new ArrayList<>(rows.values());
        List<List<Entry>> ordered = new ArrayList<>(filled);
        ordered.sort(Comparator.<List<Entry>, Boolean>comparing(DeckArrangement::holdsJoints)
                .thenComparingDouble(r -> -mass(r)));
        Arranged first = place(vehicle, ordered);
        if (first.failure() == null || ordered.equals(filled)) {
            return first;
        }
        Arranged plain = place(vehicle, filled);
        return plain.failure() == null ? plain : first;
    }

    private static Arranged place(VehicleType vehicle, List<List<Entry>> rows) {
        double width = vehicle.deckWidthMm();
        int n = rows.size();
        double[] start = new double[n];
        double[] depth = new double[n];
        double[] free = new double[n];
        double[] shift = new double[n];
        double[] mass = new double[n];
        double[] moment = new double[n];
        double x = 0;
        for (int r = 0; r < n; r++) {
            double x0 = Double.MAX_VALUE;
            double x1 = 0;
            double y1 = 0;
            for (Entry e : rows.get(r)) {
                x0 = Math.min(x0, e.slot().x());
                x1 = Math.max(x1, e.slot().x() + along(e));
                y1 = Math.max(y1, e.slot().y() + across(e));
                mass[r] += e.crate().grossKg();
                moment[r] += e.crate().grossKg() * (e.slot().y() + across(e) / 2);
            }
            start[r] = x - x0;
            depth[r] = x1 - x0;
            free[r] = Math.max(0, width - y1);
            x += depth[r];
        }
        double floor = x;
        balance(width / 2, free, shift, mass, moment);
        double total = 0;
        double lateral = 0;
        double along = 0;
        for (int r = 0; r < n; r++) {
            total += mass[r];
            lateral += moment[r] + mass[r] * shift[r];
            for (Entry e : rows.get(r)) {
                along += e.crate().grossKg() * (e.slot().x() + start[r] + along(e) / 2);
            }
        }
        double centre = total > 0 ? along / total : 0;
        double offset = total > 0 ? lateral / total - width / 2 : 0;
        String note = Math.abs(offset) > LATERAL_SHARE * width + EPS ? String.format(Locale.ROOT,
                "the lateral centre of gravity lies %.0f mm off the centreline, more than 10 %% of the %.0f mm deck"
                        + " width: rows that fill the width with crates of unequal mass cannot move across, and the"
                        + " other rows cannot make up their moment", Math.abs(offset), width) : null;
        double back = 0;
        VehicleLoad.AxleLoads axleLoads = null;
        AxleGeometry axles = vehicle.axles();
        if (axles != null && total > 0) {
            double[] range = axleRange(axles, total, centre, vehicle.deckLengthMm() - floor);
            if (range[0] > range[1] + EPS) {
                return new Arranged(List.of(), total, centre, offset, note, null, floor,
                        axleFailure(vehicle, total, centre, vehicle.deckLengthMm() - floor));
            }
            back = range[0];
            double[] loads = axles.loads(total, centre + back);
            axleLoads = new VehicleLoad.AxleLoads(loads[0], loads[1]);
        }
        List<double[]> keys = new ArrayList<>();
        List<kitwright.loading.PlacedCrate> placed = new ArrayList<>();
        for (int r = 0; r < n; r++) {
            for (Entry e : rows.get(r)) {
                double px = e.slot().x() + start[r] + back;
                double py = e.slot().y() + shift[r];
                placed.add(new kitwright.loading.PlacedCrate(e.crate().id(), px, py, e.slot().z(),
                        e.slot().rotated()));
                keys.add(new double[] {px, e.slot().z(), py, placed.size() - 1});
            }
        }
        keys.sort(Comparator.<double[]>comparingDouble(k -> k[0]).thenComparingDouble(k -> k[1])
                .thenComparingDouble(k -> k[2]).thenComparingDouble(k -> k[3]));
        List<kitwright.loading.PlacedCrate> inOrder = keys.stream().map(k -> placed.get((int) k[3])).toList();
        return new Arranged(inOrder, total, centre + back, offset, note, axleLoads, floor + back, null);
    }

    /**
     * Row shifts within [0, free_r] that bring sum_r m_r (c_r + s_r) nearest to M w/2: each row to its own centre
     * first, then the remaining moment taken up by the rows with room, in row order.
     */
    private static void balance(double centre, double[] free, double[] shift, double[] mass, double[] moment) {
        double excess = 0; // moment about the centreline, kg mm, positive towards growing y
        for (int r = 0; r < free.length; r++) {
            if (mass[r] <= 0) {
                continue;
            }
            double own = centre - moment[r] / mass[r];
            shift[r] = Math.max(0, Math.min(free[r], own));
            excess += moment[r] + mass[r] * shift[r] - mass[r] * centre;
        }
        for (int r = 0; r < free.length && Math.abs(excess) > EPS; r++) {
            if (mass[r] <= 0) {
                continue;
            }
            double wanted = shift[r] - excess / mass[r];
            double next = Math.max(0, Math.min(free[r], wanted));
            excess += mass[r] * (next - shift[r]);
            shift[r] = next;
        }
    }

    /** The distances back from the headboard, within [0, room], that keep every axle limit: {lo, hi}. */
    static double[] axleRange(AxleGeometry a, double mass, double centre, double room) {
        double lo = 0;
        double hi = Math.max(0, room);
        double span = a.wheelbaseMm();
        // front(s) = uF + m (b - c - s) / span, falling in s; rear(s) = uR + m (c + s - a) / span, rising in s
        lo = Math.max(lo, a.rearSupportMm() - centre - (a.maxFrontKg() - a.unladenFrontKg()) * span / mass);
        hi = Math.min(hi, (a.maxRearKg() - a.unladenRearKg()) * span / mass + a.frontSupportMm() - centre);
        if (a.minFrontKg() != null) {
            hi = Math.min(hi, a.rearSupportMm() - centre - (a.minFrontKg() - a.unladenFrontKg()) * span / mass);
        }
        return new double[] {lo, hi};
    }

    /** The limit that cannot be kept, with the loads at the nearest place. */
    private static String axleFailure(VehicleType v, double mass, double centre, double room) {
        AxleGeometry a = v.axles();
        String front = a.kingpin() ? "kingpin load" : "front axle load";
        double[] atFront = a.loads(mass, centre);
        double[] atBack = a.loads(mass, centre + Math.max(0, room));
        String what;
        if (atBack[0] > a.maxFrontKg() + EPS) {
            what = String.format(Locale.ROOT, "the %s would be %.0f kg, above its %.0f kg limit, even with the load"
                    + " as far back as the deck allows", front, atBack[0], a.maxFrontKg());
        } else if (atFront[1] > a.maxRearKg() + EPS) {
            what = String.format(Locale.ROOT, "the rear axle load would be %.0f kg, above its %.0f kg limit, even"
                    + " with the load against the headboard", atFront[1], a.maxRearKg());
        } else if (a.minFrontKg() != null && atFront[0] < a.minFrontKg() - EPS) {
            what = String.format(Locale.ROOT, "the %s would be %.0f kg, below its least %.0f kg, even with the load"
                    + " against the headboard", front, atFront[0], a.minFrontKg());
        } else {
            what = String.format(Locale.ROOT, "no place along the deck keeps both the %s limit of %.0f kg and the"
                    + " rear axle limit of %.0f kg", front, a.maxFrontKg(), a.maxRearKg());
        }
        return String.format(Locale.ROOT, "%s with %.0f kg of crates: %s", v.name(), mass, what);
    }

    private static boolean holdsJoints(List<Entry> row) {
        return row.stream().anyMatch(e -> !e.crate().items(ItemKind.BOX).isEmpty());
    }

    private static double mass(List<Entry> row) {
        return row.stream().mapToDouble(e -> e.crate().grossKg()).sum();
    }

    private static double along(Entry e) {
        return e.crateClass().alongDeck(e.slot().rotated());
    }

    private static double across(Entry e) {
        return e.crateClass().acrossDeck(e.slot().rotated());
    }
}
