package kitwright.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * Runs Debian's headless Chromium on a local file for the browser tests: no sandbox (CI runs as root), GPU, QUIC,
 * sync, component updates and background networking off, and a fresh profile folder per run, so nothing is
 * fetched and nothing is kept between runs.
 */
final class HeadlessChromium {
    private static final List<String> CANDIDATES = List.of("/usr/bin/chromium", "/usr/bin/chromium-browser");
    private static final long TIMEOUT_SECONDS = 90;

    private final Path executable;
    private final Path workDir;

    private HeadlessChromium(Path executable, Path workDir) {
        this.executable = executable;
        this.workDir = workDir;
    }

    /**
     * Chromium when it is installed (Debian's path first, then the PATH; the system property
     * {@code kitwright.chromium} names another), with {@code workDir} for its files.
     */
    static Optional<HeadlessChromium> find(Path workDir) {
        String chosen = System.getProperty("kitwright.chromium");
        if (chosen != null) {
            return Optional.of(Path.of(chosen)).filter(Files::isExecutable).map(p -> new HeadlessChromium(p, workDir));
        }
        List<Path> candidates = new ArrayList<>(CANDIDATES.stream().map(Path::of).toList());
        String path = System.getenv("PATH");
        if (path != null) {
            for (String dir : path.split(java.io.File.pathSeparator)) {
                if (!dir.isEmpty()) {
                    candidates.add(Path.of(dir, "chromium"));
                }
            }
        }
        return candidates.stream().filter(Files::isExecutable).findFirst()
                .map(p -> new HeadlessChromium(p, workDir));
    }

    /** Saves a PNG screenshot of the page at the given window size. */
    void screenshot(Path page, Path png, int width, int height) throws IOException, InterruptedException {
        screenshot(page, png, width, height, 1.0);
    }

    /** Saves a PNG screenshot; the image is {@code scale} times the window size. */
    void screenshot(Path page, Path png, int width, int height, double scale)
            throws IOException, InterruptedException {
        run(page, List.of("--hide-scrollbars", "--screenshot=" + png.toAbsolutePath(),
                "--window-size=" + width + "," + height, "--force-device-scale-factor=" + scale));
        if (!Files.isRegularFile(png)) {
            throw new IOException("chromium wrote no screenshot; see " + workDir.resolve("chromium.log"));
        }
    }

    /** Prints the page to PDF with the page's own print stylesheet (no browser header or footer). */
    void printToPdf(Path page, Path pdf) throws IOException, InterruptedException {
        run(page, List.of("--no-pdf-header-footer", "--print-to-pdf=" + pdf.toAbsolutePath()));
        if (!Files.isRegularFile(pdf)) {
            throw new IOException("chromium wrote no PDF; see " + workDir.resolve("chromium.log"));
        }
    }

    /** The DOM after the page has loaded, serialized by the browser. */
    String dumpDom(Path page) throws IOException, InterruptedException {
        return run(page, List.of("--dump-dom"));
    }

    private String run(Path page, List<String> options) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(workDir, "chromium-profile-");
        List<String> command = new ArrayList<>(List.of(executable.toString(), "--headless", "--no-sandbox",
                "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage",
                "--user-data-dir=" + profile.toAbsolutePath()));
        command.addAll(options);
        command.add(page.toAbsolutePath().toUri().toString());
        Path stdout = workDir.resolve("chromium.out");
        Process process = new ProcessBuilder(command).redirectOutput(stdout.toFile())
                .redirectError(ProcessBuilder.Redirect.appendTo(workDir.resolve("chromium.log").toFile())).start();
        if (!process.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new IOException("chromium did not finish in " + TIMEOUT_SECONDS + " s");
        }
        if (process.exitValue() != 0) {
            throw new IOException("chromium exited with " + process.exitValue() + ": "
                    + Files.readString(workDir.resolve("chromium.log"), StandardCharsets.UTF_8));
        }
        return Files.readString(stdout, StandardCharsets.UTF_8);
    }
}
