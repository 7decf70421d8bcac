package org.tankwright.design;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.List;

/**
 * Loading and saving design files. The format is named {@value #FORMAT}; its version is
 * {@value #VERSION}. Older versions are migrated one step at a time; newer ones are refused.
 * Saving is atomic: the text goes to a temporary file in the same folder, the old file is kept
 * as {@code NAME.bak}, and the temporary file is moved over the target.
 */
public final class DesignFiles {
    /** The format name written in every design file. */
    public static final String FORMAT = "tankwright-design";
    /** The current format version. */
    public static final int VERSION = 2;

    private static final Gson PRETTY = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create();

    private DesignFiles() {
    }

    /** Reads and validates a design file; every problem is reported at once. */
    public static Design load(Path file) throws DesignException, IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        return parse(text, file.toString());
    }

    /** Reads a design bundled as a classpath resource (the presets inside the jar). */
    public static Design loadResource(String resource) throws DesignException, IOException {
        try (InputStream in = DesignFiles.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IOException("no bundled design " + resource);
            }
            return parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), resource);
        }
    }

    /** Parses and validates design JSON; {@code source} names it in messages. */
    public static Design parse(String text, String source) throws DesignException {
        JsonElement root;
        try {
            root = JsonParser.parseString(text);
        } catch (JsonParseException e) {
            String msg = e.getCause() != null ? e.getCause().getMessage() : e.getMessage();
            throw new DesignException(source + " is not valid JSON", List.of(new Problem("$", "", msg)));
        }
        if (root == null || !root.isJsonObject()) {
            throw new DesignException(source + " is not a design file",
                    List.of(new Problem("$", "", "the file must hold one JSON object")));
        }
        JsonObject obj = root.getAsJsonObject().deepCopy();
        JsonElement format = obj.remove("format");
        JsonElement version = obj.remove("version");
        if (format == null || !format.isJsonPrimitive() || !FORMAT.equals(format.getAsString())) {
            throw new DesignException(source + " is not a design file",
                    List.of(new Problem("$.format", format == null ? "" : format.toString(),
                            "must be \"" + FORMAT + "\"")));
        }
        int v;
        try {
            v = version.getAsInt();
        } catch (RuntimeException e) {
            throw new DesignException(source + " has no format version",
                    List.of(new Problem("$.version", version == null ? "" : version.toString(),
                            "must be a whole number from 1 to " + VERSION)));
        }
        if (v > VERSION) {
            throw new DesignException(source + " was written by a newer Tankwright",
                    List.of(new Problem("$.version", String.valueOf(v), "this Tankwright reads versions 1 to " + VERSION
                            + "; open the file with a newer Tankwright")));
        }
        if (v < 1) {
            throw new DesignException(source + " has an unknown format version",
                    List.of(new Problem("$.version", String.valueOf(v), "must be from 1 to " + VERSION)));
        }
        Migrations.upgrade(obj, v);
        Problems p = new Problems();
        Design d = RecordCodec.read(Design.class, obj, "$", p);
        if (!p.isEmpty()) {
            throw new DesignException(source + " has " + p.list().size() + " problem"
                    + (p.list().size() == 1 ? "" : "s"), p.list());
        }
        return d;
    }

    /** The design as the text of a current-version file. */
    public static String toJson(Design d) {
        JsonObject o = new JsonObject();
        o.add("format", new JsonPrimitive(FORMAT));
        o.add("version", new JsonPrimitive(VERSION));
        RecordCodec.write(d).entrySet().forEach(e -> o.add(e.getKey(), e.getValue()));
        return PRETTY.toJson(o) + "\n";
    }

    /** Saves atomically, keeping the previous file as {@code NAME.bak}. */
    public static void save(Design d, Path file) throws IOException {
        String text = toJson(d);
        writeAtomically(file, out -> {
            Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
            w.write(text);
            w.flush();
        });
    }

    /**
     * Writes what {@code body} produces to {@code file} atomically, keeping the previous file as
     * {@code NAME.bak}; on any failure the old file is untouched.
     */
    public static void writeAtomically(Path file, Body body) throws IOException {
        write(file, body, true);
    }

    /**
     * Writes what {@code body} produces to {@code file} atomically, without a backup (exports and
     * recovery copies); on any failure the old file is untouched.
     */
    public static void replaceAtomically(Path file, Body body) throws IOException {
        write(file, body, false);
    }

    /** Writes text as UTF-8, atomically and without a backup. */
    public static void replaceAtomically(Path file, String text) throws IOException {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        replaceAtomically(file, out -> out.write(bytes));
    }

    private static void write(Path file, Body body, boolean backup) throws IOException {
        Path abs = file.toAbsolutePath();
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream out = Channels.newOutputStream(ch)) {
                body.write(out);
                out.flush();
                ch.force(true);
            }
            keepPermissions(tmp, abs);
            if (backup && Files.exists(abs)) {
                Files.copy(abs, backupOf(abs), StandardCopyOption.REPLACE_EXISTING);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * A temporary file is created readable by its owner only; the saved file gets the old file's
     * permissions, or rw-r--r-- for a new one, where the file system has POSIX permissions.
     */
    private static void keepPermissions(Path tmp, Path target) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            return;
        }
        Files.setPosixFilePermissions(tmp, Files.exists(target) ? Files.getPosixFilePermissions(target)
                : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
    }

    /** Where the previous version of a saved file is kept. */
    public static Path backupOf(Path file) {
        return file.resolveSibling(file.getFileName() + ".bak");
    }

    /** Produces the bytes of a file being written. */
    @FunctionalInterface
    public interface Body {
        void write(OutputStream out) throws IOException;
    }
}
