package org.chillwright.physics;

/**
 * Which three of the four maximum ratings fix the lumped parameters (physics.md section b,
 * "Published/used variants"). The variants differ when a catalogue entry's ratings are mutually
 * inconsistent (see {@link MaxRatings#consistency()}).
 */
public enum RatingsMethod {

    /**
     * From Imax, Vmax and ΔTmax: S = Vmax/Th, R = S(Th − ΔTmax)/Imax, K = S·Imax(Th − ΔTmax)/(2ΔTmax).
     * Source: S. Luo, "A simple method to estimate the physical characteristics of a thermoelectric
     * cooler from vendor datasheets", Electronics Cooling, 2008 (from memory); re-derived in
     * physics.md b. The default, because Vmax and Imax are measured most directly.
     */
    IMAX_VMAX_DTMAX,

    /**
     * From Qmax, Imax and ΔTmax: S = 2Qmax/(Imax(Th + ΔTmax)), then R and K as above.
     * Source: H.S. Lee, Thermoelectrics: Design and Materials, Wiley, 2016, sec. 3.5 "Effective
     * Material Properties" (formulas from memory); re-derived in physics.md b. Needs Qmax.
     */
    QMAX_IMAX_DTMAX
}
