package org.tankwright.ui.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;

/** The drawing's geometry follows the design file's coil conventions (see {@link Coil}) and draws without a display. */
class SketchesTest {

    @Test
    void aSpiralIsDrawnBetweenItsEdgesAtTheWiresCentreAndTheSecondaryAtItsDistance() throws Exception {
        Design d = Presets.demo();
        CoilSketch s = Sketches.of(d).sketch();
        assertNotNull(s);
        CoilSketch.Coil p = s.coils().get(0);
        double w = d.primary().wire().outerDiameter();
        assertEquals(d.primary().diameter() / 2 - w / 2, p.outerRadius(), 1e-12, "outer size is at the conductor's edge");
        assertEquals(d.primary().innerDiameter() / 2 + w / 2, p.innerRadius(), 1e-12);
        assertEquals(d.placement().distance(), s.coils().get(1).z(), 1e-12);
        assertEquals(d.placement().distance(), s.distance(), 1e-12);
        assertNull(s.workpiece());
    }

    @Test
    void aRectangularSpiralKeepsItsInnerAndOuterProportions() throws Exception {
        Design d = Presets.load("warehouse-robot-pad");
        CoilSketch.Coil c = Sketches.of(d).sketch().coils().get(0);
        Coil coil = d.primary();
        double w = c.wireDiameter();
        assertEquals((coil.height() / 2 - w / 2) / (coil.width() / 2 - w / 2), c.aspect(), 1e-12);
        assertEquals((coil.innerHeight() / 2 + w / 2) / (coil.innerWidth() / 2 + w / 2), c.innerAspect(), 1e-12);
    }

    @Test
    void aHeaterShowsItsWorkpieceAndAMeasuredCoilSaysWhyNothingIsDrawn() throws Exception {
        Design heater = Presets.load("bolt-heater");
        CoilSketch s = Sketches.of(heater).sketch();
        assertEquals(heater.workpiece().diameter() / 2, s.workpiece().radius(), 1e-12);
        assertEquals(CoilSketch.Winding.AXIAL, s.coils().get(0).winding());
        Sketches.Outcome measured = Sketches.of(Presets.load("check-my-capacitor"));
        assertNull(measured.sketch());
        assertEquals("Measured coils have no geometry to draw", measured.whyNone());

        CoilDrawing drawing = new CoilDrawing();
        drawing.setSize(600, 300);
        drawing.show(s, null);
        BufferedImage img = new BufferedImage(600, 300, BufferedImage.TYPE_INT_RGB);
        drawing.paint(img.createGraphics()); // paints headless, no exception, something drawn
        int bg = img.getRGB(1, 1);
        boolean drawn = false;
        for (int x = 0; x < 600 && !drawn; x += 3) {
            for (int y = 0; y < 300 && !drawn; y += 3) {
                drawn = img.getRGB(x, y) != bg;
            }
        }
        assertEquals(true, drawn, "the drawing is not empty");
    }
}
