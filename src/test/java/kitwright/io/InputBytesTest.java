package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * Why a file cannot be read, in words. Mode 000 does not stop root, so the permission case is checked through the
 * exception the JDK throws for EACCES ({@link AccessDeniedException}), and the symbolic link loop through the reason
 * Linux gives for ELOOP; the broken-input corpus holds a real loop (bars-symlink-loop).
 */
class InputBytesTest {

    @Test
    void permissionDeniedAndLinkLoopsAreSaidSo() {
        assertThat(InputBytes.reason(new AccessDeniedException("/kit/bars.csv"))).startsWith("permission denied");
        assertThat(InputBytes.reason(new FileSystemException("/kit/bars.csv", null,
                "Too many levels of symbolic links or unable to access attributes of symbolic link")))
                .startsWith("a symbolic link loop");
        assertThat(InputBytes.reason(new FileSystemException("/kit/bars.csv", null, "Is a directory")))
                .startsWith("this is a folder");
    }

    @Test
    void zeroBytesAndAByteOrderMarkInsideAreFoundOnTheirLine() {
        Path file = Path.of("bars.csv");
        byte[] utf16 = "mark\n".getBytes(StandardCharsets.UTF_16LE);
        byte[] joined = "a\nb\n\uFEFFc\n".getBytes(StandardCharsets.UTF_8);
        byte[] leading = "\uFEFFa\nb\n".getBytes(StandardCharsets.UTF_8);

        assertThat(InputBytes.textProblem(file, utf16, "UTF-8")).get().extracting(Problem::line).isEqualTo(1);
        assertThat(InputBytes.textProblem(file, joined, "UTF-8")).get().extracting(Problem::line).isEqualTo(3);
        assertThat(InputBytes.textProblem(file, leading, "UTF-8")).isEmpty();
    }
}
