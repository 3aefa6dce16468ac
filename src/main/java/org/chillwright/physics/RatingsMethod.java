package org.chillwright.physics;

/**
 * Which three of the four maximum ratings fix the lumped parameters. Both variants are re-derived here
 * from the ideal module equations (A.F. Ioffe, 1957; H.J. Goldsmid, Introduction to Thermoelectricity,
 * 2016; from memory) with ΔTmax reached at Imax = S·(Th − ΔTmax)/R. They differ when a catalogue entry's
 * ratings are mutually inconsistent (see {@link MaxRatings#consistency()}).
 */
public enum RatingsMethod {

    /**
     * From Imax, Vmax and ΔTmax: S = Vmax/Th, R = S(Th − ΔTmax)/Imax, K = S·Imax(Th − ΔTmax)/(2ΔTmax).
     * Source: S. Luo, "A simple method to estimate the physical characteristics of a thermoelectric
     * cooler from vendor datasheets", Electronics Cooling, 2008 (from memory); re-derived from Vmax = S·Th
     * at (Imax, ΔTmax). The default, because Vmax and Imax are measured most directly.
     */
    IMAX_VMAX_DTMAX,

    /**
     * From Qmax, Imax and ΔTmax: S = 2Qmax/(Imax(Th + ΔTmax)), then R and K as above.
     * Source: H.S. Lee, Thermoelectrics: Design and Materials, Wiley, 2016, sec. 3.5 "Effective
     * Material Properties" (formulas from memory). Needs Qmax.
     *
     * <p><b>Assumption: Qmax was measured at Imax</b> (the ΔTmax current) with ΔT = 0. Derivation: at ΔT = 0,
     * Qc = S·I·Th − ½I²R; at I = Imax = S·(Th − ΔTmax)/R this is S·Imax·Th − ½S·Imax·(Th − ΔTmax) =
     * S·Imax·(Th + ΔTmax)/2 = Qmax. A supplier that lists instead the absolute maximum of Qc at ΔT = 0 (at
     * I = S·Th/R) quotes a Qmax larger by Th²/(Th² − ΔTmax²), about 6 % at Th = 300 K and ΔTmax = 70 K; with
     * such a Qmax this method gives S, R and K all too high by that factor (Z is unchanged).
     */
    QMAX_IMAX_DTMAX
}
