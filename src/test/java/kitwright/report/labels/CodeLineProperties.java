package kitwright.report.labels;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.CharRange;
import net.jqwik.api.constraints.Chars;
import net.jqwik.api.constraints.Size;
import net.jqwik.api.constraints.StringLength;

/** The QR text of a label: one line, fields split back exactly, whatever a mark or section holds. */
class CodeLineProperties {

    @Property(tries = 2000, seed = "20261203")
    void fieldsReadBackExactlyAndTheLineIsOne(@ForAll @Size(min = 1, max = 8) List<@StringLength(max = 12)
            @Chars({';', '\\', ' ', '.', '-', 'x'}) @CharRange(from = 'A', to = 'F') String> fields) {
        String line = CodeLine.join(fields.toArray(String[]::new));
        assertThat(line).doesNotContain("\n").doesNotContain("\r");
        assertThat(CodeLine.split(line)).containsExactlyElementsOf(fields);
    }

    @Property(tries = 500, seed = "20261203")
    void lineBreaksBecomeSpaces(@ForAll @StringLength(max = 12) @Chars({'\n', '\r', 'a'}) String field) {
        assertThat(CodeLine.split(CodeLine.join(field, "end")))
                .containsExactly(field.replace('\n', ' ').replace('\r', ' '), "end");
    }
}
