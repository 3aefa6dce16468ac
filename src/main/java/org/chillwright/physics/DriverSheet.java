package org.chillwright.physics;

import java.util.List;

/**
 * What an electronics engineer needs to build the driver and the temperature loop of a chosen design (see
 * {@link DriverSheetCalculator}). Values come from the lumped model: confirm them on the built assembly.
 *
 * @param designCurrentA       current at the design point (hottest ambient, design load), A
 * @param designVoltageV       terminal voltage there, V
 * @param designPowerW         electrical power there, W
 * @param currentLimitA        the current to limit the driver at, A
 * @param currentLimitBasis    what sets it
 * @param voltageLimitV        terminal voltage at the current limit in the hottest steady state with the design
 *                             load, V: the compliance the driver needs; NaN when that current has no steady state
 * @param voltageWithinSupply  whether the supply's maximum voltage covers it (true when none is given)
 * @param heating              the reversed-current check on the coldest day; null when no coldest day was given
 * @param needsHBridge         whether the driver must also reverse the current (cooling at the design point and
 *                             heating on the coldest day)
 * @param timeConstantS        thermal time constant of the part at the design current, s (the cool-down's
 *                             slowest; the loop's plant pole is 1/τ)
 * @param gainKPerA            static gain of the plant at the design point: d(set-point temperature)/d(current) at
 *                             constant load, K/A (negative: more current, colder)
 * @param hotSideTripK         hot-face temperature at which an independent cut-off should switch the module off, K
 * @param tripBasis            what sets it
 * @param hotInterfaceDropK    the hot face runs this much above the heat-sink base at the design point, K: a trip
 *                             sensor on the sink base should trip this much lower
 * @param sensorPlacementNote  where to put the control and trip sensors, as text
 * @param cautions             the usual cautions, as text
 */
public record DriverSheet(double designCurrentA, double designVoltageV, double designPowerW, double currentLimitA,
                          CurrentLimitBasis currentLimitBasis, double voltageLimitV, boolean voltageWithinSupply,
                          HeatingCheck.Result heating, boolean needsHBridge, double timeConstantS, double gainKPerA,
                          double hotSideTripK, TripBasis tripBasis, double hotInterfaceDropK,
                          String sensorPlacementNote, List<String> cautions) {

    /** What sets the current limit: the smallest of these. */
    public enum CurrentLimitBasis {
        /** The rated Imax at the terminals (module Imax × parallel strings). */
        RATED_IMAX,
        /** The supply's maximum current. */
        SUPPLY_CURRENT,
        /** The capacity-peak current at the set-point: beyond it more current cools less. */
        CAPACITY_PEAK
    }

    /** What sets the hot-side trip. */
    public enum TripBasis {
        /** The module's stated maximum hot-side temperature. */
        MODULE_MAXIMUM,
        /** The design hot side plus a margin (common practice, no source), the module stating no maximum below it. */
        DESIGN_PLUS_MARGIN
    }

    public DriverSheet {
        cautions = List.copyOf(cautions);
    }
}
