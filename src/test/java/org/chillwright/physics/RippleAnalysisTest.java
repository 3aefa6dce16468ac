package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Drives against a linear supply. The RMS formulas are derived in {@link Drive}; here they are checked against a
 * numerical integration of each waveform written in the test (midpoint rule over one period). Module TM-A of
 * check-cases.json (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K).
 */
class RippleAnalysisTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final ModuleArray ONE = ModuleArray.single(TM_A);
    /** 5 °C set-point at 25 °C, 10 W, 0.3 K/W sink: the set-up of check case S10. */
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
    private static final int STEPS = 1_000_000;
    private final RippleAnalysis analysis = new RippleAnalysis();

    @ParameterizedTest(name = "r = {0}")
    @ValueSource(doubles = {0, 0.1, 0.3, 1, 2})
    void triangularRippleRmsMatchesTheIntegratedWaveform(double r) {
        double averageA = 2.0;
        double amplitudeA = r * averageA / 2;
        double sum = 0;
        double sumOfSquares = 0;
        double peak = 0;
        for (int n = 0; n < STEPS; n++) {
            double phase = (n + 0.5) / STEPS;                       // one period, midpoints
            double triangle = phase < 0.5 ? -1 + 4 * phase : 3 - 4 * phase; // −1 → +1 → −1, zero mean
            double i = averageA + amplitudeA * triangle;
            sum += i;
            sumOfSquares += i * i;
            peak = Math.max(peak, i);
        }
        double mean = sum / STEPS;
        var drive = new Drive.Ripple(r);
        assertThat(mean).isCloseTo(averageA, within(1e-9));
        assertThat(sumOfSquares / STEPS / (mean * mean)).isCloseTo(drive.jouleFactor(), within(1e-9));
        assertThat(peak / mean).isCloseTo(drive.peakFactor(), within(1e-5));
    }

    @ParameterizedTest(name = "D = {0}")
    @ValueSource(doubles = {0.1, 0.25, 0.5, 0.9, 1})
    void unfilteredPwmRmsMatchesTheIntegratedWaveform(double duty) {
        double peakA = 3.0;
        double sum = 0;
        double sumOfSquares = 0;
        for (int n = 0; n < STEPS; n++) {
            double phase = (n + 0.5) / STEPS;
            double i = phase < duty ? peakA : 0.0;
            sum += i;
            sumOfSquares += i * i;
        }
        double mean = sum / STEPS;
        var drive = new Drive.Pwm(duty, 25_000);
        assertThat(sumOfSquares / STEPS / (mean * mean)).isCloseTo(drive.jouleFactor(), within(1e-9));
        assertThat(peakA / mean).isCloseTo(drive.peakFactor(), within(1e-9));
    }

    @Test
    void noRippleIsExactlyALinearSupply() {
        RippleEffect effect = analysis.analyse(ONE, S10, DriveLimits.ofRatedImaxA(3.8), new Drive.Ripple(0));
        assertThat(effect.driven()).isEqualTo(effect.linear());
        assertThat(effect.capacityLossFraction()).isZero();
        assertThat(effect.copLossFraction()).isZero();
        assertThat(effect.warnings()).isEmpty();
    }

    @Test
    void fullDutyPwmIsExactlyALinearSupply() {
        RippleEffect effect = analysis.analyse(ONE, S10, DriveLimits.ofRatedImaxA(3.8), new Drive.Pwm(1, 25_000));
        assertThat(effect.driven()).isEqualTo(effect.linear());
        assertThat(effect.capacityLossFraction()).isZero();
        assertThat(effect.copLossFraction()).isZero();
    }

    @Test
    void capacityLossMatchesTheClosedFormWithAnIdealSink() {
        // With an ideal sink and no interface the junctions sit at the set-point and ambient, and the largest
        // cooling is S²Tc²/(2R) − KΔT (Ioffe 1957's maximum-performance relations); the drive puts Irms²/Iavg²·R in the Joule term.
        var ideal = new CoolingCase(278.15, 298.15, 5, 0, 0, 0);
        var drive = new Drive.Pwm(0.6, 25_000);
        RippleEffect effect = analysis.analyse(ONE, ideal, DriveLimits.NONE, drive);
        double s = 0.04;
        double r = 2.4;
        double k = 0.25;
        double steadyW = s * s * 278.15 * 278.15 / (2 * r) - k * 20;
        double drivenW = s * s * 278.15 * 278.15 / (2 * r * drive.jouleFactor()) - k * 20;
        assertThat(effect.capacityLossFraction()).isCloseTo(1 - drivenW / steadyW, within(1e-9));
    }

    @Test
    void theDrivenPointPaysTheRmsJouleHeatOnTheAverageVoltage() {
        // Identities of the averaged equations (Drive): V = S·ΔT + R·Iavg, P = S·ΔT·Iavg + R·Irms², and the load is
        // still pumped: S·Iavg·Tc − ½R·Irms² − K·ΔT = load.
        var drive = new Drive.Ripple(0.8);
        RippleEffect effect = analysis.analyse(ONE, S10, DriveLimits.NONE, drive);
        Solved d = (Solved) effect.driven();
        double i = d.currentA();
        double dt = d.hotSideK() - d.coldSideK();
        assertThat(d.voltageV()).isCloseTo(0.04 * dt + 2.4 * i, within(1e-9));
        assertThat(d.powerW()).isCloseTo(0.04 * dt * i + 2.4 * effect.rmsCurrentA() * effect.rmsCurrentA(),
                within(1e-9));
        assertThat(0.04 * i * d.coldSideK() - 0.5 * 2.4 * i * i * drive.jouleFactor() - 0.25 * dt)
                .isCloseTo(10, within(1e-7));
        assertThat(effect.peakCurrentA()).isCloseTo(1.4 * i, within(1e-12));
    }

    @Test
    void tenPercentRippleCostsLittleAndRaisesNoWarning() {
        // common practice, no source (common practice): ripple below about 10 % costs well under 1 %.
        RippleEffect effect = analysis.analyse(ONE, S10, DriveLimits.ofRatedImaxA(3.8), new Drive.Ripple(0.1));
        assertThat(effect.capacityLossFraction()).isBetween(0.0, 0.01);
        assertThat(effect.copLossFraction()).isBetween(0.0, 0.01);
        assertThat(effect.warnings()).isEmpty();
    }

    @Test
    void halfDutyPwmLosesMoreThanTenPercentAndSaysSo() {
        RippleEffect effect = analysis.analyse(ONE, S10.withHeatLoadW(4), DriveLimits.NONE, new Drive.Pwm(0.5, 25_000));
        assertThat(effect.jouleFactor()).isEqualTo(2.0);
        assertThat(effect.capacityLossFraction()).isGreaterThan(0.10);
        assertThat(effect.hasWarning(Warning.Code.DRIVE_LOSS)).isTrue();
        assertThat(effect.hasWarning(Warning.Code.SLOW_PWM)).isFalse();
    }

    @Test
    void aDriveThatCannotHoldTheLoadIsInfeasibleAndSaysSo() {
        RippleEffect effect = analysis.analyse(ONE, S10, DriveLimits.NONE, new Drive.Pwm(0.2, 25_000));
        assertThat(effect.linear().feasible()).isTrue();
        assertThat(effect.driven().feasible()).isFalse();
        assertThat(effect.copLossFraction()).isNaN();
        assertThat(effect.hasWarning(Warning.Code.DRIVE_LOSS)).isTrue();
    }

    @Test
    void slowPwmIsFlagged() {
        RippleEffect effect = analysis.analyse(ONE, S10.withHeatLoadW(2), DriveLimits.NONE, new Drive.Pwm(0.9, 500));
        assertThat(effect.hasWarning(Warning.Code.SLOW_PWM)).isTrue();
    }

    @Test
    void peaksAboveTheSupplyVoltageMakeTheDrivenPointInfeasible() {
        var limits = new DriveLimits(Double.NaN, 6, Double.NaN, Double.NaN);
        RippleEffect effect = analysis.analyse(ONE, S10.withHeatLoadW(4), limits, new Drive.Pwm(0.5, 25_000));
        assertThat(effect.linear().feasible()).isTrue();
        assertThat(effect.driven()).isInstanceOfSatisfying(Infeasible.class,
                i -> assertThat(i.reason()).isEqualTo(Reason.SUPPLY_VOLTAGE_EXCEEDED));
    }

    @Test
    void peaksAboveTheRatedImaxAreFlagged() {
        RippleEffect effect = analysis.analyse(ONE, S10.withHeatLoadW(4), DriveLimits.ofRatedImaxA(2.0),
                new Drive.Pwm(0.5, 25_000));
        assertThat(effect.driven().feasible()).isTrue(); // the average is within the rating, the peaks are not
        assertThat(effect.peakCurrentA()).isGreaterThan(2.0);
        assertThat(effect.hasWarning(Warning.Code.PEAK_ABOVE_IMAX)).isTrue();
    }

    @Test
    void rejectsAZeroDutyNamingIt() {
        assertThatThrownBy(() -> new Drive.Pwm(0, 25_000))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> assertThat(e.field()).isEqualTo("duty"));
    }

    @Test
    void rejectsARippleThatWouldReverseTheCurrentNamingIt() {
        assertThatThrownBy(() -> new Drive.Ripple(2.5)).isInstanceOfSatisfying(InvalidQuantityException.class,
                e -> assertThat(e.field()).isEqualTo("peakToPeakFraction"));
    }
}
