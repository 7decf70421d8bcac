package org.tankwright.cli;

import org.tankwright.design.Design;
import org.tankwright.design.DesignException;
import org.tankwright.design.DesignFiles;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Loads the design file a command was given, turning every failure into a user error with exit status 3. */
public final class DesignArgs {
    private DesignArgs() {
    }

    /** Loads and validates {@code file}. */
    public static Design load(Path file) {
        if (!Files.exists(file)) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, file + ": no such file");
        }
        try {
            return DesignFiles.load(file);
        } catch (DesignException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, e.getMessage());
        } catch (IOException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, file + ": cannot be read: " + e.getMessage());
        }
    }
}
