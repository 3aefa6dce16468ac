package org.chillwright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Risks of a generator design that do not change its operating point: a hot junction above the module's
 * stated maximum temperature (warned, not refused: the source is what it is, and the person decides), a
 * module that states no maximum (its limit is then unchecked), and an array voltage above the
 * extra-low-voltage limit ({@link SafetyLimits}).
 */
public final class GeneratorRisks {

    private GeneratorRisks() {
    }

    /**
     * The warnings of one design.
     *
     * @param openCircuitV            array voltage with the load disconnected, V (its highest)
     * @param openCircuitHotJunctionK hot junction with the load disconnected, K (its hottest: current draws
     *                                Peltier heat out of the hot face)
     * @param maxHotSideK             the module's stated maximum temperature, K, or NaN when it states none
     */
    public static List<Warning> of(double openCircuitV, double openCircuitHotJunctionK, double maxHotSideK) {
        var warnings = new ArrayList<Warning>(2);
        if (Double.isNaN(maxHotSideK)) {
            warnings.add(new Warning(Warning.Code.HOT_SIDE_LIMIT_UNCHECKED, String.format(Locale.ROOT,
                    "the module states no maximum temperature, so its hot face (up to %.1f °C with the load"
                            + " disconnected) is unchecked: ask the supplier for the limit before building",
                    Units.celsiusFromKelvin(openCircuitHotJunctionK))));
        } else if (openCircuitHotJunctionK > maxHotSideK) {
            warnings.add(new Warning(Warning.Code.HOT_SIDE_ABOVE_LIMIT, String.format(Locale.ROOT,
                    "with the load disconnected the hot face reaches %.1f °C, above the module's stated maximum of"
                            + " %.1f °C: add resistance or a spreader on the hot side, or choose a module rated for"
                            + " the source", Units.celsiusFromKelvin(openCircuitHotJunctionK),
                    Units.celsiusFromKelvin(maxHotSideK))));
        }
        if (SafetyLimits.isShockHazard(openCircuitV)) {
            warnings.add(SafetyLimits.shockHazard("the open-circuit voltage", openCircuitV));
        }
        return List.copyOf(warnings);
    }
}
