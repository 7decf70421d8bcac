package org.tankwright.coupling;

import java.util.ArrayList;
import java.util.List;

/**
 * A flat plate behind a coil, parallel to its winding: a ferrite backing plate or a metal shield.
 * Modelled by the image method: the plate surface is a mirror plane and every filament has an
 * image carrying the coil current times the image coefficient.
 *
 * <ul>
 * <li>Ferrite, a magnetic half-space: η = (µr−1)/(µr+1) (magnetostatic image of a current in front
 * of a permeable half-space; Smythe, <i>Static and Dynamic Electricity</i> §7.18; Hammond,
 * <i>Electromagnetism for Engineers</i>). A slab of thickness t reflects a field component of spatial
 * wavenumber q with Γ(q) = η(1 − e^{−2qt})/(1 − η²e^{−2qt}) (the two faces' reflections summed);
 * the model takes q = 1/ℓ, ℓ the coil's mean radius, and states the spread of Γ over q ∈ [1/(2ℓ), 2/ℓ]
 * as its error for thin tiles.</li>
 * <li>Metal, a good conductor thicker than a few skin depths: η = −1 (the normal flux density
 * vanishes at its surface).</li>
 * </ul>
 * Valid for a plate that extends beyond the coil by more than the coil-to-plate distance on every
 * side (the half-space idealisation), and between the plates only. A measured coefficient, when
 * given, overrides the computed one.
 *
 * @param material            ferrite or metal
 * @param relativePermeability µr of the plate (≥ 1; 1 for copper and aluminium)
 * @param thickness           plate thickness in metres (&gt; 0)
 * @param spacing             distance from the winding's conductor surface to the plate surface, metres (≥ 0)
 * @param resistivity         Ω·m (metal plates; 0 for ferrite, whose eddy loss is not modelled)
 * @param measuredCoefficient image coefficient measured on the real pad, or NaN when none
 */
public record BackingPlate(Material material, double relativePermeability, double thickness, double spacing,
                           double resistivity, double measuredCoefficient) {

    /** What the plate is made of. */
    public enum Material { FERRITE, METAL }

    public BackingPlate {
        if (material == null) {
            throw new IllegalArgumentException("plate material is required (ferrite or metal)");
        }
        if (!(relativePermeability >= 1) || Double.isInfinite(relativePermeability)) {
            throw new IllegalArgumentException("plate relative permeability must be a finite number ≥ 1, got " + relativePermeability);
        }
        if (!(thickness > 0) || Double.isInfinite(thickness)) {
            throw new IllegalArgumentException("plate thickness must be > 0, got " + thickness + " m");
        }
        if (!(spacing >= 0) || Double.isInfinite(spacing)) {
            throw new IllegalArgumentException("plate spacing must be ≥ 0, got " + spacing + " m");
        }
        if (material == Material.METAL && !(resistivity > 0 && Double.isFinite(resistivity))) {
            throw new IllegalArgumentException("a metal plate needs a resistivity > 0, got " + resistivity + " Ω·m");
        }
        if (!Double.isNaN(measuredCoefficient) && !(measuredCoefficient >= -1 && measuredCoefficient <= 1)) {
            throw new IllegalArgumentException("measured image coefficient must lie in [−1, 1], got " + measuredCoefficient);
        }
    }

    /** A ferrite plate of relative permeability µr. */
    public static BackingPlate ferrite(double mur, double thickness, double spacing) {
        return new BackingPlate(Material.FERRITE, mur, thickness, spacing, 0, Double.NaN);
    }

    /** A metal shield of the given resistivity (µr = 1). */
    public static BackingPlate metal(double resistivity, double thickness, double spacing) {
        return new BackingPlate(Material.METAL, 1, thickness, spacing, resistivity, Double.NaN);
    }

    /** This plate with a measured image coefficient that overrides the computed one. */
    public BackingPlate withMeasuredCoefficient(double eta) {
        return new BackingPlate(material, relativePermeability, thickness, spacing, resistivity, eta);
    }

    /** Image coefficient of a thick plate of this material: (µr−1)/(µr+1), or −1 for metal. */
    public double halfSpaceCoefficient() {
        return material == Material.METAL ? -1 : (relativePermeability - 1) / (relativePermeability + 1);
    }

    /** Γ(q) of a slab of this thickness at spatial wavenumber q (1/m). */
    double slabCoefficient(double q) {
        double eta = halfSpaceCoefficient();
        if (material == Material.METAL) {
            return eta;
        }
        double e = Math.exp(-2 * q * thickness);
        return eta * (1 - e) / (1 - eta * eta * e);
    }

    /** The coefficient used for a coil of mean radius {@code meanRadius}: measured if given, else Γ(1/ℓ). */
    public double imageCoefficient(double meanRadius) {
        if (!Double.isNaN(measuredCoefficient)) {
            return measuredCoefficient;
        }
        return slabCoefficient(1 / meanRadius);
    }

    /**
     * Notes on how the coefficient was obtained and how far to trust it, for a coil of mean radius ℓ;
     * {@code exactSpectrum} when the solver applied Γ(q) at every wavenumber (round coils).
     */
    List<String> notes(String coilName, double meanRadius, boolean exactSpectrum) {
        List<String> notes = new ArrayList<>();
        double eta = imageCoefficient(meanRadius);
        if (!Double.isNaN(measuredCoefficient)) {
            notes.add(String.format("%s plate: measured image coefficient %.4f used", coilName, eta));
            return notes;
        }
        if (material == Material.METAL) {
            notes.add(coilName + " plate: metal taken as a perfect conductor (image −1); valid when thicker than about 3 skin depths");
            return notes;
        }
        if (exactSpectrum) {
            notes.add(String.format("%s plate: ferrite µr %.0f, %.4g m thick: slab reflection Γ(q) applied at every "
                    + "spatial wavenumber (half-space value %.4f)", coilName, relativePermeability, thickness, halfSpaceCoefficient()));
            return notes;
        }
        double lo = slabCoefficient(0.5 / meanRadius);
        double hi = slabCoefficient(2 / meanRadius);
        double spread = Math.max(Math.abs(hi - eta), Math.abs(eta - lo));
        notes.add(String.format("%s plate: ferrite µr %.0f, image coefficient %.4f (half-space %.4f; thin-slab correction, "
                + "±%.4f over the coil's spatial spectrum)", coilName, relativePermeability, eta, halfSpaceCoefficient(), spread));
        return notes;
    }

    /** True when the thin-slab correction changes the coefficient by more than 10 % across the spectrum. */
    boolean thinTileDoubtful(double meanRadius) {
        if (material == Material.METAL || !Double.isNaN(measuredCoefficient)) {
            return false;
        }
        double eta = imageCoefficient(meanRadius);
        double lo = slabCoefficient(0.5 / meanRadius);
        double hi = slabCoefficient(2 / meanRadius);
        return Math.max(Math.abs(hi - eta), Math.abs(eta - lo)) > 0.1 * Math.abs(eta);
    }
}
