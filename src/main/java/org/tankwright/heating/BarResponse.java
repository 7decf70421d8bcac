package org.tankwright.heating;

import org.tankwright.provenance.Provenance;

/**
 * A round bar in a uniform axial field: the exact eddy-current solution per unit length.
 *
 * @param frequency              Hz
 * @param resistivity            Ω·m used
 * @param muR                    relative permeability used
 * @param surfaceField           rms axial field strength at the bar's surface, A/m
 * @param referenceDepth         δ in m
 * @param radiusOverDepth        a/δ (outer radius over reference depth)
 * @param fluxFactorRe           real part of F = Φ/(µ0·µr·π·a²·H0): the bar's flux over the flux it would carry
 *                               at low frequency (1 at DC; (1 − j)·δ/a when a ≫ δ)
 * @param fluxFactorIm           imaginary part of F (negative: the loss)
 * @param powerPerLength         W/m dissipated per metre of bar
 * @param reactivePowerPerLength var/m stored in the bar's own flux (and a tube's bore) per metre
 * @param thinSkinLimit          W/m, 2π·a·H0²·ρ/δ: the limit for a ≫ δ
 * @param lowFrequencyLimit      W/m, the closed form for a ≪ δ (π·ω²·µ²·H0²·a⁴/(8ρ) for a solid bar)
 * @param provenance             model, source, validity
 */
public record BarResponse(double frequency, double resistivity, double muR, double surfaceField,
                          double referenceDepth, double radiusOverDepth, double fluxFactorRe, double fluxFactorIm,
                          double powerPerLength, double reactivePowerPerLength, double thinSkinLimit,
                          double lowFrequencyLimit, Provenance provenance) {

    /**
     * Power over its thin-skin limit 2π·a·H0²·ρ/δ (tends to 1 for a ≫ δ); equal to (a/δ)·(−Im F) since
     * ω·µ·δ²/(2ρ) = 1, so it is defined at zero field too.
     */
    public double thinSkinRatio() {
        return -radiusOverDepth * fluxFactorIm;
    }
}
