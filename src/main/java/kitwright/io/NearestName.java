package kitwright.io;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * Suggests the known name nearest to a misspelt one ("did you mean ...?"), by Levenshtein edit distance
 * (Levenshtein 1966) ignoring case. A suggestion is made only when the distance is small for the name's length.
 */
public final class NearestName {
    private NearestName() {
    }

    /** The nearest known name, when one is close enough to be a likely misspelling. */
    public static Optional<String> of(String wrong, Collection<String> known) {
        String target = wrong.trim().toLowerCase(Locale.ROOT);
        int limit = Math.max(1, Math.min(3, target.length() / 3));
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String name : known) {
            int d = distance(target, name.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = name;
                bestDistance = d;
            }
        }
        return bestDistance <= limit ? Optional.of(best) : Optional.empty();
    }

    /** Levenshtein distance: fewest single-character insertions, deletions and substitutions. */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j], current[j - 1]) + 1);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
