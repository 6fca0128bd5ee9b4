package kitwright.io;

import java.util.ArrayList;
import java.util.List;

/** The columns a CSV format knows: the required ones first, then the optional ones, in documented order. */
public record CsvColumns(List<String> required, List<String> optional) {
    public CsvColumns {
        required = List.copyOf(required);
        optional = List.copyOf(optional);
    }

    /** Every known column, required first. */
    public List<String> all() {
        List<String> all = new ArrayList<>(required);
        all.addAll(optional);
        return all;
    }

    public boolean knows(String column) {
        return required.contains(column) || optional.contains(column);
    }

    /** The known column a header name stands for in any letter case, or the name as it is when none does. */
    public String canonical(String name) {
        return all().stream().filter(c -> c.equalsIgnoreCase(name)).findFirst().orElse(name);
    }

    /** The header as the file should have it, e.g. {@code mark,section,length_mm,quantity}. */
    public String header() {
        return String.join(",", required);
    }

    /** Every known column for messages, e.g. {@code mark, section, length_mm, quantity, note (optional)}. */
    public String describe() {
        StringBuilder sb = new StringBuilder(String.join(", ", required));
        if (!optional.isEmpty()) {
            sb.append("; optional: ").append(String.join(", ", optional));
        }
        return sb.toString();
    }
}
