package org.chillwright.physics;

import java.util.List;

/**
 * A simulation of a harvesting system over a temperature schedule.
 *
 * @param samples      the state at the start and at the end of every step, in time order
 * @param offIntervals the stretches with the device off, in time order; brown-outs less than one time step apart
 *                     are merged into one stretch (the chart's resolution)
 * @param totals       where the energy went
 * @param eventsFired  events the device carried out
 * @param brownOuts    times the device was cut off after running
 */
public record SimulationResult(List<SimulationSample> samples, List<OffInterval> offIntervals, EnergyTotals totals,
                               int eventsFired, int brownOuts) {

    public SimulationResult {
        samples = List.copyOf(samples);
        offIntervals = List.copyOf(offIntervals);
    }

    /** Total time with the device off, s (merged brown-outs count whole, with their short on-times). */
    public double offS() {
        return offIntervals.stream().mapToDouble(OffInterval::durationS).sum();
    }
}
