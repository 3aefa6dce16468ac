package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/**
 * Generator points over random modules, series × parallel arrays up to 8 × 8, heat-exchanger resistances of
 * 0 to 5 K/W on each side and source-to-sink differences up to 1,200 K. Every point must be physically
 * possible, and the most power must equal what a brute-force scan of the raw node equations finds
 * ({@link GeneratorBruteForce}, which shares nothing with the solver).
 */
class GeneratorProperties {

    /** Relative agreement of the solver's and the scan's most power: the scan's grid leaves ~1e-9. */
    private static final double POWER_AGREEMENT = 1e-6;

    private final GeneratorSolver solver = new GeneratorSolver();

    @Property(tries = 10_000)
    void everyMaxPowerPointIsPhysicalAndMatchesABruteForceScan(
            @ForAll @DoubleRange(min = 0.01, max = 0.1) double seebeckVPerK,
            @ForAll @DoubleRange(min = 0.2, max = 1.5) double figureOfMeritAt300K,
            @ForAll @DoubleRange(min = 0.05, max = 2) double conductanceWPerK,
            @ForAll @IntRange(min = 1, max = 8) int series,
            @ForAll @IntRange(min = 1, max = 8) int parallel,
            @ForAll @DoubleRange(min = 0, max = 5) double hotKPerW,
            @ForAll @DoubleRange(min = 0, max = 5) double coldKPerW,
            @ForAll @DoubleRange(min = 230, max = 350) double sinkK,
            @ForAll @DoubleRange(min = 0.5, max = 1200) double differenceK) {
        // R from Z·T = S²·T/(R·K): modules with a ZT of 0.2 to 1.5 at 300 K, as real materials have
        double resistanceOhm = seebeckVPerK * seebeckVPerK * 300 / (figureOfMeritAt300K * conductanceWPerK);
        ModuleParameters array = new ModuleParameters(seebeckVPerK, resistanceOhm, conductanceWPerK)
                .inArray(series, parallel);
        var c = new GeneratorCase(sinkK + differenceK, sinkK, hotKPerW, coldKPerW);

        GeneratorPoint best = solver.maxPower(array, c);
        GeneratorBruteForce.assertPhysical(array, c, best);
        GeneratorBruteForce.assertPhysical(array, c, solver.maxEfficiency(array, c));
        double scannedW = GeneratorBruteForce.scanMaxPowerW(array, c);
        assertThat(best.powerW()).as("most power for %s in %s", array, c)
                .isCloseTo(scannedW, within(POWER_AGREEMENT * scannedW));
    }

    /**
     * A large, well-conducting array behind poor exchangers: the junctions see under 2 K of the 1,200 K, and the
     * best current is 1.19 A against a short-circuit bound of 7,100 A. A scan spaced only in I once missed it.
     */
    @Example
    void findsTheNarrowPeakOfAWellConductingArrayBehindPoorExchangers() {
        var array = new ModuleParameters(0.05, 0.00843644544431946, 70.0);
        var c = new GeneratorCase(1432.03, 232.03, 3.8, 5.0);

        GeneratorPoint best = solver.maxPower(array, c);

        GeneratorBruteForce.assertPhysical(array, c, best);
        double scannedW = GeneratorBruteForce.scanMaxPowerW(array, c);
        assertThat(scannedW).isGreaterThan(0.05);
        assertThat(best.powerW()).isCloseTo(scannedW, within(POWER_AGREEMENT * scannedW));
    }

    /** A hot face on its source (0 K/W) sits an ulp either side of it; the scan must not drop those points. */
    @Example
    void findsThePeakWithTheHotFaceOnItsSource() {
        var array = new ModuleParameters(0.08, 0.8875739644970414, 8.32);
        var c = new GeneratorCase(230.51, 230.0, 0.0, 0.4);

        GeneratorPoint best = solver.maxPower(array, c);

        GeneratorBruteForce.assertPhysical(array, c, best);
        double scannedW = GeneratorBruteForce.scanMaxPowerW(array, c);
        assertThat(best.powerW()).isCloseTo(scannedW, within(POWER_AGREEMENT * scannedW));
    }

    /** A source half a nanokelvin above its sink gives next to nothing, and a point that is still physical. */
    @Example
    void aSourceNanokelvinAboveTheSinkGivesAPhysicalPoint() {
        var module = new ModuleParameters(0.01, 0.5, 0.2);
        var c = new GeneratorCase(285.0000000005, 285.0, 5.0, 5.0);

        GeneratorPoint best = solver.maxPower(module, c);

        GeneratorBruteForce.assertPhysical(module, c, best);
        assertThat(best.powerW()).isBetween(0.0, 1e-20);
    }
}
