package kitwright.natives;

import static org.assertj.core.api.Assertions.assertThat;

import com.sun.jna.Platform;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The loader picks the native libraries by os.name and os.arch. The property values are those the JVMs report
 * (OpenJDK's os.name "Linux", "Mac OS X", "Windows 10"/"Windows 11"/"Windows Server 2022"; os.arch "amd64" on
 * Linux and Windows, "x86_64" and "aarch64" on macOS, "aarch64" on Linux; from memory of OpenJDK's
 * java_props_md.c), mapped to OR-Tools' folder names (JNA resource prefixes, as in the ortools-<platform> jars).
 */
class NativePlatformTest {

    @ParameterizedTest
    @CsvSource({
        "Linux, amd64, linux-x86-64",
        "Linux, aarch64, linux-aarch64",
        "Mac OS X, x86_64, darwin-x86-64",
        "Mac OS X, aarch64, darwin-aarch64",
        "Windows 10, amd64, win32-x86-64",
        "Windows 11, amd64, win32-x86-64",
        "Windows Server 2022, amd64, win32-x86-64",
    })
    void everyCarriedPlatformIsPickedByItsOsNameAndArch(String osName, String osArch, String platform) {
        assertThat(NativePlatform.of(osName, osArch)).contains(platform);
    }

    @ParameterizedTest
    @CsvSource({"Linux, x86", "Linux, ppc64le", "Linux, s390x", "Windows 10, aarch64", "FreeBSD, amd64",
        "SunOS, sparcv9"})
    void platformsWithoutLibrariesAreNamedNotGuessed(String osName, String osArch) {
        assertThat(NativePlatform.of(osName, osArch)).isEmpty();
    }

    @Test
    void onThisMachineTheChoiceIsJnasAsOrToolsOwnLoaderMakesIt() throws Exception {
        assertThat(NativePlatform.current()).isEqualTo(Platform.RESOURCE_PREFIX);
    }
}
