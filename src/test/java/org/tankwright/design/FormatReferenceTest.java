package org.tankwright.design;

import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** docs/design-file.md carries the generated field reference; it must match the code. */
class FormatReferenceTest {
    @Test
    void documentedReferenceMatchesTheRecords() throws Exception {
        String doc = Files.readString(Path.of("docs/design-file.md"));
        int a = doc.indexOf("<!-- reference:begin -->");
        int b = doc.indexOf("<!-- reference:end -->");
        assertTrue(a >= 0 && b > a, "docs/design-file.md must hold the reference markers");
        String documented = doc.substring(a + "<!-- reference:begin -->".length(), b).strip();
        assertEquals(FormatReference.markdown().strip(), documented,
                "docs/design-file.md is out of date: refresh it from FormatReference.main");
    }

    @Test
    void documentedExampleIsTheDemoAndValid() throws Exception {
        String doc = Files.readString(Path.of("docs/design-file.md"));
        String demo = Files.readString(Path.of("presets/desk-lamp-pad.json")).strip();
        assertTrue(doc.contains(demo), "the complete example must be the bundled demo, verbatim");
        DesignFiles.parse(demo, "example");
    }
}
