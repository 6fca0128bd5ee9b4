package kitwright.natives;

import java.io.IOException;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The platforms kitwright's jar carries OR-Tools native libraries for, and which one a JVM runs on. OR-Tools
 * publishes one jar of native libraries per platform ({@code ortools-<platform>}), its files in the folder
 * {@code ortools-<platform>/}; the platform name is JNA's resource prefix, which OR-Tools' own loader uses
 * ({@code com.sun.jna.Platform.RESOURCE_PREFIX}). This class derives the same name from {@code os.name} and
 * {@code os.arch}, so that the choice can be tested for every platform on any machine:
 * <pre>
 *   os.name starts with "Windows"      -&gt; win32,   "Mac" or "Darwin" -&gt; darwin,   "Linux" -&gt; linux
 *   os.arch x86_64 or amd64            -&gt; x86-64,  aarch64 or arm64      -&gt; aarch64
 * </pre>
 */
public final class NativePlatform {
    /** The platforms of the OR-Tools version kitwright is built with, as its jar carries them. */
    public static final List<String> SUPPORTED = List.of("linux-x86-64", "linux-aarch64", "darwin-x86-64",
            "darwin-aarch64", "win32-x86-64");

    private NativePlatform() {
    }

    /** The platform of {@code osName}/{@code osArch}, if the jar carries libraries for it. */
    public static Optional<String> of(String osName, String osArch) {
        String name = osName.toLowerCase(Locale.ROOT);
        String arch = osArch.toLowerCase(Locale.ROOT);
        String os = name.startsWith("windows") ? "win32"
                : name.startsWith("mac") || name.startsWith("darwin") ? "darwin"
                : name.startsWith("linux") ? "linux" : null;
        String cpu = arch.equals("x86_64") || arch.equals("amd64") || arch.equals("x86-64") ? "x86-64"
                : arch.equals("aarch64") || arch.equals("arm64") ? "aarch64" : null;
        if (os == null || cpu == null) {
            return Optional.empty();
        }
        String platform = os + "-" + cpu;
        return SUPPORTED.contains(platform) ? Optional.of(platform) : Optional.empty();
    }

    /** The platform this JVM runs on; a clear message when the jar carries no libraries for it. */
    public static String current() throws IOException {
        String osName = System.getProperty("os.name", "");
        String osArch = System.getProperty("os.arch", "");
        return of(osName, osArch).orElseThrow(() -> new IOException("kitwright's solver "
                + "libraries run on " + String.join(", ", SUPPORTED) + "; this machine is " + osName + " on "
                + osArch));
    }

    /** The name of the main JNI library file on a platform (the one loaded last). */
    public static String jniLibrary(String platform) {
        return platform.startsWith("win32") ? "jniortools.dll"
                : platform.startsWith("darwin") ? "libjniortools.dylib" : "libjniortools.so";
    }
}
