package org.chillwright.physics;

import java.util.OptionalDouble;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;

/**
 * Steps a storage and its device through time at a constant converter output per call (see
 * {@link StorageFlows} for the rate equation), keeping every energy term apart so the books balance.
 *
 * <p><b>Integration.</b> When the rate is linear in E (a cell; a capacitor whose draws are constant powers and
 * a leakage resistance) each stretch is stepped exactly: E(h) = E0 + (d − c·E0)·φ1(h) and ∫E dt =
 * E0·h + (d − c·E0)·φ2(h), with φ1 = (1 − e^{−ch})/c and φ2 = (h − φ1)/c (series for small c·h). Exact steps
 * have no truncation error, so a stretch of any length is one step. When a current is drawn at a capacitor's
 * voltage the rate has a √E term; its closed-form time has no elementary inverse, so the stretch is split into
 * classical fourth-order Runge–Kutta steps that change E by at most {@value #MAX_RELATIVE_CHANGE} of itself and
 * keep h·|∂f/∂E| ≤ {@value #MAX_STIFF_STEP}. The same Runge–Kutta stages also integrate ∫√E dt and ∫E dt;
 * a Runge–Kutta method keeps linear invariants, so the stored change equals inflow minus draws to rounding.
 *
 * <p><b>Thresholds.</b> Full, the device's turn-on level, its cut-off (the floor) and empty are found inside a
 * step by a bracketing Brent root in time, on the side past the threshold, and the state changes there.
 * Full holds the storage and turns the surplus away; empty holds it at zero with the leakage limited to what
 * comes in. The sliver by which a crossing passes full or empty (the energy of at most
 * {@value #TIME_ACCURACY_S} s) is booked as turned away or as not leaked, so the storage never leaves
 * [0, full] and the books still balance.
 *
 * <p><b>Device.</b> Off at the start unless the storage already holds one event above the floor; it turns on
 * when the storage reaches that level (a supervisor's power-good threshold; common practice, no source), fires
 * its first event at once and then one every interval; it is cut off (a brown-out) when the storage falls to
 * the floor, or when an event comes due and the storage cannot pay it without going below the floor. While off
 * it draws nothing.
 */
final class StorageIntegrator {

    /** Largest change of E per Runge–Kutta step, as a fraction of E: RK4's local error is then about 1e-10 of E. */
    static final double MAX_RELATIVE_CHANGE = 0.01;
    /** Largest h·|∂f/∂E| per Runge–Kutta step: well inside RK4's stability region (2.78) and accurate. */
    static final double MAX_STIFF_STEP = 0.1;
    /** Energies below this fraction of full are treated as this size when choosing a step near empty. */
    static final double ENERGY_SCALE_OF_FULL = 1e-6;
    /** Accuracy of a threshold crossing in time, s: a nanosecond, far below any event or chart resolution. */
    static final double TIME_ACCURACY_S = 1e-9;
    /** Relative accuracy of a threshold crossing in time. */
    static final double TIME_RELATIVE_ACCURACY = 1e-14;
    /** Evaluation cap of a crossing search; the function is a smooth, monotonic step map. */
    static final int MAX_EVALUATIONS = 200;
    /** Order of the bracketing Brent solver. */
    private static final int SOLVER_ORDER = 5;

    /** Why the device is off. */
    enum OffCause { FIRST_CHARGE, BROWN_OUT }

    /** Told when the device turns on or off. */
    interface Listener {
        void deviceOn(double timeS);

        void deviceOff(double timeS, OffCause cause);
    }

    private final EnergyStorage storage;
    private final DutyCycledDevice device;
    private final Listener listener;
    private final double floorJ;
    private final double fullJ;
    private final double turnOnJ;
    private final double energyScaleJ;
    private final double[] step = new double[3];

    double timeS;
    double storedJ;
    boolean deviceOn;
    private boolean full;
    private double nextEventS;

    double generatorJ;
    double converterLossJ;
    double rejectedJ;
    double chargeLossJ;
    double leakageJ;
    double sleepJ;
    double eventsJ;
    int eventsFired;
    int brownOuts;

