package kitwright.sweep;

import java.util.Collection;
import java.util.HashSet;
import java.util.Set;
import kitwright.ids.IdScheme;

/**
 * Names the marks of a sweep option the way the sample kits do: one letter stem per section (A, B, ..., Z, AA, AB,
 * ...) in the given section order, and a number per mark from 1 for the longest. A stem that a joint mark of the kit
 * reads like is skipped ({@link IdScheme#stem}: the letters before the first digit), so no
 * bar mark reads like a joint; names start with a letter, so none reads as a spreadsheet formula
 * ({@code io/Names}). A section keeps its letter in every option, whatever K.
 */
public final class MarkNames {
    private final Set<String> taken;

    /** @param jointMarks the kit's joint marks (joints.csv), whose stems bar marks must not take */
    public MarkNames(Collection<String> jointMarks) {
        Set<String> stems = new HashSet<>();
        for (String mark : jointMarks) {
            stems.add(IdScheme.stem(mark));
        }
        this.taken = stems;
    }

    /** The stem of the section at {@code index} (0 first) of the section order. */
    public String stem(int index) {
        int seen = -1;
        for (int n = 0; ; n++) {
            String candidate = letters(n);
            if (!taken.contains(candidate) && ++seen == index) {
                return candidate;
            }
        }
    }

    /** The name of mark {@code number} (1 for the longest) of the section at {@code index}. */
    public String name(int index, int number) {
        return stem(index) + number;
    }

    /** A, B, ..., Z, AA, AB, ...: the n-th (from 0) run of capital letters in that order. */
    static String letters(int n) {
        StringBuilder sb = new StringBuilder();
        int k = n;
        do {
            sb.insert(0, (char) ('A' + k % 26));
            k = k / 26 - 1;
        } while (k >= 0);
        return sb.toString();
    }
}
