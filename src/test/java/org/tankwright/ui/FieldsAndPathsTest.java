package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Compensation;
import org.tankwright.design.Design;
import org.tankwright.design.DesignException;
import org.tankwright.design.DesignFiles;
import org.tankwright.design.Field;
import org.tankwright.design.Problem;
import org.tankwright.ui.fields.QuantityField;
import org.tankwright.ui.fields.QuantitySpec;
import org.tankwright.ui.model.DesignCheck;
import org.tankwright.ui.model.FieldPath;
import org.tankwright.units.Dimension;

/** The unit-aware field and the paths into the design records (Swing components, no display needed). */
class FieldsAndPathsTest {

    private static final FieldPath C1 = FieldPath.root().then(Design.class, "compensation").then(Compensation.class, "c1");

    @Test
    void aFieldPathReadsAndReplacesOneValueAndNamesItLikeTheValidator() {
        Design d = Presets.demo();
        assertEquals("$.compensation.c1_F", C1.json());
        assertNull(C1.get(d));
        Design e = C1.with(d, 4.7e-9);
        assertEquals(4.7e-9, C1.get(e));
        assertNull(C1.get(d), "the original design is unchanged");
        assertEquals(d.primary(), e.primary(), "only the one value differs");
        assertNotEquals(d, e);
    }

    @Test
    void editsAreCheckedWithTheDesignPackagesOwnRules() throws DesignException {
        Design d = Presets.demo();
        assertTrue(DesignCheck.problems(d).isEmpty());
        FieldPath loadResistance = FieldPath.root().then(Design.class, "load").then(org.tankwright.design.Load.class, "resistance");
        Design bad = loadResistance.with(d, null); // a rectifier load without its resistance
        List<Problem> mine = DesignCheck.problems(bad);
        assertEquals(1, mine.size());
        assertEquals("$.load.resistance_ohm", mine.get(0).path());
        try {
            DesignFiles.parse(DesignFiles.toJson(bad), "x");
        } catch (DesignException e) {
            assertEquals(e.problems().get(0).path(), mine.get(0).path(), "the same path as the file validator");
        }
    }

    @Test
    void theQuantityFieldAcceptsUnitsKeepsTheLastValidValueAndSaysWhatIsWrong() throws Exception {
        Field f = Compensation.class.getRecordComponents()[1].getAnnotation(Field.class); // c1
        List<Double> seen = new ArrayList<>();
        QuantityField q = WindowHarness.onEdt(() -> {
            QuantityField field = new QuantityField(QuantitySpec.of("C1", f, Double.class));
            field.addValueListener(seen::add);
            field.textField().setText("4n7");
            return field;
        });
        assertEquals(4.7e-9, q.value(), 1e-21);
        assertNull(q.problem());
        WindowHarness.onEdt(() -> {
            q.textField().setText("4.7 nH"); // in one event, as a paste would be
            return null;
        });
        assertEquals("error", q.outline());
        assertTrue(q.problem().startsWith("C1: "), q.problem());
        assertTrue(q.problem().contains("4.7 nH"), "names the value: " + q.problem());
        assertEquals(4.7e-9, q.value(), 1e-21, "keeps the last valid value");
        WindowHarness.onEdt(() -> {
            q.textField().setText("0");
            return null;
        });
        assertTrue(q.problem().contains("out of range") && q.problem().contains("> 0 F"), q.problem());
        WindowHarness.onEdt(() -> {
            q.textField().setText("");
            return null;
        });
        WindowHarness.onEdt(() -> null); // an empty field is taken as absent once the edit is over
        assertNull(q.value(), "an optional field left empty is absent (tuned by the analysis)");
        assertNull(q.outline());
        assertEquals(2, seen.size(), "only valid, changed values reach the document: " + seen);
        assertEquals(4.7e-9, seen.get(0), 1e-21);
        assertNull(seen.get(1));
    }

    @Test
    void aWholeNumberFieldRefusesFractions() {
        QuantitySpec spec = new QuantitySpec("strands", Dimension.DIMENSIONLESS, 1, Double.POSITIVE_INFINITY, false, "≥ 1", "", true, true);
        assertTrue(spec.check(2.5).contains("whole number"));
        assertNull(spec.check(40));
        assertTrue(spec.check(0).contains("out of range"));
    }
}
