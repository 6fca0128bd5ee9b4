package kitwright.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/**
 * kitwright's one visual language: the stylesheet {@code kitwright/style/look.css} (palette, system font stacks,
 * tables, status marks, the best mark) that report.html and compare.html both inline before their own layout rules,
 * so the two pages share fonts, colours and marks. Self-contained: no import, no font or image from the network.
 */
public final class Look {
    static final String RESOURCE = "kitwright/style/look.css";
    private static final String CSS = read();

    private Look() {
    }

    /** The shared stylesheet's text, for a page's {@code <style>} element. */
    public static String css() {
        return CSS;
    }

    private static String read() {
        try (InputStream in = Look.class.getClassLoader().getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