    StorageIntegrator(EnergyStorage storage, DutyCycledDevice device, double startS, double storedJ,
                      Listener listener) {
        this.storage = storage;
        this.device = device;
        this.listener = listener;
        this.floorJ = storage.floorJ();
        this.fullJ = storage.fullJ();
        this.turnOnJ = floorJ + device.eventEnergyJ();
        this.energyScaleJ = ENERGY_SCALE_OF_FULL * fullJ;
        this.timeS = startS;
        this.storedJ = storedJ;
        this.full = storedJ >= fullJ;
        if (canTurnOn()) {
            turnOn();
        } else {
            listener.deviceOff(startS, OffCause.FIRST_CHARGE);
        }
    }

    /**
     * Runs from the current time to {@code untilS} with a constant generator and converter output.
     *
     * @param generatorW power the generator gives the converter, W
     * @param deliveredW power after the converter, W
     */
    void advance(double untilS, double generatorW, double deliveredW) {
        double spanS = untilS - timeS;
        generatorJ += generatorW * spanS;
        converterLossJ += (generatorW - deliveredW) * spanS;
        while (timeS < untilS) {
            double stopS = deviceOn ? Math.min(untilS, nextEventS) : untilS;
            flow(stopS, deliveredW);
            if (deviceOn && timeS >= nextEventS) {
                eventDue();
            }
        }
    }

    private boolean canTurnOn() {
        return !deviceOn && storedJ >= turnOnJ && turnOnJ <= fullJ;
    }

    /** Continuous charging and draining up to {@code stopS}; returns early when the device turns on or off. */
    private void flow(double stopS, double deliveredW) {
        while (timeS < stopS) {
            StorageFlows f = StorageFlows.of(storage, device, deviceOn, deliveredW);
            double netW = f.netW(storedJ);
            if (canTurnOn()) {
                turnOn();
                return;
            }
            if (deviceOn && storedJ <= floorJ && netW < 0) {
                brownOut();
                return;
            }
            double remainingS = stopS - timeS;
            if (!full && netW >= 0 && storedJ >= fullJ) {
                full = true;
            }
            if (full) {
                if (netW >= 0) {
                    holdFull(f, remainingS);
                    timeS = stopS;
                    return;
                }
                full = false;
            }
            if (storedJ <= 0 && netW <= 0) {
                holdEmpty(f, remainingS);
                timeS = stopS;
                return;
            }
            double h = f.linear() ? remainingS : Math.min(remainingS, rungeKuttaStepS(f, storedJ, netW, energyScaleJ));
            step(f, storedJ, h, step);
            Threshold threshold = ahead(netW);
            boolean crossed = threshold != null
                    && (netW > 0 ? step[0] >= levelJ(threshold) : step[0] <= levelJ(threshold));
            if (crossed) {
                h = crossingS(f, storedJ, h, levelJ(threshold), netW > 0, step);
            }
            book(f, h);
            storedJ = step[0];
            timeS = !crossed && h == remainingS ? stopS : timeS + h;
            if (crossed) {
                reached(threshold, f);
                return;
            }
        }
    }

    /** The levels at which something happens. */
    private enum Threshold { FULL, TURN_ON, FLOOR, EMPTY }

    /** The threshold ahead in the direction the storage moves (null when it does not move). */
    private Threshold ahead(double netW) {
        if (netW > 0) {
            return !deviceOn && turnOnJ <= fullJ ? Threshold.TURN_ON : Threshold.FULL;
        }
        if (netW < 0) {
            return deviceOn ? Threshold.FLOOR : Threshold.EMPTY;
        }
        return null;
    }

    private double levelJ(Threshold threshold) {
        return switch (threshold) {
            case FULL -> fullJ;
            case TURN_ON -> turnOnJ;
            case FLOOR -> floorJ;
            case EMPTY -> 0;
        };
    }

    private void reached(Threshold threshold, StorageFlows f) {
        if (storedJ < 0) {
            notDrawn(f);
        }
        switch (threshold) {
            case FULL -> {
                full = true;
                // the crossing lands up to a nanosecond past full: that sliver was turned away, not stored
                double overJ = storedJ - fullJ;
                double efficiency = f.chargeEfficiency();
                rejectedJ += overJ / efficiency;
                chargeLossJ -= overJ / efficiency - overJ;
                storedJ = fullJ;
            }
            case TURN_ON -> turnOn();
            case FLOOR -> brownOut();
            case EMPTY -> {
                // the next pass holds the storage at zero
            }
        }
    }

