package kitwright.ids;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;

/**
 * Problem: the packing lists, manifests, labels and the report name bundles, joint boxes, crates and trips beside
 * the kit's marks. An id shaped like a mark is read as one: crate C1 beside mark C1, bundle B001 beside mark B1.
 *
 * <p>Method: an id is a stem of capital letters, a hyphen and a number counted from 1 without leading zeros. The
 * first-choice stems are {@code BDL} (bundle), {@code BOX} (joint box), {@code CRT} (crate) and {@code TRIP} (one
 * vehicle's trip): BDL-1, BOX-1, CRT-1, TRIP-1. A kind whose stem a mark of the kit reads like takes its next
 * candidate: the kind's word ({@code BUNDLE}, {@code JOINTBOX}, {@code CRATE}, {@code VEHICLE}), then the word
 * followed by A, B, ..., Z, AA, AB, ... Each kind is decided on its own, from the kit's marks alone.
 *
 * <p>"Reads like", precisely: the <em>stem</em> of a text is the run of letters its upper-case form (Locale.ROOT)
 * starts with once every character that is neither a letter nor a digit is dropped: C1, c-01 and C 7 have stem C,
 * JB1 and J-B2 have JB, B001 has B, N90 has N, BDL-12 has BDL, a mark such as 101 has the empty stem. A text reads
 * like another when their stems are equal, whatever their numbers, case, separators and leading zeros. Two texts
 * equal but for case have the same stem, so an id that reads like no mark equals none either.
 *
 * <p>Guarantee: no id of the scheme reads like (so none equals) a mark of the bars or joints it was chosen for,
 * nor an id of another kind (the four candidate lists share no stem); a stem is always found, as a kit has finitely
 * many marks. Deterministic: the scheme depends on the set of marks only, not on their order.
 *
 * @param bundle   stem of bundle ids
 * @param jointBox stem of joint box ids
 * @param crate    stem of crate ids
 * @param trip     stem of trip (vehicle load) ids
 */
public record IdScheme(String bundle, String jointBox, String crate, String trip) {
    /** The first-choice stems, for a stage that is given no marks to avoid. */
    public static final IdScheme FIRST_CHOICE = avoiding(List.of());

    public IdScheme {
        for (String stem : List.of(bundle, jointBox, crate, trip)) {
            if (stem.isEmpty() || !stem.equals(stem(stem))) {
                throw new IllegalArgumentException("an id stem is capital letters only: '" + stem + "'");
            }
        }
        if (new HashSet<>(List.of(bundle, jointBox, crate, trip)).size() < 4) {
            throw new IllegalArgumentException("two kinds of ids share a stem: " + List.of(bundle, jointBox, crate,
                    trip));
        }
    }

    /** The scheme for a kit: no id reads like a mark of its bars or joints. */
    public static IdScheme of(Kit kit) {
        List<String> marks = new ArrayList<>();
        kit.bars().stream().map(Bar::mark).forEach(marks::add);
        kit.joints().stream().map(Joint::mark).forEach(marks::add);
        return avoiding(marks);
    }

    /** The scheme whose ids read like none of {@code marks}. */
    public static IdScheme avoiding(Collection<String> marks) {
        Set<String> taken = new HashSet<>();
        marks.forEach(m -> taken.add(stem(m)));
        return new IdScheme(free("BDL", "BUNDLE", taken), free("BOX", "JOINTBOX", taken),
                free("CRT", "CRATE", taken), free("TRIP", "VEHICLE", taken));
    }

    public String bundle(int number) {
        return id(bundle, number);
    }

    public String jointBox(int number) {
        return id(jointBox, number);
    }

    public String crate(int number) {
        return id(crate, number);
    }

    public String trip(int number) {
        return id(trip, number);
    }

    /** The letters a text starts with, upper case, once everything but letters and digits is dropped. */
    public static String stem(String text) {
        StringBuilder stem = new StringBuilder();
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isDigit(c)) {
                break;
            }
            if (Character.isLetter(c)) {
                stem.append(c);
            }
        }
        return stem.toString().toUpperCase(Locale.ROOT);
    }

    /** True when the two texts have the same stem (see the class comment). */
    public static boolean readAlike(String a, String b) {
        return stem(a).equals(stem(b));
    }

    private static String id(String stem, int number) {
        if (number < 1) {
            throw new IllegalArgumentException("ids count from 1: " + number);
        }
        return stem + "-" + number;
    }

    /** The first of abbreviation, word, word + A, word + B, ..., word + AA, ... that is not taken. */
    private static String free(String abbreviation, String word, Set<String> taken) {
        if (!taken.contains(abbreviation)) {
            return abbreviation;
        }
        String candidate = word;
        for (int n = 0; taken.contains(candidate); n++) {
            candidate = word + letters(n);
        }
        return candidate;
    }

    /** 0 gives A, 25 gives Z, 26 gives AA: the spreadsheet column letters. */
    private static String letters(int n) {
        StringBuilder s = new StringBuilder();
        for (int k = n + 1; k > 0; k = (k - 1) / 26) {
            s.insert(0, (char) ('A' + (k - 1) % 26));
        }
        return s.toString();
    }
}
