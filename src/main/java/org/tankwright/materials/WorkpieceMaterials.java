package org.tankwright.materials;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The catalogue of workpiece materials: our built-in table plus any the user adds. Immutable;
 * {@link #with} returns a new catalogue. The source of every value is written beside it.
 *
 * <p>Resistivity tables are typical of the grade named, not of one heat of metal: real bars
 * differ by ±10 % or more (alloying, cold work). Values marked "from memory" were recalled, not
 * looked up, and should be confirmed against a handbook before a design is built on them.
 */
public final class WorkpieceMaterials {
    private static final double MICRO = 1e-6;
    private static final double E8 = 1e-8;
    private static final String MEMORY = "from memory";
    private static final WorkpieceMaterials BUILT_IN = new WorkpieceMaterials(builtInList());

    private final Map<String, WorkpieceMaterial> byName;

    private WorkpieceMaterials(List<WorkpieceMaterial> list) {
        Map<String, WorkpieceMaterial> m = new LinkedHashMap<>();
        for (WorkpieceMaterial w : list) {
            m.put(w.name(), w);
        }
        this.byName = Collections.unmodifiableMap(m);
    }

    /** Our built-in table. */
    public static WorkpieceMaterials builtIn() {
        return BUILT_IN;
    }

    /** A catalogue with {@code added} included, replacing a material of the same name. */
    public WorkpieceMaterials with(WorkpieceMaterial added) {
        List<WorkpieceMaterial> list = new ArrayList<>(byName.values());
        list.removeIf(w -> w.name().equals(added.name()));
        list.add(added);
        return new WorkpieceMaterials(list);
    }

    /** A catalogue with every material of {@code added} included (later ones replace earlier of the same name). */
    public WorkpieceMaterials withAll(List<WorkpieceMaterial> added) {
        WorkpieceMaterials c = this;
        for (WorkpieceMaterial w : added) {
            c = c.with(w);
        }
        return c;
    }

    /** The material of that name, if any. */
    public Optional<WorkpieceMaterial> find(String name) {
        return Optional.ofNullable(byName.get(name));
    }

    /** The material of that name, or an error naming the known ones. */
    public WorkpieceMaterial require(String name) {
        WorkpieceMaterial w = byName.get(name);
        if (w == null) {
            throw new IllegalArgumentException("material '" + name + "' is not in the table; known: "
                    + String.join(", ", byName.keySet()));
        }
        return w;
    }

    /** All materials in catalogue order. */
    public List<WorkpieceMaterial> all() {
        return List.copyOf(byName.values());
    }

    /** The names in catalogue order. */
    public List<String> names() {
        return List.copyOf(byName.keySet());
    }

    private static List<WorkpieceMaterial> builtInList() {
        String steelRho = MEMORY + ": typical 0.35–0.45 % C steel, the shape of published elevated-temperature"
                + " steel tables (≈6× from 20 °C to 800 °C, flat above the Curie point)";
        // Eurocode carbon-steel specific heat (EN 1993-1-2 §3.4.1.2), sampled at the points below; formula from memory.
        WorkpieceCurve steelHeat = WorkpieceCurve.pairs(1.0, "EN 1993-1-2 §3.4.1.2 carbon-steel formula (from memory),"
                        + " sampled; the peak at 735 °C is the magnetic/structural transformation",
                20, 440, 100, 488, 200, 530, 300, 565, 400, 606, 500, 667, 600, 760, 650, 814, 700, 1008,
                720, 1388, 730, 2291, 735, 5000, 740, 2525, 750, 1483, 775, 950, 800, 803, 850, 695, 900, 650,
                1200, 650);
        WorkpieceMagnetization steelMag = new WorkpieceMagnetization(
                WorkpieceCurve.pairs(1.0, MEMORY + ": normal B–H curve typical of annealed medium-carbon steel,"
                                + " saturation polarization ≈ 2.0 T",
                        200, 0.30, 400, 0.70, 800, 1.10, 1600, 1.35, 3000, 1.50, 6000, 1.62, 1e4, 1.72, 2e4, 1.85,
                        4e4, 1.97, 8e4, 2.08, 1.6e5, 2.20, 3.2e5, 2.42),
                770, 0.35, "A2 magnetic transformation of iron–carbon steels, 768–770 °C (iron–carbon diagram, handbook)");
        WorkpieceMaterial carbonSteel = new WorkpieceMaterial("carbon-steel",
                "medium-carbon steel (≈0.4 % C), magnetic below its Curie point",
                WorkpieceCurve.pairs(MICRO, steelRho, 20, 0.17, 100, 0.22, 200, 0.29, 300, 0.38, 400, 0.48,
                        500, 0.60, 600, 0.74, 700, 0.90, 770, 1.04, 800, 1.08, 900, 1.12, 1000, 1.16, 1100, 1.19,
                        1200, 1.22, 1300, 1.25),
                steelHeat, 7850, "EN 1993-1-2 §3.2.2 (unit mass of steel 7850 kg/m³), from memory", 1400, steelMag);

        WorkpieceMagnetization ironMag = new WorkpieceMagnetization(
                WorkpieceCurve.pairs(1.0, MEMORY + ": normal B–H curve typical of annealed commercially pure iron,"
                                + " saturation polarization ≈ 2.15 T",
                        20, 0.10, 50, 0.50, 100, 1.00, 200, 1.25, 500, 1.45, 1000, 1.55, 3000, 1.70, 1e4, 1.85,
                        3e4, 2.00, 1e5, 2.20, 3e5, 2.52, 1e6, 3.40),
                770, 0.35, "Curie point of iron 1043 K = 770 °C (CRC Handbook of Chemistry and Physics, handbook value)");
        WorkpieceMaterial iron = new WorkpieceMaterial("iron", "commercially pure iron, magnetic below 770 °C",
                WorkpieceCurve.pairs(MICRO, MEMORY + ": pure iron, shape of the CRC Handbook resistivity-versus-temperature table",
                        20, 0.097, 100, 0.148, 200, 0.23, 300, 0.32, 400, 0.43, 500, 0.56, 600, 0.71, 700, 0.88,
                        770, 1.02, 800, 1.06, 900, 1.10, 1000, 1.13, 1200, 1.20),
                WorkpieceCurve.pairs(1.0, MEMORY + ": pure iron, peak at the Curie point",
                        20, 449, 200, 520, 400, 600, 600, 750, 700, 1000, 750, 1500, 770, 1200, 800, 800, 900, 650,
                        1000, 600, 1200, 630),
                7874, "CRC Handbook of Chemistry and Physics, from memory", 1500, ironMag);

        WorkpieceMagnetization ferriticMag = new WorkpieceMagnetization(
                WorkpieceCurve.pairs(1.0, MEMORY + ": B–H typical of annealed 17 % Cr ferritic stainless,"
                                + " saturation polarization ≈ 1.5 T",
                        100, 0.20, 300, 0.60, 1000, 1.00, 3000, 1.20, 1e4, 1.35, 3e4, 1.45, 1e5, 1.60, 3e5, 1.88),
                670, 0.35, MEMORY + ": 17 % Cr ferritic stainless steels, ≈ 650–680 °C");
        WorkpieceMaterial ferritic = new WorkpieceMaterial("ferritic-stainless",
                "ferritic stainless steel (≈17 % Cr), magnetic below its Curie point",
                WorkpieceCurve.pairs(MICRO, MEMORY + ": typical 17 % Cr ferritic stainless",
                        20, 0.60, 200, 0.75, 400, 0.90, 600, 1.02, 800, 1.11, 1000, 1.17, 1200, 1.21),
                WorkpieceCurve.pairs(1.0, MEMORY + ": typical 17 % Cr ferritic stainless",
                        20, 460, 200, 520, 400, 580, 600, 660, 650, 720, 700, 640, 800, 650, 1000, 670),
                7700, MEMORY, 1400, ferriticMag);

        WorkpieceMaterial austenitic = new WorkpieceMaterial("austenitic-stainless",
                "austenitic stainless steel (18 % Cr 8 % Ni), non-magnetic when annealed (cold work can make it slightly magnetic)",
                WorkpieceCurve.pairs(MICRO, MEMORY + ": typical 18/8 austenitic stainless",
                        20, 0.72, 100, 0.78, 200, 0.86, 400, 0.99, 600, 1.09, 800, 1.17, 1000, 1.24, 1200, 1.29),
                WorkpieceCurve.pairs(1.0, MEMORY + ": typical 18/8 austenitic stainless",
                        20, 500, 200, 530, 400, 560, 600, 590, 800, 620, 1000, 650, 1200, 680),
                7900, MEMORY, 1400, null);

        WorkpieceMaterial aluminium = new WorkpieceMaterial("aluminium", "pure aluminium (99.5 %+), non-magnetic",
                WorkpieceCurve.pairs(E8, MEMORY + ": pure aluminium, 2.65·10⁻⁸ Ω·m at 20 °C rising ≈ 0.43 %/K",
                        20, 2.65, 100, 3.55, 200, 4.70, 300, 5.90, 400, 7.10, 500, 8.30, 600, 9.60, 650, 10.0),
                WorkpieceCurve.pairs(1.0, MEMORY + ": pure aluminium", 20, 900, 200, 960, 400, 1030, 600, 1100),
                2700, "CRC Handbook of Chemistry and Physics, from memory", 660, null);

        WorkpieceMaterial copper = new WorkpieceMaterial("copper", "annealed copper, non-magnetic",
                WorkpieceCurve.pairs(E8, "20 °C: annealed-copper standard 1/58 Ω·mm²/m (IEC 60028);"
                                + " temperature rise: shape of the CRC Handbook table, from memory",
                        20, 1.724, 100, 2.24, 200, 2.92, 300, 3.61, 400, 4.33, 500, 5.08, 600, 5.85, 700, 6.66,
                        800, 7.51, 900, 8.41, 1000, 9.36),
                WorkpieceCurve.pairs(1.0, MEMORY + ": copper", 20, 385, 200, 400, 400, 415, 600, 430, 800, 445,
                        1000, 460),
                8960, "CRC Handbook of Chemistry and Physics, from memory", 1080, null);

        WorkpieceMaterial brass = new WorkpieceMaterial("brass", "70/30 brass, non-magnetic",
                WorkpieceCurve.pairs(E8, MEMORY + ": 70/30 brass, ≈ 28 % IACS at 20 °C",
                        20, 6.2, 100, 7.0, 200, 7.9, 300, 8.8, 400, 9.6, 600, 11.2, 800, 12.8),
                WorkpieceCurve.pairs(1.0, MEMORY + ": 70/30 brass", 20, 380, 200, 395, 400, 410, 600, 425, 800, 440),
                8530, MEMORY, 900, null);

        WorkpieceMaterial graphite = new WorkpieceMaterial("graphite",
                "synthetic (extruded/moulded) graphite, non-magnetic; oxidizes in air above ≈ 500 °C",
                WorkpieceCurve.pairs(MICRO, MEMORY + ": synthetic graphite grades span ≈ 5–15 µΩ·m; resistivity falls"
                                + " with temperature to a shallow minimum",
                        20, 10.0, 200, 9.0, 400, 8.4, 600, 8.0, 800, 7.8, 1000, 7.8, 1500, 8.2, 2000, 8.8),
                WorkpieceCurve.pairs(1.0, MEMORY + ": graphite, specific heat rises strongly with temperature",
                        20, 710, 200, 1000, 400, 1250, 600, 1450, 800, 1550, 1000, 1650, 1500, 1800, 2000, 1950),
                1750, MEMORY + ": typical synthetic graphite", 2500, null);

        return List.of(carbonSteel, iron, ferritic, austenitic, aluminium, copper, brass, graphite);
    }
}
