package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import kitwright.cli.CliRun;
import kitwright.io.KitReader;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.cutting.CutListCsv;
import kitwright.report.labels.CodeLine;
import kitwright.report.labels.LabelsHtml;
import kitwright.validate.CsvOutput;
import kitwright.testing.ExternalTool;
import kitwright.validate.PlanValidator;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The label sheets as the saw floor gets them: {@code labels.html} of a real plan printed to PDF by Chromium,
 * rasterised by poppler's pdftoppm, and every QR code read back from the printed pages by an independent decoder,
 * zbarimg (the ZBar bar code reader, Debian package zbar-tools), not by the ZXing library that drew them. The codes
 * must be exactly one per cut-list.csv row that is not scrap: each cut and spare piece, each remnant.
 *
 * <p>Skipped where a tool is missing, unless CI is "true": then it fails ({@code .ci/run} installs them).
 */
class LabelsPrintTest {
    private static final String KIT = "sample-kits/alu-kiosk";
    private static final String DATE = "2026-12-03";


    private static String run(Path dir, String... command) throws IOException, InterruptedException {
        Path log = dir.resolve("tool-" + Path.of(command[0]).getFileName() + ".out");
        Process p = new ProcessBuilder(command).redirectErrorStream(false).redirectOutput(log.toFile())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(180, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail(command[0] + " did not finish in 180 s");
        }
        return Files.readString(log, StandardCharsets.UTF_8);
    }

    private static List<CSVRecord> rows(Path csv) throws IOException {
        return CsvOutput.records(Files.readString(csv));
    }

    private static String number(String text) {
        return text.isEmpty() ? "" : new BigDecimal(text).stripTrailingZeros().toPlainString();
    }

    /**
     * Each printed page cut into its 3 x 8 label cells (70 x 37 mm from the top left, as labels.html lays them out),
     * one image per cell that holds any ink: ZBar reads one code per image reliably, while on a whole page of 24
     * it misses a few. Cutting along the label grid also checks that no code straddles two labels.
     */
    private static List<String> labelCells(List<String> pages, Path dir) throws IOException {
        List<String> cells = new ArrayList<>();
        for (String page : pages) {
            BufferedImage image = ImageIO.read(new File(page));
            double pxPerMm = image.getWidth() / 210.0;
            for (int row = 0; row < 8; row++) {
                for (int column = 0; column < 3; column++) {
                    int x = (int) Math.round(column * 70 * pxPerMm);
                    int y = (int) Math.round((0.5 + row * 37) * pxPerMm);
                    int w = Math.min(image.getWidth() - x, (int) Math.round(70 * pxPerMm));
                    int h = Math.min(image.getHeight() - y, (int) Math.round(37 * pxPerMm));
                    BufferedImage cell = image.getSubimage(x, y, w, h);
                    if (inked(cell)) {
                        File file = dir.resolve("cell-" + cells.size() + ".png").toFile();
                        ImageIO.write(cell, "png", file);
                        cells.add(file.toString());
                    }
                }
            }
        }
        return cells;
    }

    private static boolean inked(BufferedImage image) {
        for (int y = 0; y < image.getHeight(); y += 2) {
            for (int x = 0; x < image.getWidth(); x += 2) {
                if ((image.getRGB(x, y) & 0xFF) < 128) {
                    return true;
                }
            }
        }
        return false;
    }

