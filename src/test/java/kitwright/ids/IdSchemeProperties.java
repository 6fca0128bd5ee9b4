package kitwright.ids;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import kitwright.validate.PlanValidator;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Random kits' marks, drawn to collide: stems of the old ids (C, B, JB, V) and of every candidate of the scheme,
 * in any case, with separators and leading zeros, and marks of digits only. Whatever the marks, no id equals one
 * (ignoring case) or has the same letters before its first digit. The check re-reads the rule of the class comment
 * with the shared validator's regular expressions ({@link PlanValidator#letters}), not with {@link IdScheme#stem}.
 */
class IdSchemeProperties {
    @Property(tries = 1000, seed = "20261203")
    void noIdReadsLikeAMark(@ForAll("marks") List<String> marks) {
        IdScheme ids = IdScheme.avoiding(marks);
        Set<String> stems = Set.of(ids.bundle(), ids.jointBox(), ids.crate(), ids.trip());
        assertThat(stems).hasSize(4);
        Set<String> upper = new java.util.HashSet<>();
        Set<String> letters = new java.util.HashSet<>();
        marks.forEach(m -> upper.add(m.toUpperCase(java.util.Locale.ROOT)));
        marks.forEach(m -> letters.add(PlanValidator.letters(m)));
        for (int n : new int[] {1, 2, 9, 10, 99, 100, 1001}) {
            for (String id : List.of(ids.bundle(n), ids.jointBox(n), ids.crate(n), ids.trip(n))) {
                assertThat(id).matches("\\p{Lu}+-[1-9][0-9]*");
                assertThat(upper).as("marks equal to %s", id).doesNotContain(id.toUpperCase(java.util.Locale.ROOT));
                assertThat(letters).as("marks with the letters of %s", id).doesNotContain(PlanValidator.letters(id));
            }
        }
    }

    @Provide
    Arbitrary<List<String>> marks() {
        Arbitrary<String> stem = Arbitraries.of("C", "B", "JB", "V", "BDL", "BUNDLE", "BUNDLEA", "BUNDLEB", "BOX",
                "JOINTBOX", "JOINTBOXA", "CRT", "CRATE", "CRATEA", "CRATEZ", "CRATEAA", "TRIP", "VEHICLE", "VEHICLEA",
                "N", "", "X", "bdl", "Crt", "j-b", "B-D-L");
        Arbitrary<String> separator = Arbitraries.of("", "-", " ", ".", "_", "/");
        Arbitrary<String> number = Arbitraries.of("", "0", "1", "01", "001", "2", "10", "90", "1.5");
        Arbitrary<String> mark = Combinators.combine(stem, separator, number).as((s, sep, n) -> s + sep + n)
                .filter(m -> !m.isBlank());
        return mark.list().ofMinSize(0).ofMaxSize(40);
    }
}
