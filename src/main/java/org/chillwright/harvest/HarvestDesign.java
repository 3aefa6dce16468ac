package org.chillwright.harvest;

import java.util.List;
import org.chillwright.physics.GeneratorPoint;
import org.chillwright.physics.GeneratorRisks;
import org.chillwright.physics.Warning;

/**
 * One design, {@code seriesCount × parallelCount} identical modules on common plates, as a generator on
 * the load that gives it the most power. Every value is for the whole array at its terminals.
 *
 * @param openCircuitV            terminal voltage with no load, V
 * @param atMaxPower              the operating point: the load of most power (numerical optimum)
 * @param atMaxEfficiency         the point on the load of highest efficiency
 * @param openCircuitHotJunctionK hot-face temperature with the load disconnected, K: the hottest the
 *                                module gets, since current draws Peltier heat out of the hot face
 * @param maxHotSideK             the module's highest allowed hot-side temperature, K, or NaN when unknown
 * @param unitPrice               price of one module at the build quantity, NaN when unknown
 */
public record HarvestDesign(long moduleId, int seriesCount, int parallelCount, double openCircuitV,
                            GeneratorPoint atMaxPower, GeneratorPoint atMaxEfficiency,
                            double openCircuitHotJunctionK, double maxHotSideK, double unitPrice) {

    public int moduleCount() {
        return seriesCount * parallelCount;
    }

    /** Modules × unit price, NaN when the price is unknown. */
    public double arrayCost() {
        return unitPrice * moduleCount();
    }

    /** Array cost per watt at the operating point, NaN when the price is unknown. */
    public double costPerW() {
        return arrayCost() / atMaxPower.powerW();
    }

    /**
     * What to tell the person about this design: a hot face above the module's stated limit or a limit the
     * module does not state, and an open-circuit voltage above the extra-low-voltage limit.
     */
    public List<Warning> warnings() {
        return GeneratorRisks.of(openCircuitV, openCircuitHotJunctionK, maxHotSideK);
    }

    /** Whether one of {@link #warnings()} is of this kind. */
    public boolean hasWarning(Warning.Code code) {
        return warnings().stream().anyMatch(w -> w.code() == code);
    }

    /** The hot face would pass the module's limit (with the load disconnected, its hottest state). */
    public boolean exceedsHotSideLimit() {
        return openCircuitHotJunctionK > maxHotSideK; // false when the limit is unknown (NaN)
    }
}
