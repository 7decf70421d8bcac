package org.tankwright.cli;

import org.tankwright.report.Version;
import picocli.CommandLine;

/** What {@code --version} prints: the program's {@link Version} and the Java it runs on. */
public final class VersionInfo implements CommandLine.IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {"tankwright " + Version.get(), "Java " + System.getProperty("java.version")};
    }
}
