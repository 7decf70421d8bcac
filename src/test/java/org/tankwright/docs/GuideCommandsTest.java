package org.tankwright.docs;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.cli.Main;

import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every {@code ./tankwright ...} line in the code blocks of docs/guide.md and README.md runs as
 * written, in-process through {@link Main#run}: outputs go to a temporary folder, a window without
 * {@code --snapshot} is not opened, a snapshot only when a display exists — and in a child JVM,
 * because the window's docking framework allows one workbench per JVM and the window tests share
 * theirs. A line's comment may state another expected exit status ("exit status 5").
 */
class GuideCommandsTest {
    private static final Set<String> OUTPUT_OPTIONS = Set.of("-o", "--out", "--snapshot", "--csv", "--json", "--netlist");
    private static final Pattern STATUS = Pattern.compile("exit status (\\d)");

    @TempDir
    static Path out;

    /** One command line from a document. */
    record Line(String doc, int number, String text, List<String> args, int status) {
    }

    @TestFactory
    Stream<DynamicTest> everyCommandInTheGuideAndTheReadmeRuns() throws IOException {
        List<Line> lines = new ArrayList<>();
        lines.addAll(commands(Path.of("docs/guide.md")));
        lines.addAll(commands(Path.of("README.md")));
        assertTrue(lines.size() >= 20, "the guide and README hold their commands: " + lines.size());
        return lines.stream().map(l -> DynamicTest.dynamicTest(l.doc() + ":" + l.number() + " " + l.text(), () -> run(l)));
    }

    @Test
    void theGuideSaysWhichChecksExitWithADanger() throws IOException {
        List<Line> checks = commands(Path.of("docs/guide.md")).stream()
                .filter(l -> l.args().get(0).equals("check") && l.status() == 5).toList();
        assertTrue(checks.size() >= 2, "the mains-fed presets' checks are marked as exit status 5: " + checks);
    }

    private void run(Line l) throws IOException, InterruptedException {
        List<String> args = new ArrayList<>(l.args());
        boolean window = args.isEmpty() || args.get(0).equals("open");
        if (window && !args.contains("--snapshot")) {
            Assumptions.abort("SKIPPED: `" + l.text() + "` opens the window for a person; not run by the test");
        }
        if (window) {
            Assumptions.assumeFalse(GraphicsEnvironment.isHeadless(),
                    "SKIPPED: `" + l.text() + "` needs a display; run the tests under one (xvfb-run -a mvn test)");
        }
        Path dir = Files.createDirectories(out.resolve(l.doc() + "-" + l.number()));
        for (int i = 1; i < args.size(); i++) {
            String prev = args.get(i - 1);
            String a = args.get(i);
            if (OUTPUT_OPTIONS.contains(prev) && !a.startsWith("-") && !a.startsWith("presets/")) {
                args.set(i, dir.resolve(Path.of(a).getFileName()).toString());
            }
        }
        int status = window ? childJvm(args, dir.resolve("stdout.txt")) : inProcess(args, dir.resolve("stdout.txt"));
        assertEquals(l.status(), status, "`" + l.text() + "` (" + l.doc() + " line " + l.number() + ") exits with "
                + status + "; output: " + Files.readString(dir.resolve("stdout.txt")));
        for (int i = 1; i < args.size(); i++) {
            if (OUTPUT_OPTIONS.contains(args.get(i - 1)) && args.get(i).startsWith(dir.toString())) {
                assertTrue(Files.exists(Path.of(args.get(i))), "`" + l.text() + "` wrote " + l.args().get(i));
            }
        }
    }

    private static int inProcess(List<String> args, Path log) throws IOException {
        PrintStream stdout = System.out;
        try (PrintStream sink = new PrintStream(Files.newOutputStream(log), true, "UTF-8")) {
            System.setOut(sink);
            return Main.run(args.toArray(String[]::new));
        } finally {
            System.setOut(stdout);
        }
    }

    private static int childJvm(List<String> args, Path log) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), Main.class.getName()));
        cmd.addAll(args);
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            return -1;
        }
        return p.exitValue();
    }

    /** The command lines of the fenced code blocks of a document, globs expanded against the repository. */
    static List<Line> commands(Path doc) throws IOException {
        List<String> text = Files.readAllLines(doc);
        List<Line> out = new ArrayList<>();
        boolean code = false;
        for (int i = 0; i < text.size(); i++) {
            String s = text.get(i).strip();
            if (s.startsWith("```")) {
                code = !code;
                continue;
            }
            int at = s.indexOf("./tankwright");
            if (!code || at < 0) {
                continue;
            }
            String comment = "";
            int hash = s.indexOf(" #");
            if (hash >= 0) {
                comment = s.substring(hash);
                s = s.substring(0, hash);
            }
            Matcher m = STATUS.matcher(comment);
            int status = m.find() ? Integer.parseInt(m.group(1)) : 0;
            List<String> args = new ArrayList<>();
            for (String tok : s.substring(at + "./tankwright".length()).strip().split("\\s+")) {
                if (!tok.isEmpty()) {
                    args.addAll(expand(tok));
                }
            }
            out.add(new Line(doc.getFileName().toString(), i + 1, s.strip(), args, status));
        }
        return out;
    }

    private static List<String> expand(String token) {
        if (!token.contains("*")) {
            return List.of(token);
        }
        Path glob = Path.of(token);
        Path dir = glob.getParent() == null ? Path.of(".") : glob.getParent();
        List<String> found = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, glob.getFileName().toString())) {
            ds.forEach(p -> found.add(glob.getParent() == null ? p.getFileName().toString() : p.toString()));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        found.sort(null);
        assertTrue(!found.isEmpty(), token + " matches files");
        return found;
    }
}
