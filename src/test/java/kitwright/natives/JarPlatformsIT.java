package kitwright.natives;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.junit.jupiter.api.Test;

/**
 * The built jar ({@code target/kitwright.jar}, after {@code package}) carries the OR-Tools native libraries of every
 * platform it claims ({@link NativePlatform#SUPPORTED}), each platform's JNI library beside the libraries it needs,
 * and runs from the command line.
 */
class JarPlatformsIT {
    private static final Path JAR = Path.of("target", "kitwright.jar");

    @Test
    void theJarHoldsTheLibrariesOfEveryPlatformItClaims() throws Exception {
        assertThat(JAR).exists();
        try (ZipFile zip = new ZipFile(JAR.toFile())) {
            for (String platform : NativePlatform.SUPPORTED) {
                String folder = "ortools-" + platform + "/";
                ZipEntry jni = zip.getEntry(folder + NativePlatform.jniLibrary(platform));
                assertThat(jni).as("%s in the jar", folder + NativePlatform.jniLibrary(platform)).isNotNull();
                assertThat(jni.getSize()).as("size of the JNI library for " + platform).isGreaterThan(100_000);
                long files = zip.stream().filter(e -> !e.isDirectory() && e.getName().startsWith(folder)).count();
                assertThat(files).as("native files for " + platform).isGreaterThan(1);
            }
            List<String> others = zip.stream().map(ZipEntry::getName)
                    .filter(n -> n.startsWith("ortools-") && n.indexOf('/') > 0)
                    .map(n -> n.substring("ortools-".length(), n.indexOf('/'))).distinct().toList();
            assertThat(others).as("no platform folder the loader does not know")
                    .containsExactlyInAnyOrderElementsOf(NativePlatform.SUPPORTED);
        }
    }

    @Test
    void theJarLoadsTheSolverAndCutsASampleKit() throws Exception {
        Path log = Files.createTempFile("kitwright-jar", ".log");
        try {
            Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-jar", JAR.toString(), "cut", "sample-kits/alu-kiosk").redirectErrorStream(true)
                    .redirectOutput(log.toFile()).start();
            assertThat(p.waitFor(120, TimeUnit.SECONDS)).as("finished").isTrue();
            assertThat(p.exitValue()).as(Files.readString(log)).isZero();
            assertThat(Files.readString(log)).contains("alu-kiosk").contains("OPTIMAL");
        } finally {
            Files.deleteIfExists(log);
        }
    }
}
