package org.tankwright.ui.files;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * The folder where autosaved copies of unsaved designs wait: one file per open design, named by
 * a key that stays the same while the design is open, removed when the design is saved or
 * closed cleanly. Files left there at start-up are what a crash left behind.
 */
public final class RecoveryFolder {

    private static final String SUFFIX = ".recovered.json";
    private final Path folder;

    public RecoveryFolder(Path folder) {
        this.folder = folder;
    }

    public Path folder() {
        return folder;
    }

    /** Where the autosaved copy of the design known by {@code key} goes. */
    public Path fileFor(String key) {
        String safe = key.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9._-]+", "-");
        return folder.resolve(safe + SUFFIX);
    }

    /** Removes the copy of {@code key} (after a save or a clean close). */
    public void discard(String key) {
        try {
            Files.deleteIfExists(fileFor(key));
            Files.deleteIfExists(fileFor(key).resolveSibling(fileFor(key).getFileName() + ".bak"));
        } catch (IOException e) {
            System.err.println("tankwright: could not remove recovery copy " + fileFor(key) + ": " + e.getMessage());
        }
    }

    /** Copies left by an earlier session, newest first. */
    public List<Path> leftovers() {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(folder)) {
            List<Path> out = new ArrayList<>(s.filter(p -> p.getFileName().toString().endsWith(SUFFIX)).toList());
            out.sort(Comparator.comparing(RecoveryFolder::modified).reversed());
            return out;
        } catch (IOException e) {
            return List.of();
        }
    }

    private static long modified(Path p) {
        try {
            return Files.getLastModifiedTime(p).toMillis();
        } catch (IOException e) {
            return 0;
        }
    }
}
