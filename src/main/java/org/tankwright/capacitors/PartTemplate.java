package org.tankwright.capacitors;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A family of parts at E-series values sharing one dielectric and one set of ratings, for
 * sizing a bank before choosing real parts. The built-in templates carry typical ratings
 * recalled from general datasheet knowledge ("from memory"): check them against the parts you buy.
 *
 * @param name            template name
 * @param dielectric      dielectric
 * @param tolerance       capacitance tolerance, fraction
 * @param tanDelta        dissipation factor at {@code lossFrequency}
 * @param lossFrequency   Hz
 * @param esl             ESL per part, H
 * @param dcRating        V
 * @param acRating        V rms at low frequency
 * @param currentRating   A rms
 * @param dvdtRating      V/s
 * @param maxDissipation  W
 */
public record PartTemplate(String name, Dielectric dielectric, double tolerance, double tanDelta, double lossFrequency,
                           double esl, double dcRating, double acRating, double currentRating, double dvdtRating,
                           double maxDissipation) {

    /** Built-in templates (typical ratings, from memory). */
    public static List<PartTemplate> builtIns() {
        return List.of(
                new PartTemplate("pp-film-630v", Dielectric.POLYPROPYLENE, 0.05, 3e-4, 1e3, 10e-9, 630, 250, 8, 400e6, 1.0),
                new PartTemplate("pp-film-1600v", Dielectric.POLYPROPYLENE, 0.05, 3e-4, 1e3, 15e-9, 1600, 550, 12, 1500e6, 1.5),
                new PartTemplate("c0g-1000v", Dielectric.C0G, 0.05, 1e-4, 1e6, 2e-9, 1000, 300, 3, 10e9, 0.5),
                new PartTemplate("mica-500v", Dielectric.MICA, 0.05, 1e-3, 1e6, 5e-9, 500, 250, 2, 5e9, 0.5));
    }

    /** The built-in template of that name; the message lists the names allowed. */
    public static PartTemplate named(String name) {
        for (PartTemplate t : builtIns()) {
            if (t.name().equalsIgnoreCase(name)) {
                return t;
            }
        }
        throw new IllegalArgumentException("template '" + name + "' is not known; allowed: "
                + builtIns().stream().map(PartTemplate::name).toList());
    }

    /** One part per series value in [min, max], F. */
    public List<CapacitorPart> parts(ESeries series, double min, double max) {
        List<CapacitorPart> out = new ArrayList<>();
        for (double c : series.valuesBetween(min, max)) {
            out.add(CapacitorPart.builder(String.format(Locale.ROOT, "%s-%s-%.3g", series, name, c), c, dielectric)
                    .description(series + " value, template " + name)
                    .tolerance(tolerance).tanDelta(tanDelta, lossFrequency).esl(esl).dcRating(dcRating)
                    .acRating(acRating).currentRating(currentRating).dvdtRating(dvdtRating)
                    .maxDissipation(maxDissipation).note("template ratings: typical, from memory").build());
        }
        return out;
    }
}
