package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's commands as a user types them: {@code kitwright ...} through the launcher of src/main/launcher,
 * linked from a folder on the PATH as the README says, after {@code package} built the jar.
 */
class LauncherIT {
    private static final Path LAUNCHER = Path.of("src", "main", "launcher", "kitwright");

    private static String run(Path dir, String... command) throws Exception {
        Path log = dir.resolve("launcher.log");
        Process p = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(log.toFile()).start();
        assertThat(p.waitFor(120, TimeUnit.SECONDS)).isTrue();
        String out = Files.readString(log);
        assertThat(p.exitValue()).as(out).isZero();
        return out;
    }

    @Test
    void aLinkOnThePathRunsTheBuiltJarFromAnyFolder(@TempDir Path dir) throws Exception {
        assertThat(Files.isExecutable(LAUNCHER)).as("the launcher is executable").isTrue();
        Path bin = Files.createDirectories(dir.resolve("bin"));
        Files.createSymbolicLink(bin.resolve("kitwright"), LAUNCHER.toAbsolutePath());
        String version = run(dir, bin.resolve("kitwright").toString(), "--version");
        assertThat(version).startsWith("kitwright ");
        String check = run(dir, bin.resolve("kitwright").toString(), "check",
                Path.of("sample-kits", "alu-kiosk").toAbsolutePath().toString());
        assertThat(check).contains("alu-kiosk");
    }

    @Test
    void theWindowsLauncherNamesTheSameJar() throws Exception {
        String cmd = Files.readString(LAUNCHER.resolveSibling("kitwright.cmd"));
        assertThat(cmd).contains("%~dp0..\\..\\..\\target\\kitwright.jar").contains("%*").contains("\r\n");
    }
}
