package kitwright.report.labels;

import java.util.ArrayList;
import java.util.List;

/**
 * The text a label's QR code carries: its fields on one line, separated by {@code ;}. A field holding {@code ;} or
 * {@code \} has it escaped with a backslash, so a mark such as "A;1" still reads back as one field; line breaks
 * become spaces, so the text stays one line.
 */
public final class CodeLine {
    private CodeLine() {
    }

    static String join(String... fields) {
        StringBuilder line = new StringBuilder();
        for (int i = 0; i < fields.length; i++) {
            if (i > 0) {
                line.append(';');
            }
            line.append(fields[i].replace("\\", "\\\\").replace(";", "\\;").replaceAll("[\\r\\n]", " "));
        }
        return line.toString();
    }

    /** The fields of a line, escapes undone: the inverse of {@link #join}. */
    public static List<String> split(String line) {
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '\\' && i + 1 < line.length()) {
                field.append(line.charAt(++i));
            } else if (c == ';') {
                fields.add(field.toString());
                field.setLength(0);
            } else {
                field.append(c);
            }
        }
        fields.add(field.toString());
        return List.copyOf(fields);
    }
}
