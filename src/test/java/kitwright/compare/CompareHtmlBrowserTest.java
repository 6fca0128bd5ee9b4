package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Renders compare.html in headless Chromium: the screenshot is not blank and the browser's DOM has a chart per
 * metric and a column per option. Skipped when /usr/bin/chromium is missing, unless CI=true (then it fails).
 */
class CompareHtmlBrowserTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

    @TempDir
    Path tmp;

    @BeforeAll
    static void needsChromium() {
        boolean present = Files.isExecutable(CHROMIUM);
        if (!present && "true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new AssertionError("CI=true but " + CHROMIUM + " is missing: install the Debian package chromium");
        }
        Assumptions.assumeTrue(present, "browser test skipped: " + CHROMIUM + " is missing (apt-get install chromium)");
    }

    @Test
    void pageRendersWithAChartPerMetricAndAColumnPerOption() throws Exception {
        Path out = tmp.resolve("compare");
        CompareFiles.write(out, CompareFixtures.three());
        Path page = out.resolve(CompareFiles.HTML);

        Path png = tmp.resolve("compare.png");
        run(tmp, "--screenshot=" + png, "--window-size=1280,1900", page.toUri().toString());
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image).as("screenshot").isNotNull();
        assertThat(image.getWidth()).isEqualTo(1280);
        Set<Integer> colours = new HashSet<>();
        int nonWhite = 0;
        for (int y = 0; y < image.getHeight(); y += 2) {
            for (int x = 0; x < image.getWidth(); x += 2) {
                int rgb = image.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                if (rgb != 0xFFFFFF) {
                    nonWhite++;
                }
            }
        }
        assertThat(colours.size()).as("distinct colours in the screenshot").isGreaterThan(50);
        assertThat(nonWhite).as("non-white pixels").isGreaterThan(image.getWidth() * image.getHeight() / 4 / 20);

        String dom = run(tmp, "--dump-dom", page.toUri().toString());
        for (String metric : List.of("cost", "waste", "mass", "vehicles")) {
            assertThat(dom).contains("<svg class=\"chart\" data-metric=\"" + metric + "\"");
        }
        assertThat(CompareWritersTest.count(dom, "<svg class=\"chart\"")).isEqualTo(4);
        assertThat(CompareWritersTest.count(dom, "<th scope=\"col\" class=\"option\">")).isEqualTo(3);
        assertThat(CompareWritersTest.count(dom, "<rect ")).isGreaterThanOrEqualTo(3 * 5);
        // The browser parsed the escaped name as text: no <b> element appeared.
        assertThat(dom).contains("&lt;b&gt;&amp;\"").doesNotContain("<b>&amp;");
    }

    /**
     * Printed, compare.html comes out on A4 pages (595 x 842 pt, ISO 216) and every figure row's name is printed
     * once, with its values on the same page (rows do not split across pages); pdftotext (poppler-utils) reads the
     * pages back.
     */
    @Test
    void printsOnA4WithNoRowSplitAcrossPages() throws Exception {
        Path pdftotext = kitwright.testing.ExternalTool.require("/usr/bin/pdftotext", "poppler-utils");
        Path out = tmp.resolve("compare-print");
        CompareFiles.write(out, CompareFixtures.three());
        Path pdf = tmp.resolve("compare.pdf");
        run(tmp, "--no-pdf-header-footer", "--print-to-pdf=" + pdf, out.resolve(CompareFiles.HTML).toUri().toString());
        String raw = new String(Files.readAllBytes(pdf), StandardCharsets.ISO_8859_1);
        java.util.regex.Matcher box = java.util.regex.Pattern
                .compile("/MediaBox\\s*\\[\\s*0\\s+0\\s+([0-9.]+)\\s+([0-9.]+)\\s*\\]").matcher(raw);
        int pages = 0;
        while (box.find()) {
            assertThat(Double.parseDouble(box.group(1))).as("page width, pt").isCloseTo(595.3, within(1.5));
            assertThat(Double.parseDouble(box.group(2))).as("page height, pt").isCloseTo(841.9, within(1.5));
            pages++;
        }
        assertThat(pages).as("pages").isPositive();
        Process p = new ProcessBuilder(pdftotext.toString(), "-layout", pdf.toString(), "-")
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor(60, TimeUnit.SECONDS);
        List<String> pageTexts = List.of(text.split("\f"));
        // a row's line in the layout text: its name, then its unit or values after a run of spaces
        for (String figure : List.of("Stock cost", "Crates", "Vehicles", "Trip cost", "Marks (bar types)")) {
            java.util.regex.Pattern row = java.util.regex.Pattern.compile("(?m)^\\s*"
                    + java.util.regex.Pattern.quote(figure) + " {2,}\\S");
            long on = pageTexts.stream().filter(t -> row.matcher(t).find()).count();
            assertThat(on).as("pages printing the row " + figure + " with its values").isEqualTo(1);
        }
    }

    /** Runs headless Chromium with a fresh profile and returns its standard output. */
    private static String run(Path tmp, String... args) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(tmp, "chromium-profile");
        List<String> command = new ArrayList<>(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox",
                "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage", "--hide-scrollbars",
                "--user-data-dir=" + profile));
        command.addAll(List.of(args));
        Path stdout = tmp.resolve("chromium-out-" + System.nanoTime() + ".txt");
        Process p = new ProcessBuilder(command).redirectOutput(stdout.toFile())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("chromium did not finish within 120 s: " + command);
        }
        assertThat(p.exitValue()).as("chromium exit code").isZero();
        return Files.readString(stdout, StandardCharsets.UTF_8);
    }
}
