package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import kitwright.cli.CliRun;
import kitwright.cutting.CutPlan;
import kitwright.io.KitReader;
import kitwright.model.Bar;
import kitwright.model.Kit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Renders the report of a sample-like kit in headless Chromium: the screenshot is not blank, and in the DOM the
 * browser built every distinct pattern has its drawing and the legends list every mark. Skipped with a message
 * where Chromium is not installed, unless the environment variable CI is "true": then it fails.
 */
class ReportBrowserTest {

    private static HeadlessChromium chromiumOrSkip(Path dir) {
        Optional<HeadlessChromium> chromium = HeadlessChromium.find(dir);
        if (chromium.isEmpty()) {
            String message = "chromium is not installed (apt-get install chromium); the browser test needs it";
            if ("true".equals(System.getenv("CI"))) {
                fail(message + " and CI=true");
            }
            Assumptions.abort(message + "; skipped outside CI");
        }
        return chromium.get();
    }

    private static String unescape(String attribute) {
        return attribute.replace("&quot;", "\"").replace("&#39;", "'").replace("&lt;", "<").replace("&gt;", ">")
                .replace("&amp;", "&");
    }

    /** The text from the first match of {@code startRegex} to the next {@code end}, inclusive. */
    private static String element(String dom, String startRegex, String end) {
        Matcher m = Pattern.compile(startRegex).matcher(dom);
        assertThat(m.find()).as(startRegex).isTrue();
        int close = dom.indexOf(end, m.start());
        assertThat(close).as(end + " after " + startRegex).isPositive();
        return dom.substring(m.start(), close + end.length());
    }

