package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Charging a storage at constant power: the integrator against closed forms and a brute-force integration
 * written here. The capacitor's energy is E = ½CV² (D. Halliday, R. Resnick &amp; J. Walker, Fundamentals of
 * Physics, ch. 25, from memory); the closed forms with leakage are derived in {@link CapacitorStorage} and
 * below.
 */
class StorageChargingTest {

    private static final double C_F = 0.47;
    private static final double V1 = 1.8;
    private static final double V2 = 4.2;
    /** A device whose turn-on level lies above full, so it stays off and only the charging is seen. */
    private static final DutyCycledDevice NEVER_ON = new DutyCycledDevice(0, 0, 100, 60);

    private static final StorageIntegrator.Listener QUIET = new StorageIntegrator.Listener() {
        @Override
        public void deviceOn(double timeS) {
        }

        @Override
        public void deviceOff(double timeS, StorageIntegrator.OffCause cause) {
        }
    };

    @ParameterizedTest(name = "P = {0} W")
    @CsvSource({"1e-6", "3.3e-4", "0.05", "2"})
    void withoutLeakageTheChargeTimeIsTheEnergyOverThePower(double powerW) {
        // Source: E = ½CV² (Halliday, Resnick & Walker, from memory) and E = P·t, so t = C(V2² − V1²)/(2P).
        double expectedS = (0.5 * C_F * V2 * V2 - 0.5 * C_F * V1 * V1) / powerW;
        assertThat(CapacitorStorage.chargeTimeS(C_F, Double.POSITIVE_INFINITY, V1, V2, powerW).getAsDouble())
                .isCloseTo(expectedS, within(expectedS * 1e-14));
        var cap = new CapacitorStorage(C_F, 0, 5, Double.POSITIVE_INFINITY, 0);
        assertThat(reachS(cap, powerW)).isCloseTo(expectedS, within(expectedS * 1e-12));
        assertThat(simulatedVoltageV(cap, powerW, expectedS)).isCloseTo(V2, within(V2 * 1e-12));
    }

    @ParameterizedTest(name = "R = {0} ohm")
    @CsvSource({"1e3", "1e5", "1e7"})
    void withALeakageResistanceTheIntegratorMatchesTheClosedForm(double leakOhm) {
        double powerW = 0.02; // P·R = 20 V² at 1 kΩ, above V2² = 17.6 V²: reachable
        var cap = new CapacitorStorage(C_F, 0, 5, leakOhm, 0);
        double closedS = CapacitorStorage.chargeTimeS(C_F, leakOhm, V1, V2, powerW).getAsDouble();
        assertThat(reachS(cap, powerW)).isCloseTo(closedS, within(closedS * 1e-10));
        assertThat(simulatedVoltageV(cap, powerW, closedS)).isCloseTo(V2, within(V2 * 1e-10));
    }

    @Test
    void theLeakageResistanceClosedFormAgreesWithABruteForceIntegration() {
        // Brute force: C·V·dV/dt = P − V²/R integrated with 200,000 midpoint steps in V (dt = C·V·dV/(P − V²/R)).
        double powerW = 0.02;
        double leakOhm = 1000;
        int n = 200_000;
        double dv = (V2 - V1) / n;
        double t = 0;
        for (int i = 0; i < n; i++) {
            double v = V1 + (i + 0.5) * dv;
            t += C_F * v * dv / (powerW - v * v / leakOhm);
        }
        assertThat(CapacitorStorage.chargeTimeS(C_F, leakOhm, V1, V2, powerW).getAsDouble())
                .isCloseTo(t, within(t * 1e-6));
    }

    @Test
    void theLeakageResistanceClosedFormTendsToTheLosslessOneForALargeResistance() {
        double lossless = CapacitorStorage.chargeTimeS(C_F, Double.POSITIVE_INFINITY, V1, V2, 0.02).getAsDouble();
        assertThat(CapacitorStorage.chargeTimeS(C_F, 1e12, V1, V2, 0.02).getAsDouble())
                .isCloseTo(lossless, within(lossless * 1e-8));
    }