    /**
     * A crossing of empty (or of a floor at zero) lands up to a nanosecond below zero: that sliver was never
     * drawn; it comes off the draws in proportion to their rates at zero.
     */
    private void notDrawn(StorageFlows f) {
        double deficitJ = -storedJ;
        double sleepW = f.sleepAtW(0);
        double leakW = f.leakAtW(0);
        double sleepShare = sleepW + leakW > 0 ? sleepW / (sleepW + leakW) : 0;
        sleepJ -= deficitJ * sleepShare;
        leakageJ -= deficitJ * (1 - sleepShare);
        storedJ = 0;
    }

    private void turnOn() {
        deviceOn = true;
        listener.deviceOn(timeS);
        fire();
        nextEventS = timeS + device.eventIntervalS();
    }

    private void eventDue() {
        if (storedJ - device.eventEnergyJ() >= floorJ) {
            fire();
            nextEventS = timeS + device.eventIntervalS();
        } else {
            brownOut();
        }
    }

    private void fire() {
        storedJ -= device.eventEnergyJ();
        eventsJ += device.eventEnergyJ();
        eventsFired++;
        full = false;
    }

    private void brownOut() {
        deviceOn = false;
        brownOuts++;
        listener.deviceOff(timeS, OffCause.BROWN_OUT);
    }

    /** Adds one step's energies to the books; {@link #step} holds E(h), ∫√E dt and ∫E dt. */
    private void book(StorageFlows f, double h) {
        rejectedJ += f.rejectedW() * h;
        chargeLossJ += f.chargeLossW() * h;
        sleepJ += f.sleepW() * h + f.sleepPerRootW() * step[1];
        leakageJ += f.leakW() * h + f.leakPerRootW() * step[1] + f.leakPerS() * step[2];
    }

    /** Full and not falling: E stays, the store takes only what the draws need and the rest is turned away. */
    private void holdFull(StorageFlows f, double h) {
        double sleepW = f.sleepAtW(storedJ);
        double leakW = f.leakAtW(storedJ);
        double acceptedW = (sleepW + leakW) / f.chargeEfficiency();
        sleepJ += sleepW * h;
        leakageJ += leakW * h;
        chargeLossJ += (acceptedW - sleepW - leakW) * h;
        rejectedJ += (f.deliveredW() - acceptedW) * h;
    }

    /** Empty and not rising: E stays at zero, and the draws get only what comes in. */
    private void holdEmpty(StorageFlows f, double h) {
        double sleepW = Math.min(f.sleepAtW(storedJ), f.inW());
        sleepJ += sleepW * h;
        leakageJ += (f.inW() - sleepW) * h;
        rejectedJ += f.rejectedW() * h;
        chargeLossJ += f.chargeLossW() * h;
    }

    /**
     * Time for the storage to go from {@code fromJ} up to {@code toJ} with constant flows and no thresholds
     * on the way, s; empty when it never gets there. The rate falls as E grows, so it gets there exactly when
     * the rate at {@code toJ} is positive. Linear rates use the closed form of the exact step,
     * t = ln((E∞ − E1)/(E∞ − E2))/c with E∞ = d/c (or (E2 − E1)/d when c = 0); others march Runge–Kutta steps.
     */
    static OptionalDouble timeToReachS(StorageFlows f, double fromJ, double toJ, double energyScaleJ) {
        if (toJ <= fromJ) {
            return OptionalDouble.of(0);
        }
        if (!(f.netW(toJ) > 0)) {
            return OptionalDouble.empty();
        }
        if (f.linear()) {
            double d = f.constantW();
            double c = f.leakPerS();
            if (c == 0) {
                return OptionalDouble.of((toJ - fromJ) / d);
            }
            double finalJ = d / c; // E∞, above toJ since the rate there is positive
            return OptionalDouble.of(Math.log1p((toJ - fromJ) / (finalJ - toJ)) / c);
        }
        double[] out = new double[3];
        double e = fromJ;
        double t = 0;
        while (true) {
            double netW = f.netW(e);
            double h = rungeKuttaStepS(f, e, netW, energyScaleJ);
            step(f, e, h, out);
            if (out[0] >= toJ) {
                return OptionalDouble.of(t + crossingS(f, e, h, toJ, true, out));
            }
            e = out[0];
            t += h;
        }
    }

