package kitwright.cli;

import java.util.ArrayList;
import java.util.List;

/** A plain-text table for the console: left-aligned text columns, right-aligned figures. */
final class TextTable {
    private final List<String> headers;
    private final boolean[] rightAligned;
    private final List<List<String>> rows = new ArrayList<>();

    /** Columns whose header starts with '>' are right-aligned (the '>' is not shown). */
    TextTable(String... headers) {
        this.headers = new ArrayList<>();
        this.rightAligned = new boolean[headers.length];
        for (int i = 0; i < headers.length; i++) {
            rightAligned[i] = headers[i].startsWith(">");
            this.headers.add(rightAligned[i] ? headers[i].substring(1) : headers[i]);
        }
    }

    TextTable row(Object... cells) {
        List<String> row = new ArrayList<>();
        for (Object cell : cells) {
            row.add(cell == null ? "-" : cell.toString());
        }
        rows.add(row);
        return this;
    }

    /** The table with two spaces between columns, each line indented by {@code indent}. */
    String render(String indent) {
        int[] widths = new int[headers.size()];
        for (int i = 0; i < widths.length; i++) {
            widths[i] = headers.get(i).length();
            for (List<String> row : rows) {
                widths[i] = Math.max(widths[i], row.get(i).length());
            }
        }
        StringBuilder sb = new StringBuilder();
        line(sb, indent, headers, widths);
        rows.forEach(row -> line(sb, indent, row, widths));
        return sb.toString();
    }

    private void line(StringBuilder sb, String indent, List<String> cells, int[] widths) {
        StringBuilder line = new StringBuilder(indent);
        for (int i = 0; i < cells.size(); i++) {
            String cell = cells.get(i);
            String pad = " ".repeat(widths[i] - cell.length());
            line.append(i == 0 ? "" : "  ").append(rightAligned[i] ? pad + cell : cell + pad);
        }
        sb.append(line.toString().stripTrailing()).append('\n');
    }
}
