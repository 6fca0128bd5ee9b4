package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The reason text of an INFEASIBLE section: which marks lack stock and how much bar length is missing. */
final class Shortage {
    private Shortage() {
    }

    /**
     * @param missing bars per item type that get no stock
     * @param lead    what found the shortage, e.g. "not enough stock"
     */
    static String reason(IntegerInstance instance, int[] missing, String lead) {
        List<Demand> demands = instance.problem.demands();
        List<String> parts = new ArrayList<>();
        double length = 0;
        for (int i = 0; i < missing.length; i++) {
            int left = missing[i];
            // the last marks of a type are the ones left over
            for (int m = instance.marks[i].length - 1; m >= 0 && left > 0; m--) {
                Demand d = demands.get(instance.marks[i][m]);
                int count = Math.min(left, d.quantity());
                left -= count;
                length += count * d.lengthMm();
                parts.add(d.mark() + " (" + count + " of " + d.quantity() + " bars missing, " + mm(d.lengthMm())
                        + " mm each)");
            }
        }
        parts.sort(null);
        return lead + " marks " + String.join(", ", parts) + " in section " + instance.problem.section()
                + ": " + mm(length) + " mm of bar length missing";
    }

    /** A mark that fits no stock length at all. */
    static String tooLong(IntegerInstance instance, List<String> marks, double usableMm) {
        return "marks " + String.join(", ", marks) + " in section " + instance.problem.section()
                + " are longer than the longest usable stock length (" + mm(usableMm)
                + " mm after trim); no stock can hold them";
    }

    static String mm(double value) {
        return Math.rint(value) == value ? String.format(Locale.ROOT, "%.0f", value)
                : String.format(Locale.ROOT, "%.1f", value);
    }
}
