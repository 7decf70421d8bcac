package org.tankwright.report;

/**
 * The program's version, for every face (the command line's {@code --version}, the window, the
 * sheet's footer): the jar's Implementation-Version, or "dev" when run from classes.
 */
public final class Version {
    private Version() {
    }

    /** The version string. */
    public static String get() {
        String v = Version.class.getPackage().getImplementationVersion();
        return v == null ? "dev" : v;
    }
}
