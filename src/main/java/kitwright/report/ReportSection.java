package kitwright.report;

import java.util.Objects;

/**
 * One block of the report: a heading, an anchor for the table of contents, and a Mustache template (in
 * {@code src/main/resources/kitwright/report/}) rendered with a view object. The template's variables are
 * HTML-escaped by Mustache; only values a section builds itself with an escaping builder (SVG drawings from
 * {@link Svg}) are inserted raw, with triple braces.
 *
 * @param id       anchor of the section, letters, digits and '-' (e.g. "saw-sheets")
 * @param title    heading and table-of-contents entry
 * @param template template name without the ".mustache" suffix
 * @param view     the object the template reads (a record of preformatted strings and lists)
 */
public record ReportSection(String id, String title, String template, Object view) {
    public ReportSection {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(template, "template");
        Objects.requireNonNull(view, "view");
        if (id == null || !id.matches("[a-z0-9-]+")) {
            throw new IllegalArgumentException("section id must be lower-case letters, digits and '-': " + id);
        }
    }
}
