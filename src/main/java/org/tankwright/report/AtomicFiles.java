package org.tankwright.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

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
            readableByAll(tmp, target);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * A temporary file is created readable by its owner only; an export is an ordinary document, so it gets
     * the target's old permissions, or rw-r--r-- for a new file, where the file system has POSIX permissions.
     */
    private static void readableByAll(Path tmp, Path target) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target) ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    static void writeText(Path target, String text) throws IOException {
        write(target, tmp -> Files.writeString(tmp, text, StandardCharsets.UTF_8));
    }
}
