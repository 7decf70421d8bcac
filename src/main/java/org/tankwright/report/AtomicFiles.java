package org.tankwright.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Every export is written atomically: to a temporary file in the target's folder, then moved over the target. */
final class AtomicFiles {
    /** Writes a file's content to the path it is given. */
    interface Writer {
        void to(Path file) throws IOException;
    }

    private AtomicFiles() {
    }

    static void write(Path target, Writer writer) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, ".export", ".tmp");
        try {
            writer.to(tmp);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    static void writeText(Path target, String text) throws IOException {
        write(target, tmp -> Files.writeString(tmp, text, StandardCharsets.UTF_8));
    }
}
