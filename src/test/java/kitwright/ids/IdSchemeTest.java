package kitwright.ids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The id scheme's documented rule: first-choice stems, "reads like" by stem, the next candidate on a clash. */
class IdSchemeTest {

    @Test
    @DisplayName("the stem of a text: leading letters in upper case, separators dropped, numbers ignored")
    void stems() {
        assertThat(IdScheme.stem("C1")).isEqualTo("C");
        assertThat(IdScheme.stem("c-01")).isEqualTo("C");
        assertThat(IdScheme.stem("C 7")).isEqualTo("C");
        assertThat(IdScheme.stem("JB1")).isEqualTo("JB");
        assertThat(IdScheme.stem("J-B2")).isEqualTo("JB");
        assertThat(IdScheme.stem("B001")).isEqualTo("B");
        assertThat(IdScheme.stem("N90x")).isEqualTo("N");
        assertThat(IdScheme.stem("101")).isEmpty();
        assertThat(IdScheme.readAlike("B001", "b1")).isTrue();
        assertThat(IdScheme.readAlike("BDL-12", "bdl3")).isTrue();
        assertThat(IdScheme.readAlike("BDL-1", "B1")).isFalse();
    }

    @Test
    @DisplayName("marks of the usual shape (cinema-12's A1..E2, N90..N140) leave the first-choice ids")
    void firstChoice() {
        IdScheme ids = IdScheme.avoiding(List.of("A1", "A2", "B1", "B2", "C1", "C2", "D1", "E2", "N90", "N140"));
        assertThat(ids).isEqualTo(IdScheme.FIRST_CHOICE);
        assertThat(List.of(ids.bundle(1), ids.jointBox(2), ids.crate(3), ids.trip(12)))
                .containsExactly("BDL-1", "BOX-2", "CRT-3", "TRIP-12");
    }

    @Test
    @DisplayName("the old ids' shapes as marks (C1, B1, B001, JB1, V1) equal and read like no id")
    void oldShapes() {
        List<String> marks = List.of("C1", "C2", "B1", "B2", "B001", "JB1", "V1", "V2");
        IdScheme ids = IdScheme.avoiding(marks);
        for (String id : List.of(ids.bundle(1), ids.bundle(2), ids.jointBox(1), ids.crate(1), ids.crate(2),
                ids.trip(1), ids.trip(2))) {
            for (String mark : marks) {
                assertThat(id).isNotEqualToIgnoringCase(mark);
                assertThat(IdScheme.readAlike(id, mark)).as("%s reads like %s", id, mark).isFalse();
            }
        }
    }

    @Test
    @DisplayName("marks shaped like the ids change the ids' shape: the kind's word, then the word and a letter")
    void marksLikeTheIds() {
        IdScheme ids = IdScheme.avoiding(List.of("BDL1", "bundle-2", "Box 1", "CRT-7", "crate1", "CrateA9", "trip01"));
        assertThat(ids.bundle(4)).isEqualTo("BUNDLEA-4");
        assertThat(ids.jointBox(1)).isEqualTo("JOINTBOX-1");
        assertThat(ids.crate(2)).isEqualTo("CRATEB-2");
        assertThat(ids.trip(1)).isEqualTo("VEHICLE-1");
        List<String> many = new ArrayList<>(List.of("CRT1", "CRATE1"));
        for (char c = 'A'; c <= 'Z'; c++) {
            many.add("CRATE" + c + "1");
        }
        assertThat(IdScheme.avoiding(many).crate(1)).as("after Z comes AA").isEqualTo("CRATEAA-1");
    }

    @Test
    @DisplayName("the scheme depends on the set of marks, not on their order or repeats")
    void orderFree() {
        List<String> marks = new ArrayList<>(List.of("BDL1", "BOX2", "CRT3", "TRIP4", "BUNDLE5", "A1", "101"));
        IdScheme expected = IdScheme.avoiding(marks);
        Random random = new Random(20261203);
        for (int i = 0; i < 50; i++) {
            Collections.shuffle(marks, random);
            List<String> repeated = new ArrayList<>(marks);
            repeated.add(marks.get(0));
            assertThat(IdScheme.avoiding(repeated)).isEqualTo(expected);
        }
    }

    @Test
    @DisplayName("a stem is capital letters, each kind its own; ids count from 1")
    void rejectsBadSchemes() {
        assertThatThrownBy(() -> new IdScheme("BDL", "BOX", "CRT", "BDL")).hasMessageContaining("share a stem");
        assertThatThrownBy(() -> new IdScheme("B1", "BOX", "CRT", "TRIP")).hasMessageContaining("capital letters");
        assertThatThrownBy(() -> new IdScheme("bdl", "BOX", "CRT", "TRIP")).hasMessageContaining("capital letters");
        assertThatThrownBy(() -> IdScheme.FIRST_CHOICE.crate(0)).hasMessageContaining("count from 1");
    }

    @Test
    @DisplayName("number order: BDL-2 before BDL-10, BDL-4.2 before BDL-4.10, letters by character")
    void numberOrder() {
        List<String> ids = new ArrayList<>(List.of("BDL-10", "BDL-4.10", "BDL-2", "BDL-4.2", "BDL-1", "BOX-3"));
        ids.sort(IdOrder.NUMBER_ORDER);
        assertThat(ids).containsExactly("BDL-1", "BDL-2", "BDL-4.2", "BDL-4.10", "BDL-10", "BOX-3");
    }
}
