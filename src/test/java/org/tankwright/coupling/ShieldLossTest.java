package org.tankwright.coupling;

import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Ring;
import org.tankwright.magnetics.Segment;
import org.tankwright.units.Constants;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ShieldLossTest {
    private static final BackingPlate ALUMINIUM = BackingPlate.metal(2.82e-8, 0.003, 0);

    @Test
    void longWireOverAPlaneApproachesTheTransmissionLineResult() {
        // A wire at height h over a good conductor: ground-plane loss R_s/(2πh) per metre (image method;
        // Ramo, Whinnery & Van Duzer, Fields and Waves, wire-over-plane line). The two ends add a fixed
        // correction, so the difference of two lengths isolates the per-metre value.
        double h = 0.005;
        double f = 100e3;
        double[] r = new double[2];
        double[] len = {0.25, 0.5};
        double rs = 0;
        for (int i = 0; i < 2; i++) {
            List<Filament> wire = List.of(new Segment(-len[i] / 2, 0, h, len[i] / 2, 0, h, 0.0005));
            ShieldLoss.Result res = ShieldLoss.addedResistance(wire, 0, ALUMINIUM, f);
            r[i] = res.resistance();
            rs = res.surfaceResistance();
            assertEquals(rs / (2 * Math.PI * h) * len[i], r[i], 0.05 * r[i], "within the end effect at L = " + len[i]);
        }
        double perMetre = (r[1] - r[0]) / (len[1] - len[0]);
        assertEquals(rs / (2 * Math.PI * h), perMetre, 0.005 * perMetre, "per-metre loss");
    }

    @Test
    void surfaceResistanceOfAluminium() {
        // δ = √(ρ/(π f µ0)): aluminium, 100 kHz, ρ = 2.82e-8 Ω·m → 0.267 mm (skin-depth formula, MODELS.md §1)
        List<Filament> ring = List.of(new Ring(0, 0, 0.01, 0.05, 0.001));
        ShieldLoss.Result r = ShieldLoss.addedResistance(ring, 0, ALUMINIUM, 100e3);
        assertEquals(Math.sqrt(2.82e-8 / (Math.PI * 1e5 * Constants.MU0)), r.skinDepth(), 1e-15);
        assertEquals(2.82e-8 / r.skinDepth(), r.surfaceResistance(), 1e-15);
        assertTrue(r.provenance().valid());
        ShieldLoss.Result thin = ShieldLoss.addedResistance(ring, 0, BackingPlate.metal(2.82e-8, 0.0002, 0), 100e3);
        assertFalse(thin.provenance().valid(), "thinner than 3 skin depths");
    }

    @Test
    void ringAndFinePolygonAgree() {
        // the axisymmetric radial integral and the general plane integral describe the same physics
        double r = 0.05;
        List<Filament> polygon = new ArrayList<>();
        int n = 256;
        for (int i = 0; i < n; i++) {
            double a0 = 2 * Math.PI * i / n;
            double a1 = 2 * Math.PI * (i + 1) / n;
            polygon.add(new Segment(r * Math.cos(a0), r * Math.sin(a0), 0.01, r * Math.cos(a1), r * Math.sin(a1), 0.01, 0.001));
        }
        double ring = ShieldLoss.addedResistance(List.of(new Ring(0, 0, 0.01, r, 0.001)), 0, ALUMINIUM, 1e5).resistance();
        double poly = ShieldLoss.addedResistance(polygon, 0, ALUMINIUM, 1e5).resistance();
        assertEquals(ring, poly, 0.01 * ring);
        assertThrows(IllegalArgumentException.class,
                () -> ShieldLoss.addedResistance(List.of(new Ring(0, 0, 0.01, r, 0.001)), 0.02, BackingPlate.ferrite(100, 0.01, 0), 1e5));
    }
}
