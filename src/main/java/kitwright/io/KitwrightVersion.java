package kitwright.io;

/** The running kitwright's version: the jar manifest's Implementation-Version, "development" when run from classes. */
public final class KitwrightVersion {
    private KitwrightVersion() {
    }

    public static String current() {
        String v = KitwrightVersion.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }
}
