package org.chillwright.physics;

/**
 * A cooling requirement with its thermal path, resistances in series:
 * object —coldInterface— cold face | module | hot face —hotInterface— sink base —sink— ambient.
 *
 * @param setPointK                 object set-point temperature, K, &gt; 0
 * @param ambientK                ambient (sink air or coolant) temperature, K, &gt; 0
 * @param heatLoadW               heat to remove from the object (active plus parasitic), W, ≥ 0
 * @param sinkResistanceKPerW     heat-sink resistance to ambient, K/W, ≥ 0
 * @param coldInterfaceKPerW      object-to-cold-face resistance (grease, ceramic, cold plate), K/W, ≥ 0
 * @param hotInterfaceKPerW       hot-face-to-sink-base resistance, K/W, ≥ 0
 * @param relativeHumidity        relative humidity of the ambient air as a fraction (0, 1], or NaN
 *                                when unknown; used only for the condensation warning
 */
public record CoolingCase(double setPointK, double ambientK, double heatLoadW, double sinkResistanceKPerW,
                          double coldInterfaceKPerW, double hotInterfaceKPerW, double relativeHumidity) {

    public CoolingCase {
        Check.positive("setPointK", setPointK);
        Check.positive("ambientK", ambientK);
        Check.nonNegative("heatLoadW", heatLoadW);
        Check.nonNegative("sinkResistanceKPerW", sinkResistanceKPerW);
        Check.nonNegative("coldInterfaceKPerW", coldInterfaceKPerW);
        Check.nonNegative("hotInterfaceKPerW", hotInterfaceKPerW);
        if (!Double.isNaN(relativeHumidity)) {
            Check.fraction("relativeHumidity", relativeHumidity);
        }
    }

    /** A case without humidity information. */
    public CoolingCase(double setPointK, double ambientK, double heatLoadW, double sinkResistanceKPerW,
                       double coldInterfaceKPerW, double hotInterfaceKPerW) {
        this(setPointK, ambientK, heatLoadW, sinkResistanceKPerW, coldInterfaceKPerW, hotInterfaceKPerW, Double.NaN);
    }

    /** The same case with the ambient relative humidity (fraction, (0, 1]). */
    public CoolingCase withRelativeHumidity(double relativeHumidity) {
        return new CoolingCase(setPointK, ambientK, heatLoadW, sinkResistanceKPerW, coldInterfaceKPerW,
                hotInterfaceKPerW, relativeHumidity);
    }

    /** The same case with another heat load, W, ≥ 0. */
    public CoolingCase withHeatLoadW(double heatLoadW) {
        return new CoolingCase(setPointK, ambientK, heatLoadW, sinkResistanceKPerW, coldInterfaceKPerW,
                hotInterfaceKPerW, relativeHumidity);
    }

    /** Whether the humidity is known. */
    public boolean hasRelativeHumidity() {
        return !Double.isNaN(relativeHumidity);
    }

    /** Total hot-side resistance Rh = hot interface + heat sink, K/W (resistances in series). */
    public double hotPathKPerW() {
        return hotInterfaceKPerW + sinkResistanceKPerW;
    }

    /** Cold-face temperature needed to hold the object at its set-point with this load, K: Tc = Tobj − Q·Rint,c. */
    public double coldSideAtLoadK() {
        return setPointK - heatLoadW * coldInterfaceKPerW;
    }
}
