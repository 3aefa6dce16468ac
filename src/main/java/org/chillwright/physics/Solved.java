package org.chillwright.physics;

import java.util.List;

/**
 * A feasible steady operating point of a cooler (module or array, terminal values) against a
 * {@link CoolingCase} (see {@link OperatingPointSolver}). Temperatures in K.
 *
 * @param currentA              terminal current, A (0 in the passive case)
 * @param voltageV              terminal voltage V = S(Th − Tc) + I·R, V
 * @param powerW                electrical input power, W
 * @param cop                   Qc/P; +∞ when no power is needed (passive case)
 * @param setPointK               object temperature, K (the set-point, or the one reached at fixed drive)
 * @param coldSideK             cold-face temperature, K
 * @param hotSideK              hot-face temperature, K
 * @param heatRejectedW         heat into the hot-side path Qh = Qc + P, W
 * @param heatLoadW             heat pumped from the object, W
 * @param fractionOfImax        current / rated Imax (0.5 = half); NaN when no rating was given
 * @param maxHeatLoadW          most heat the cooler can remove while holding the object at setPointK with
 *                              this heat sink (cold-interface drop included), W
 * @param currentAtMaxHeatLoadA current at that most heat, A
 * @param marginK               how much colder than setPointK the object could be held at the same load with
 *                              the current limited to min(capacity-peak current, rated Imax, supply current), K
 * @param copOptimalCurrentA    current of best COP at the solved junction temperatures, A (Ioffe 1957)
 * @param maxCop                best COP at the solved junction temperatures (Ioffe 1957)
 * @param dewPointK             dew point of the ambient air, K; NaN when the humidity is unknown
 * @param frostPointK           frost point of the ambient air, K, when its dew point is below 0 °C; else NaN
 * @param warnings              risks, empty when none
 * @param perModule             what one module of the array carries
 */
public record Solved(double currentA, double voltageV, double powerW, double cop, double setPointK, double coldSideK,
                     double hotSideK, double heatRejectedW, double heatLoadW, double fractionOfImax,
                     double maxHeatLoadW, double currentAtMaxHeatLoadA, double marginK, double copOptimalCurrentA,
                     double maxCop, double dewPointK, double frostPointK, List<Warning> warnings,
                     ModuleShare perModule)
        implements OperatingPoint {

    public Solved {
        warnings = List.copyOf(warnings);
    }

    /**
     * Spare capacity as a percentage of the load: (maxHeatLoadW − heatLoadW)/heatLoadW·100;
     * +∞ for a zero load.
     */
    public double loadMarginPct() {
        return heatLoadW > 0 ? Units.percentFromFraction((maxHeatLoadW - heatLoadW) / heatLoadW)
                : Double.POSITIVE_INFINITY;
    }

    /** Whether a warning of this kind was raised. */
    public boolean hasWarning(Warning.Code code) {
        return warnings.stream().anyMatch(w -> w.code() == code);
    }
}
