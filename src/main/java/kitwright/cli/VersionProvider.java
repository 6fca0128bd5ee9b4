package kitwright.cli;

import kitwright.io.KitwrightVersion;
import picocli.CommandLine;

/** Version from the jar manifest (Implementation-Version), or "development" when run from classes. */
public final class VersionProvider implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {"kitwright " + KitwrightVersion.current()};
    }
}
