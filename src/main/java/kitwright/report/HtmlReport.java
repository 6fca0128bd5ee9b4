package kitwright.report;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import com.github.mustachejava.MustacheFactory;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * Renders a {@link ReportModel} as one self-contained HTML page: inline CSS and SVG, no script, no web font, no
 * image or link to the network, so it reads the same with scripts off, offline and in print. Templates live in
 * {@code src/main/resources/kitwright/report/}; Mustache escapes every variable for HTML, so a mark named
 * {@code <b>&"} shows as text. The page's shell ({@code report.mustache}) holds the stylesheet, including the print
 * rules: A4 pages, a running header with the kit's name and the date, each section's saw sheets on a new page.
 *
 * <p>A pure function of the model: no clock, no locale, no file system; the same model gives the same string.
 */
public final class HtmlReport {
    private static final MustacheFactory TEMPLATES = new DefaultMustacheFactory("kitwright/report");

    /** A section after its own template has run: trusted HTML, inserted as it is into the page. */
    record Rendered(String id, String title, String html) {
    }

    /** What the page template reads. */
    record Page(String kitName, String description, String date, String runningHeader, String pageRules,
                List<Rendered> sections) {
        /** The shared stylesheet ({@link Look}), inlined before the report's own rules. */
        String look() {
            return Look.css();
        }
    }

    private HtmlReport() {
    }

    /** The report as an HTML document. */
    public static String render(ReportModel model) {
        List<Rendered> sections = new ArrayList<>();
        StringBuilder pageRules = new StringBuilder();
        for (ReportSection section : model.sections()) {
            if (section.view() instanceof SawSheetSection.View saw) {
                pageRules.append(saw.pageRules());
            }
            sections.add(new Rendered(section.id(), section.title(), run(section.template(), section.view())));
        }
        String date = model.date().toString();
        Page page = new Page(model.kitName(), model.description(), date,
                cssString(model.kitName() + " \u00B7 material plan \u00B7 " + date), pageRules.toString(), sections);
        return run("report", page);
    }

    private static String run(String template, Object view) {
        Mustache mustache = TEMPLATES.compile(template + ".mustache");
        StringWriter out = new StringWriter();
        try {
            mustache.execute(out, view).flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /**
     * Text as a quoted CSS string for the print header's {@code content}: letters, digits, space and a few
     * punctuation marks stay, every other character becomes a six-digit CSS escape ended by a space (which the
     * escape consumes), so no text can end the string, the rule or the style element (CSS Syntax Level 3,
     * 4.3.7 "consume an escaped code point").
     */
    static String cssString(String text) {
        StringBuilder sb = new StringBuilder("\"");
        text.codePoints().forEach(c -> {
            boolean plain = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9')
                    || c == ' ' || c == '.' || c == ',' || c == '-' || c == '_';
            if (plain) {
                sb.appendCodePoint(c);
            } else {
                sb.append('\\').append(String.format(java.util.Locale.ROOT, "%06x", c)).append(' ');
            }
        });
        return sb.append('"').toString();
    }
}