    /** The Runge–Kutta step length at E: bounded by the relative change and the stiffness limits. */
    private static double rungeKuttaStepS(StorageFlows f, double storedJ, double netW, double energyScaleJ) {
        double scaleJ = Math.max(storedJ, energyScaleJ);
        double h = netW == 0 ? Double.POSITIVE_INFINITY : MAX_RELATIVE_CHANGE * scaleJ / Math.abs(netW);
        double stiffnessPerS = f.leakPerS() + f.perRootW() / (2 * Math.sqrt(scaleJ)); // |∂f/∂E|
        return stiffnessPerS > 0 ? Math.min(h, MAX_STIFF_STEP / stiffnessPerS) : h;
    }

    /**
     * Length of the step from {@code e0} that first reaches {@code targetJ} (on the far side of it), s; leaves
     * that step's results in {@code out}. Falls back to {@code h} (known to cross) if the search fails.
     */
    private static double crossingS(StorageFlows f, double e0, double h, double targetJ, boolean rising,
                                    double[] out) {
        double[] trial = new double[3];
        UnivariateFunction beyondJ = x -> {
            step(f, e0, x, trial);
            return trial[0] - targetJ;
        };
        double x;
        try {
            x = new BracketingNthOrderBrentSolver(TIME_RELATIVE_ACCURACY, TIME_ACCURACY_S, 0, SOLVER_ORDER)
                    .solve(MAX_EVALUATIONS, beyondJ, 0, h, AllowedSolution.RIGHT_SIDE); // per-call state
        } catch (MathIllegalArgumentException | MathIllegalStateException e) {
            x = h;
        }
        step(f, e0, x, out);
        if (rising ? out[0] < targetJ : out[0] > targetJ) {
            x = h;
            step(f, e0, x, out);
        }
        return x;
    }

    /**
     * One step of length h from E0: out = {E(h), ∫√E dt, ∫E dt}. Exact when the rate is linear in E, else
     * one classical Runge–Kutta step on (E, ∫√E, ∫E).
     */
    static void step(StorageFlows f, double e0, double h, double[] out) {
        double d = f.constantW();
        double c = f.leakPerS();
        if (f.linear()) {
            double drift = d - c * e0;
            out[0] = e0 + drift * phi1(c, h);
            out[1] = 0;
            out[2] = e0 * h + drift * phi2(c, h);
            return;
        }
        double b = f.perRootW();
        double e1 = e0;
        double r1 = Math.sqrt(Math.max(0, e1));
        double k1 = d - b * r1 - c * e1;
        double e2 = e0 + 0.5 * h * k1;
        double r2 = Math.sqrt(Math.max(0, e2));
        double k2 = d - b * r2 - c * e2;
        double e3 = e0 + 0.5 * h * k2;
        double r3 = Math.sqrt(Math.max(0, e3));
        double k3 = d - b * r3 - c * e3;
        double e4 = e0 + h * k3;
        double r4 = Math.sqrt(Math.max(0, e4));
        double k4 = d - b * r4 - c * e4;
        out[0] = e0 + h / 6 * (k1 + 2 * k2 + 2 * k3 + k4);
        out[1] = h / 6 * (r1 + 2 * r2 + 2 * r3 + r4);
        out[2] = h / 6 * (e1 + 2 * e2 + 2 * e3 + e4);
    }

    /** φ1 = (1 − e^{−ch})/c, → h as c → 0. */
    static double phi1(double c, double h) {
        return c == 0 ? h : -Math.expm1(-c * h) / c;
    }

    /** φ2 = ∫0^h φ1 = (h − φ1)/c = h²·Σ (−ch)^n/(n + 2)!, by the series while ch &lt; ½ (no cancellation). */
    static double phi2(double c, double h) {
        double x = c * h;
        if (x < 0.5) {
            double term = 0.5;
            double sum = term;
            for (int n = 1; n < 20; n++) {
                term *= -x / (n + 2);
                sum += term;
            }
            return h * h * sum;
        }
        return (h - phi1(c, h)) / c;
    }
}