    @Test
    @DisplayName("every QR code on the printed label sheets, read back by zbarimg, is one not-scrap cut-list row")
    void everyPrintedCodeIsACutListRow(@TempDir Path dir) throws Exception {
        HeadlessChromium chromium = HeadlessChromium.find(dir).orElse(null);
        if (chromium == null) {
            ExternalTool.require("/usr/bin/chromium", "chromium");
            fail("chromium is installed but could not be started");
        }
        Path pdftoppm = ExternalTool.require("/usr/bin/pdftoppm", "poppler-utils");
        Path zbarimg = ExternalTool.require("/usr/bin/zbarimg", "zbar-tools");
        Path out = dir.resolve("plan");
        CliRun plan = CliRun.of("plan", KIT, "--out", out.toString(), "--date", DATE);
        assertThat(plan.exitCode()).as(plan.err()).isZero();
        // the plan behind the labels, validated first; the files read below are that plan's files
        PlanResult result = Planner.run(KitReader.read(Path.of(KIT)), Planner.Options.DEFAULT, PlanProgress.NONE);
        PlanValidator.validate(result);
        assertThat(Files.readString(out.resolve("cut-list.csv")))
                .isEqualTo(CutListCsv.format(result.kit(), result.cutting()));

        Path pdf = dir.resolve("labels.pdf");
        chromium.printToPdf(out.resolve(LabelsHtml.FILE), pdf);
        run(dir, pdftoppm.toString(), "-r", "150", "-png", pdf.toString(), dir.resolve("sheet").toString());
        List<String> pages;
        try (Stream<Path> files = Files.list(dir)) {
            pages = files.map(Path::toString).filter(f -> f.matches(".*/sheet-\\d+\\.png")).sorted().toList();
        }
        List<String> command = new ArrayList<>(List.of(zbarimg.toString(), "-q", "--raw", "-Sdisable",
                "-Sqrcode.enable"));
        command.addAll(labelCells(pages, dir));
        List<String> decoded = run(dir, command.toArray(String[]::new)).lines().filter(l -> !l.isBlank()).toList();

        List<CSVRecord> cutList = rows(out.resolve("cut-list.csv"));
        List<CSVRecord> notScrap = cutList.stream().filter(r -> !"scrap".equals(r.get("kind"))).toList();
        assertThat(pages).as("A4 sheets of 24 labels").hasSize((notScrap.size() + 23) / 24);
        assertThat(decoded).as("one code per not-scrap cut-list row").hasSize(notScrap.size());

        // what each row says, in the code's fields; bundle and crate are checked against nests and packing lists
        List<String> expected = new ArrayList<>();
        Map<String, Integer> pieceOfMark = new HashMap<>();
        for (CSVRecord r : notScrap) {
            if ("remnant".equals(r.get("kind"))) {
                expected.add(String.join("|", "remnant", r.get("section"), number(r.get("length_mm")), DATE,
                        result.kit().name()));
            } else {
                int piece = pieceOfMark.merge(r.get("mark"), 1, Integer::sum);
                expected.add(String.join("|", r.get("kind"), r.get("mark"), r.get("section"),
                        number(r.get("length_mm")), number(r.get("tolerance_mm")), String.valueOf(piece)));
            }
        }
        List<String> read = new ArrayList<>();
        Map<String, Integer> labelsInBundle = new HashMap<>();
        Map<String, String> crateOfBundle = new HashMap<>();
        for (String code : decoded) {
            List<String> f = CodeLine.split(code);
            if ("remnant".equals(f.get(0))) {
                assertThat(f).as(code).hasSize(5);
                read.add(String.join("|", f.get(0), f.get(1), number(f.get(2)), f.get(3), f.get(4)));
            } else {
                assertThat(f).as(code).hasSize(8);
                read.add(String.join("|", f.get(0), f.get(1), f.get(2), number(f.get(3)), number(f.get(4)),
                        f.get(5)));
                labelsInBundle.merge(f.get(6) + "|" + f.get(1), 1, Integer::sum);
                crateOfBundle.put(f.get(6), f.get(7));
            }
        }
        assertThat(read).containsExactlyInAnyOrderElementsOf(expected);

        Map<String, Integer> tubesInBundle = new HashMap<>();
        rows(out.resolve("nests.csv")).forEach(r -> tubesInBundle.merge(r.get("bundle") + "|" + r.get("mark"), 1,
                Integer::sum));
        assertThat(labelsInBundle).as("labels per bundle and mark = tubes per bundle and mark in nests.csv")
                .isEqualTo(tubesInBundle);
        Map<String, String> crateInLists = new HashMap<>();
        rows(out.resolve("packing-lists.csv")).forEach(r -> List.of(r.get("bundle_ids").split(" "))
                .forEach(b -> crateInLists.put(b, r.get("crate"))));
        crateOfBundle.forEach((bundle, crate) -> assertThat(crate).as("crate of bundle " + bundle)
                .isEqualTo(crateInLists.get(bundle)));
    }
}
