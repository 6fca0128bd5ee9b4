package kitwright.io;

import java.util.List;
import java.util.TreeSet;
import kitwright.model.StructureCount;

/**
 * Checks kit.json's {@code tour} against the structures table: a tour needs structures.csv (or the structures
 * sheet), and each of its names must be a structure there. Each problem is reported on the line of the tour's
 * entry, with the nearest known name when one is close ("did you mean").
 */
final class TourCheck {
    /** Known structures are listed in a message up to this many. */
    private static final int LISTED = 30;

    private TourCheck() {
    }

    /**
     * @param structuresName     how messages name the structures table
     * @param hasStructures      false when the kit has no structures table at all
     * @param structuresReadable false when the table has problems of its own (already reported): a name missing
     *                           from the rows read may stand on a row that could not be read, so it is not judged
     */
    static void check(List<Sourced<String>> tour, String structuresName, boolean hasStructures,
                      boolean structuresReadable, List<Sourced<StructureCount>> structures, Problems problems) {
        if (tour.isEmpty()) {
            return;
        }
        if (!hasStructures) {
            problems.add(tour.get(0).problem("tour", "the kit has no " + structuresName + ", so no structure of the"
                    + " tour is known (expected " + structuresName + " listing the bars of each structure,"
                    + " structure,mark,count, or leave the key out)"));
            return;
        }
        if (!structuresReadable) {
            return;
        }
        TreeSet<String> known = new TreeSet<>();
        structures.forEach(s -> known.add(s.value().structure()));
        for (Sourced<String> stop : tour) {
            if (known.contains(stop.value())) {
                continue;
            }
            String hint = NearestName.of(stop.value(), known).map(n -> "did you mean " + n + "? ").orElse("");
            String listed = known.size() <= LISTED ? ": " + String.join(", ", known) : "";
            problems.add(stop.problem("tour", "structure '" + stop.value() + "' is not in " + structuresName + " ("
                    + hint + "expected a structure of " + structuresName + listed + ")"));
        }
    }
}
