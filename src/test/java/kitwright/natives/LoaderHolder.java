package kitwright.natives;

import java.io.IOException;

/**
 * A stand-in for a program that uses OR-Tools' own Loader (kitwright before its cache, or any other tool): loads the
 * natives the Loader's way, into {@code java.io.tmpdir}, says "loaded", then waits for standard input to close.
 * Run as a separate process by {@link TemporaryFilesTest}, which keeps it alive or kills it.
 */
public final class LoaderHolder {
    private LoaderHolder() {
    }

    public static void main(String[] args) throws IOException {
        com.google.ortools.Loader.loadNativeLibraries(); // on purpose: this class makes the Loader's folder
        System.out.println("loaded");
        System.out.flush();
        while (System.in.read() >= 0) {
            // wait
        }
    }
}
