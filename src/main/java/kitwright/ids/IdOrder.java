package kitwright.ids;

import java.math.BigInteger;
import java.util.Comparator;

/**
 * Ids in number order: runs of digits compare by their value, other text by character, so BDL-2 comes before
 * BDL-10 and BDL-4.2 before BDL-4.10. Every printed list of ids is sorted by it; ids that compare equal (BDL-01,
 * BDL-1) keep their order, as the sorts are stable.
 */
public final class IdOrder {
    public static final Comparator<String> NUMBER_ORDER = IdOrder::compare;

    private IdOrder() {
    }

    public static int compare(String a, String b) {
        int i = 0;
        int j = 0;
        while (i < a.length() && j < b.length()) {
            char x = a.charAt(i);
            char y = b.charAt(j);
            if (Character.isDigit(x) && Character.isDigit(y)) {
                int ei = i;
                while (ei < a.length() && Character.isDigit(a.charAt(ei))) {
                    ei++;
                }
                int ej = j;
                while (ej < b.length() && Character.isDigit(b.charAt(ej))) {
                    ej++;
                }
                int c = new BigInteger(a.substring(i, ei)).compareTo(new BigInteger(b.substring(j, ej)));
                if (c != 0) {
                    return c;
                }
                i = ei;
                j = ej;
            } else {
                if (x != y) {
                    return Character.compare(x, y);
                }
                i++;
                j++;
            }
        }
        return Integer.compare(a.length() - i, b.length() - j);
    }
}
