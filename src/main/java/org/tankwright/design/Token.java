package org.tankwright.design;

/** An enum value's spelling in the design file and on the command line. */
public interface Token {
    /** The spelling used in files; matched case-insensitively when read. */
    String token();

    /** The default spelling: the constant's name in lower case with hyphens. */
    static String of(Enum<?> e) {
        return e instanceof Token t ? t.token() : e.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