    private static double inkedShare(BufferedImage image) {
        long inked = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y);
                if ((rgb >> 16 & 0xFF) < 235 || (rgb >> 8 & 0xFF) < 235 || (rgb & 0xFF) < 235) {
                    inked++;
                }
            }
        }
        return inked / (double) (image.getWidth() * image.getHeight());
    }

    private static int colours(BufferedImage image) {
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                colours.add(image.getRGB(x, y) & 0xFFFFFF);
            }
        }
        return colours.size();
    }

    private static List<String> attributes(String dom, String regex) {
        Matcher m = Pattern.compile(regex).matcher(dom);
        List<String> found = new java.util.ArrayList<>();
        while (m.find()) {
            found.add(unescape(m.group(1)));
        }
        return found;
    }

    @Test
    @DisplayName("report.html renders in headless Chromium: not blank, every pattern drawn, every mark in a legend")
    void rendersInHeadlessChromium(@TempDir Path dir) throws Exception {
        HeadlessChromium chromium = chromiumOrSkip(dir);
        Kit kit = ReportFixtures.sampleKit();
        CutPlan plan = ReportFixtures.samplePlan(kit);
        Path page = ReportWriter.writeInto(ReportModel.of(kit, plan, LocalDate.of(2025, 3, 14)), dir);

        Path png = dir.resolve("report.png");
        chromium.screenshot(page, png, 1280, 2000);
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1280);
        long inked = 0;
        long firstMarkColour = 0;
        Set<Integer> colours = new HashSet<>();
        int markRgb = Integer.parseInt(MarkPalette.colour(0).substring(1), 16);
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                int r = rgb >> 16 & 0xFF;
                int g = rgb >> 8 & 0xFF;
                int b = rgb & 0xFF;
                if (r < 235 || g < 235 || b < 235) {
                    inked++;
                }
                if (rgb == markRgb) {
                    firstMarkColour++;
                }
            }
        }
        double share = inked / (double) (image.getWidth() * image.getHeight());
        assertThat(share).as("share of non-white pixels").isBetween(0.03, 0.6);
        assertThat(colours.size()).as("distinct colours").isGreaterThan(40);
        assertThat(firstMarkColour).as("pixels of the first mark's colour (a drawn piece)").isGreaterThan(500);

        String dom = chromium.dumpDom(page);
        assertThat(dom).contains("<h1>Touring cinema kit (test data)</h1>");
        List<String> expected = new java.util.ArrayList<>();
        for (int s = 0; s < plan.sections().size(); s++) {
            int patterns = SawSheetSection.distinct(plan.sections().get(s).patterns()).size();
            for (int p = 1; p <= patterns; p++) {
                expected.add("s" + (s + 1) + "-p" + p);
            }
        }
        assertThat(attributes(dom, "<figure [^>]*data-pattern=\"([^\"]+)\""))
                .containsExactlyElementsOf(expected);
        assertThat(attributes(dom, "<svg [^>]*data-pattern=\"([^\"]+)\"")).containsExactlyElementsOf(expected);
        assertThat(attributes(dom, "<tr class=\"legend-mark\" data-mark=\"([^\"]*)\""))
                .containsExactlyInAnyOrderElementsOf(kit.bars().stream().map(Bar::mark).toList());
        assertThat(attributes(dom, "<td class=\"mark\">([^<]*)</td>")).contains(ReportFixtures.HOSTILE);
    }

    @Test
    @DisplayName("the real plan report of cinema-12 in Chromium: every pattern, mark, bundle, crate type and vehicle"
            + " drawn, the cautions say material and logistics only, not blank, nesting and logistics on new pages")
    void rendersTheRealPlanReport(@TempDir Path dir) throws Exception {
        HeadlessChromium chromium = chromiumOrSkip(dir);
        Path out = dir.resolve("cinema-12");
        CliRun run = CliRun.of("plan", "sample-kits/cinema-12", "--out", out.toString(), "--date", "2026-12-01");
        assertThat(run.exitCode()).as(run.err()).isZero();
        Path page = out.resolve("report.html");
        PlanFolder plan = PlanFolder.read(out);

        Path png = dir.resolve("report.png");
        chromium.screenshot(page, png, 1280, 2400);
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(inkedShare(image)).as("share of non-white pixels").isBetween(0.03, 0.6);
        assertThat(colours(image)).as("distinct colours").isGreaterThan(40);

        String dom = chromium.dumpDom(page);
        assertThat(dom).contains("<h1>cinema-12</h1>").doesNotContain("<script");
        assertThat(attributes(dom, "<figure [^>]*data-pattern=\"([^\"]+)\"")).containsExactlyElementsOf(plan.patternIds());
        assertThat(attributes(dom, "<svg [^>]*data-pattern=\"([^\"]+)\"")).containsExactlyElementsOf(plan.patternIds());
        assertThat(attributes(dom, "<tr class=\"legend-mark\" data-mark=\"([^\"]*)\""))
                .containsExactlyInAnyOrderElementsOf(KitReader.read(Path.of("sample-kits", "cinema-12")).bars()
                        .stream().map(Bar::mark).toList());
        assertThat(attributes(dom, "<figure [^>]*data-bundle=\"([^\"]+)\"")).containsExactlyElementsOf(plan.bundleLayouts());
        for (String bundle : plan.bundleLayouts()) {
            String figure = element(dom, "<figure [^>]*data-bundle=\"" + Pattern.quote(bundle) + "\"", "</figure>");
            assertThat(figure).as(bundle).containsPattern("<svg [^>]*class=\"bundle-drawing\" data-bundle=\""
                    + Pattern.quote(bundle) + "\"").contains("<g class=\"side-view\">").contains("<g class=\"cross-section\"");
        }
        // the whole kit's block; the tour's legs (cinema-12 tours its structures) have crates and trips of their own
        String logistics = element(dom, "<section id=\"crates-and-trucks\"", "</section>");
        Set<String> crateTypes = new HashSet<>(attributes(logistics, "<figure [^>]*data-crate-type=\"([^\"]+)\""));
        assertThat(crateTypes).containsExactlyInAnyOrderElementsOf(plan.crateTypes());
        assertThat(attributes(logistics, "<svg [^>]*class=\"crate-section\" data-crate=\"([^\"]+)\"")).isNotEmpty();
        assertThat(attributes(logistics, "<figure [^>]*data-vehicle=\"([^\"]+)\""))
                .containsExactlyElementsOf(plan.vehicles());
        assertThat(attributes(logistics, "<svg [^>]*class=\"deck-plan\" data-vehicle=\"([^\"]+)\""))
                .containsExactlyElementsOf(plan.vehicles());
        String firstLeg = element(dom, "<section id=\"leg-1\"", "</section>");
        assertThat(attributes(firstLeg, "<svg [^>]*class=\"deck-plan\" data-vehicle=\"([^\"]+)\"")).isNotEmpty();
        String cautions = element(dom, "<section id=\"cautions\"", "</section>");
        assertThat(cautions).contains("Material and logistics planning only")
                .contains("It does not check structural capacity").contains("EN 12195-1");

        Path pdf = dir.resolve("report.pdf");
        chromium.printToPdf(page, pdf);
        String raw = new String(java.nio.file.Files.readAllBytes(pdf), java.nio.charset.StandardCharsets.ISO_8859_1);
        long pages = Pattern.compile("/Type\\s*/Page\\b").matcher(raw).results().count();
        // summary and order, a page per saw-sheet section, nested bundles, crates and trucks, cautions, inputs
        assertThat(pages).isGreaterThanOrEqualTo(1 + plan.sections() + 4);
    }

    @Test
    @DisplayName("printed, report.html gives A4 pages with each section's saw sheets on a page of their own")
    void printsOnA4WithEverySectionsSawSheetsOnANewPage(@TempDir Path dir) throws Exception {
        HeadlessChromium chromium = chromiumOrSkip(dir);
        // one short pattern per section: without the page breaks all of it would fit on three pages or so. The kit
        // is cut down to the pieces of each section's first pattern, so that the plan is valid for it.
        Kit kit = ReportFixtures.firstPatternsOnly(ReportFixtures.sampleKit());
        CutPlan plan = new CutPlan(kit.usedSections().stream()
                .map(section -> ReportFixtures.firstFitDecreasing(kit, section)).toList());
        kitwright.validate.CutPlanValidator.validate(kit, plan);
        assertThat(plan.sections()).allSatisfy(s -> assertThat(s.patterns()).hasSize(1));
        Path page = ReportWriter.writeInto(ReportModel.of(kit, plan, LocalDate.of(2025, 3, 14)), dir);
        Path pdf = dir.resolve("report.pdf");
        chromium.printToPdf(page, pdf);
        String raw = new String(java.nio.file.Files.readAllBytes(pdf), java.nio.charset.StandardCharsets.ISO_8859_1);
        long pages = Pattern.compile("/Type\\s*/Page\\b").matcher(raw).results().count();
        // summary and purchase order, then at least one page per section's saw sheets, cautions, inputs
        assertThat(pages).isGreaterThanOrEqualTo(1 + plan.sections().size() + 2);
        // A4 is 210 x 297 mm = 595.3 x 841.9 pt (ISO 216)
        Matcher box = Pattern.compile("/MediaBox\\s*\\[\\s*0\\s+0\\s+([0-9.]+)\\s+([0-9.]+)").matcher(raw);
        assertThat(box.find()).isTrue();
        assertThat(Double.parseDouble(box.group(1))).isCloseTo(595.3, org.assertj.core.data.Offset.offset(1.0));
        assertThat(Double.parseDouble(box.group(2))).isCloseTo(841.9, org.assertj.core.data.Offset.offset(1.0));
    }

    @Test
    @DisplayName("printed, every page of the saw sheets names the section it shows, continuation pages too")
    void everyPrintedSawSheetPageNamesItsSection(@TempDir Path dir) throws Exception {
        HeadlessChromium chromium = chromiumOrSkip(dir);
        Path pdftotext = kitwright.testing.ExternalTool.require("/usr/bin/pdftotext", "poppler-utils");
        Path out = dir.resolve("cinema-12");
        CliRun run = CliRun.of("plan", "sample-kits/cinema-12", "--out", out.toString(), "--date", "2026-12-01");
        assertThat(run.exitCode()).as(run.err()).isZero();
        Path pdf = dir.resolve("report.pdf");
        chromium.printToPdf(out.resolve("report.html"), pdf);
        Process p = new ProcessBuilder(pdftotext.toString(), "-layout", pdf.toString(), "-")
                .redirectErrorStream(true).start();
        String text = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertThat(p.waitFor()).isZero();
        List<String> sections = KitReader.read(Path.of("sample-kits", "cinema-12")).bars().stream()
                .map(Bar::section).distinct().toList();
        int sawPages = 0;
        int continuations = 0;
        for (String page : text.split("\f")) {
            if (!page.matches("(?s).*\\bPattern \\d+.*")) {
                continue;
            }
            sawPages++;
            String head = page.strip().lines().findFirst().orElse("");
            assertThat(head).as("first line of a saw-sheet page").contains("saw sheet");
            assertThat(sections.stream().filter(head::contains)).as(head).hasSize(1);
            String section = sections.stream().filter(head::contains).findFirst().orElseThrow();
            if (!page.contains("Saw sheet \u00B7 " + section)) {
                continuations++;
            }
            for (String line : page.lines().filter(l -> l.matches("\\s*Pattern \\d+.*")).toList()) {
                assertThat(line).as("pattern heading on the page of " + section).contains(section);
            }
        }
        assertThat(sawPages).as("pages with patterns").isGreaterThanOrEqualTo(sections.size());
        // cinema-12 printed on A4: two sections run onto a second page (measured with Chromium 156)
        assertThat(continuations).as("continuation pages").isPositive();
    }
}
