package org.tankwright.heating;

import org.tankwright.provenance.Provenance;
import org.tankwright.materials.WorkpieceMaterial;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Time to heat a workpiece from one uniform temperature to another: t = ∫ m·c(T) dT / (P(T) − P_loss(T)),
 * with the material's specific-heat table (including the latent peak of steel's transformation) and
 * a stated loss allowance. Lumped model: the workpiece is taken to be at one temperature throughout
 * (through-heating with enough soak time); a surface-hardening job is not described by it.
 */
public final class HeatingTime {
    private static final String MODEL = "lumped heat balance m·c(T)·dT/dt = P(T) − P_loss(T)";

    private HeatingTime() {
    }

    /**
     * The estimate.
     *
     * @param timeSeconds      time to reach the target, s (when not reachable: time to the highest temperature reached)
     * @param reachable        whether the net heating power stays positive up to the target
     * @param reachedC         the target, or the temperature where input and loss balance
     * @param heatContent      m·∫c dT up to the reached temperature, J
     * @param energyIn         ∫P dt, J: the energy delivered into the workpiece
     * @param provenance       model, allowance, notes
     */
    public record Estimate(double timeSeconds, boolean reachable, double reachedC, double heatContent,
                           double energyIn, Provenance provenance) {
    }

    /** With a constant power into the workpiece. */
    public static Estimate estimate(double mass, WorkpieceMaterial material, double fromC, double toC, double power,
                                    LossAllowance loss) {
        HeatingInputs.positive("power into the workpiece", power, "W");
        return estimate(mass, material, fromC, toC, t -> power, loss);
    }

    /**
     * With a power into the workpiece that depends on its temperature (e.g. from {@link WorkpieceLoad}
     * at each temperature: steel takes less power above its Curie point).
     */
    public static Estimate estimate(double mass, WorkpieceMaterial material, double fromC, double toC,
                                    DoubleUnaryOperator powerAt, LossAllowance loss) {
        HeatingInputs.positive("workpiece mass", mass, "kg");
        HeatingInputs.finite("start temperature", fromC, "°C");
        if (!(toC > fromC) || Double.isInfinite(toC)) {
            throw new IllegalArgumentException("target temperature " + toC + " °C must be finite and above the start "
                    + fromC + " °C");
        }
        int steps = (int) Math.min(20000, Math.max(200, Math.ceil(toC - fromC)));
        double dT = (toC - fromC) / steps;
        double time = 0;
        double heat = 0;
        double energy = 0;
        double reached = toC;
        boolean reachable = true;
        for (int i = 0; i < steps; i++) {
            double mid = fromC + (i + 0.5) * dT;
            double p = powerAt.applyAsDouble(mid);
            double net = p - loss.loss(p, mid);
            if (!(net > 0)) {
                reachable = false;
                reached = fromC + i * dT;
                break;
            }
            double dq = mass * material.specificHeatAt(mid) * dT;
            double dt = dq / net;
            time += dt;
            heat += dq;
            energy += p * dt;
        }
        String note = "uniform workpiece temperature; " + loss.describe() + "; specific heat: "
                + material.specificHeat().source();
        Provenance prov = new Provenance(MODEL, "energy balance with the material table (docs/models.md, heating time)",
                reachable, reachable ? List.of(note)
                : List.of(note, "the losses reach the input power at about " + Math.round(reached)
                + " °C: the target is not reached"));
        return new Estimate(time, reachable, reached, heat, energy, prov);
    }
}
