package kitwright.report;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.ids.IdOrder;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.ItemKind;
import kitwright.packing.JointBoxLoad;
import kitwright.packing.JointCount;

/**
 * What a crate holds, by mark: the tubes of its bundles (host and every guest, walked down) and the joints of its
 * joint boxes. A pure function.
 */
public final class CrateContents {
    private CrateContents() {
    }

    /** Marks and counts in the crate, in mark order. Unknown refs are skipped. */
    public static Map<String, Integer> marks(Crate crate, Map<String, Bundle> bundles, Map<String, JointBoxLoad> boxes) {
        Map<String, Integer> marks = new TreeMap<>();
        for (CrateItem item : crate.items()) {
            if (item.kind() == ItemKind.BUNDLE) {
                Bundle b = bundles.get(item.ref());
                if (b != null) {
                    count(b.host(), marks);
                }
            } else {
                JointBoxLoad box = boxes.get(item.ref());
                if (box != null) {
                    for (JointCount j : box.joints()) {
                        marks.merge(j.mark(), j.count(), Integer::sum);
                    }
                }
            }
        }
        return marks;
    }

    /** Marks and counts of the tubes in one bundle. */
    public static Map<String, Integer> marks(Bundle bundle) {
        Map<String, Integer> marks = new TreeMap<>();
        count(bundle.host(), marks);
        return marks;
    }

    private static void count(NestedTube tube, Map<String, Integer> marks) {
        marks.merge(tube.mark(), 1, Integer::sum);
        for (NestedTube guest : tube.guests()) {
            count(guest, marks);
        }
    }

    /** "A1 × 12; N90 × 40" */
    public static String text(Map<String, Integer> marks) {
        return text(marks, " \u00D7 ");
    }

    /**
     * "A1 x 12; N90 x 40", plain ASCII for CSV files: a spreadsheet that opens a UTF-8 file without a byte-order mark
     * as its local code page shows "×" as "Ã—".
     */
    public static String plainText(Map<String, Integer> marks) {
        return text(marks, " x ");
    }

    private static String text(Map<String, Integer> marks, String times) {
        StringBuilder sb = new StringBuilder();
        marks.forEach((mark, n) -> sb.append(sb.length() == 0 ? "" : "; ").append(mark).append(times).append(n));
        return sb.toString();
    }

    /** Refs of the items of one kind, in number order ({@link IdOrder}), separated by spaces. */
    public static String refs(Crate crate, ItemKind kind) {
        return ids(crate.items(kind).stream().map(CrateItem::ref).toList(), " ");
    }

    /** Ids in number order ({@link IdOrder}), joined by {@code separator}: how every list of ids is printed. */
    public static String ids(List<String> ids, String separator) {
        return String.join(separator, ids.stream().sorted(IdOrder.NUMBER_ORDER).toList());
    }
}
