package org.tankwright.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.bench.CouplingComparison;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code bench}: the report's structure on two small items (never its timings). */
class BenchCommandTest {

    @Test
    void quickRunWritesTheMachineAndTheChosenItems(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("docs/performance.md");
        assertEquals(ExitCodes.OK, Main.run("bench", "--quick", "--only", "sweep,coupling", "--out", out.toString()));
        String md = Files.readString(out);
        assertTrue(md.startsWith("# Performance"), md);
        assertTrue(md.contains("## Machine") && md.contains("processors available to the JVM: "
                + Runtime.getRuntime().availableProcessors()), "the machine is stated");
        assertTrue(md.contains("- Java: " + System.getProperty("java.version")), "the Java version is stated");
        assertTrue(md.contains("Load average (1 min) when the run ended"), "the load is stated");
        assertTrue(md.contains("## Frequency sweep") && md.contains("| 2,000-point sweep | "), md);
        assertTrue(md.contains("## Mutual inductance of two 20-turn coils with offset"), md);
        assertTrue(md.contains("direct Neumann") && md.contains("faster (median wall times;"), "the ratio is stated");
        assertFalse(md.contains("## Solving the presets") || md.contains("## Window start"), "only the chosen items run");
        assertFalse(md.contains("NaN"), md);
    }

    @Test
    void theKernelsAndTheDirectIntegralAgreeToTheStatedAccuracy() {
        // Neumann's double integral (Maxwell's formula for mutual inductance of two circuits) evaluated by
        // brute force must land within the compared accuracy of the kernels' value, or the ratio is meaningless.
        CouplingComparison c = CouplingComparison.run(true);
        assertTrue(c.kernelError() <= CouplingComparison.ACCURACY, "kernels: " + c.kernelError());
        assertTrue(c.neumannError() <= CouplingComparison.ACCURACY, "direct integral: " + c.neumannError());
        assertTrue(c.referenceCheck() < 1e-9, "tight reference against a fine direct integral: " + c.referenceCheck());
    }

    @Test
    void anUnknownItemIsAUsageError() {
        assertEquals(ExitCodes.USAGE, Main.run("bench", "--only", "everything"));
    }
}