    @Test
    void aLeakageResistanceThatTakesThePowerBeforeTheTargetVoltageNeverGetsThere() {
        // V² settles at P·R = 0.01 W × 1 kΩ = 10 V², below V2² = 17.64 V².
        assertThat(CapacitorStorage.chargeTimeS(C_F, 1000, V1, V2, 0.01)).isEmpty();
        assertThat(reachS(new CapacitorStorage(C_F, 0, 5, 1000, 0), 0.01)).isNaN();
    }

    @ParameterizedTest(name = "I = {0} A")
    @CsvSource({"1e-6", "1e-4", "2e-3"})
    void withALeakageCurrentTheRungeKuttaStepsMatchTheClosedForm(double leakA) {
        // Derived here: C·V·dV/dt = P − I·V. With x = √E, dE/dt = P − b·x, b = I·√(2/C), so
        // dt = 2x·dx/(P − b·x) and t = (2P/b²)·ln((P − b·x1)/(P − b·x2)) − (2/b)(x2 − x1).
        double powerW = 0.02;
        double b = leakA * Math.sqrt(2 / C_F);
        double x1 = Math.sqrt(0.5 * C_F * V1 * V1);
        double x2 = Math.sqrt(0.5 * C_F * V2 * V2);
        double closedS = 2 * powerW / (b * b) * Math.log((powerW - b * x1) / (powerW - b * x2)) - 2 / b * (x2 - x1);
        var cap = new CapacitorStorage(C_F, 0, 5, Double.POSITIVE_INFINITY, leakA);
        assertThat(reachS(cap, powerW)).isCloseTo(closedS, within(closedS * 1e-7));
        assertThat(simulatedVoltageV(cap, powerW, closedS)).isCloseTo(V2, within(V2 * 1e-7));
    }

    @Test
    void aCellChargesLinearlyAtItsEfficiencyAndAcceptance() {
        // Derived: a constant-voltage store takes η·min(P, Imax·V); 120 mAh at 3.7 V holds 120 × 3.6 × 3.7 J.
        var cell = CellStorage.ofMilliampHours(120, 3.7, 0.01, 0.9, 0.2, 0);
        assertThat(cell.capacityJ()).isCloseTo(1598.4, within(1e-9));
        double acceptedW = 0.037; // capped at 10 mA × 3.7 V from the 0.05 W offered
        var flows = StorageFlows.of(cell, NEVER_ON, false, 0.05);
        assertThat(flows.inW()).isCloseTo(0.9 * acceptedW, within(1e-15));
        double expectedS = (cell.fullJ() - cell.floorJ()) / (0.9 * acceptedW);
        assertThat(StorageIntegrator.timeToReachS(flows, cell.floorJ(), cell.fullJ(), 1e-6).getAsDouble())
                .isCloseTo(expectedS, within(expectedS * 1e-12));
    }

    /** Time for the integrator to charge from V1 to V2 at a constant power, s; NaN when never. */
    private static double reachS(CapacitorStorage cap, double powerW) {
        var flows = StorageFlows.of(cap, NEVER_ON, false, powerW);
        var t = StorageIntegrator.timeToReachS(flows, cap.energyAtJ(V1), cap.energyAtJ(V2), 1e-6 * cap.fullJ());
        return t.isPresent() ? t.getAsDouble() : Double.NaN;
    }

    /** Voltage after simulating a constant power from V1 for a time, V. */
    private static double simulatedVoltageV(CapacitorStorage cap, double powerW, double timeS) {
        var integrator = new StorageIntegrator(cap, NEVER_ON, 0, cap.energyAtJ(V1), QUIET);
        integrator.advance(timeS, powerW, powerW);
        return cap.voltageAtV(integrator.storedJ);
    }
}
