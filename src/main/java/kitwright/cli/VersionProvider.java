package kitwright.cli;

import picocli.CommandLine;

/** Version from the jar manifest (Implementation-Version), or "development" when run from classes. */
public final class VersionProvider implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        String v = KitwrightCommand.class.getPackage().getImplementationVersion();
        return new String[] {"kitwright " + (v == null ? "development" : v)};
    }
}
