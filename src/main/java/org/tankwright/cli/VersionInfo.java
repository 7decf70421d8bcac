package org.tankwright.cli;

import picocli.CommandLine;

/** The version printed by {@code --version}: the jar's Implementation-Version, or "dev" when run from classes. */
public final class VersionInfo implements CommandLine.IVersionProvider {
    /** The tool's version string. */
    public static String version() {
        String v = Main.class.getPackage().getImplementationVersion();
        return v == null ? "dev" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"tankwright " + version(), "Java " + System.getProperty("java.version")};
    }
}
