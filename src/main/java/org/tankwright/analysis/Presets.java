package org.tankwright.analysis;

import org.tankwright.design.Design;
import org.tankwright.design.DesignException;
import org.tankwright.design.DesignFiles;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** The designs bundled with the program (the {@code presets/} folder, also inside the jar). */
public final class Presets {
    /** The demo design opened when no file is given. */
    public static final String DEMO = "desk-lamp-pad";

    private Presets() {
    }

    /** Names of the bundled presets (file names without {@code .json}), in the order of {@code presets/index.txt}. */
    public static List<String> names() {
        try (InputStream in = Presets.class.getResourceAsStream("/presets/index.txt")) {
            if (in == null) {
                return List.of(DEMO);
            }
            List<String> out = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\\R")) {
                String s = line.strip();
                if (!s.isEmpty() && !s.startsWith("#")) {
                    out.add(s);
                }
            }
            return out;
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the preset index", e);
        }
    }

    /** Loads a bundled preset by name. */
    public static Design load(String name) throws DesignException, IOException {
        return DesignFiles.loadResource("/presets/" + name + ".json");
    }

    /** The demo design. */
    public static Design demo() {
        try {
            return load(DEMO);
        } catch (DesignException | IOException e) {
            throw new IllegalStateException("the bundled demo design is broken: " + e.getMessage(), e);
        }
    }
}
