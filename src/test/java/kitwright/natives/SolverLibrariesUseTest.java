package kitwright.natives;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** OR-Tools' Loader unpacks into the temporary folder on every run: only SolverLibraries may load the natives. */
class SolverLibrariesUseTest {
    @Test
    @DisplayName("No production class calls com.google.ortools.Loader; they call SolverLibraries.load()")
    void noLoaderCalls() throws IOException {
        List<String> offenders;
        try (Stream<Path> files = Files.walk(Path.of("src/main/java"))) {
            offenders = files.filter(f -> f.toString().endsWith(".java"))
                    .filter(f -> !f.endsWith(Path.of("kitwright/natives/SolverLibraries.java")))
                    .filter(f -> read(f).contains("Loader.loadNativeLibraries")
                            || read(f).contains("import com.google.ortools.Loader;"))
                    .map(Path::toString).sorted().toList();
        }
        assertThat(offenders).isEmpty();
    }

    @Test
    @DisplayName("Loading twice is harmless, and the solver classes work afterwards")
    void loadsOnce() {
        SolverLibraries.load();
        SolverLibraries.load();
        var solver = com.google.ortools.linearsolver.MPSolver.createSolver("GLOP");
        assertThat(solver).isNotNull();
    }

    private static String read(Path f) {
        try {
            return Files.readString(f);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
