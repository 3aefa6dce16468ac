package org.chillwright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The driver sheet of a design: limits, heating, loop plant and protection, from the same models as the operating
 * point (the Ioffe 1957 / Goldsmid 2016 ideal equations; the heat-sink network derived here), the cool-down ({@link CooldownSolver}) and the heating check ({@link HeatingCheck}).
 *
 * <ul>
 * <li><b>Current limit</b>: the smallest of the rated Imax at the terminals, the supply's current and the
 * capacity-peak current at the set-point, beyond which more current cools less (the heat-sink network derived here, "Over-driving").
 * Limiting there is common practice (no source).</li>
 * <li><b>Voltage</b>: the terminal voltage at that current in the hottest steady state with the design load
 * (the fixed-current balance derived here): the compliance the driver needs; during a cool-down ΔT, and with it the voltage, is lower.</li>
 * <li><b>Heating</b>: the reversed current on the coldest day ({@link HeatingCheck}); a design that cools at its
 * design point and must also heat needs a bidirectional driver (an H-bridge).</li>
 * <li><b>Loop plant</b>: the time constant of the part at the design current (the cool-down's slowest) and the
 * static gain d(set-point temperature)/dI at constant load, from the fixed-current system of the fixed-current balance derived here:
 * with A·x = b for x = (Tc, Th), dx/dI = A⁻¹(b' − A'·x), A' = diag(S, −Rh·S), b' = (R·I, Rh·R·I), and the
 * set-point follows Tc (Tset = Tc + Rint,c·load). Derived here; the test checks it against a finite
 * difference.</li>
 * <li><b>Hot-side trip</b>: the design hot face plus {@value #TRIP_MARGIN_K} K (common practice, no source), but
 * never above the module's stated maximum; with no stated maximum, the margin alone.</li>
 * </ul>
 */
public final class DriverSheetCalculator {

    /** Hot-side trip margin above the design hot face, K: common practice (no source). */
    static final double TRIP_MARGIN_K = 10;

    private final OperatingPointSolver solver = new OperatingPointSolver();
    private final CooldownSolver cooldown = new CooldownSolver();
    private final HeatingCheck heatingCheck = new HeatingCheck();

    /**
     * The driver sheet of a design; empty when the design cannot hold its set-point (the operating point from
     * {@link OperatingPointSolver#solve(ModuleArray, CoolingCase, DriveLimits)} then says why).
     *
     * @param array       the modules and their wiring
     * @param coolingCase the design case (hottest ambient, design load)
     * @param limits      limits at the terminals, with the module's maximum hot side if stated
     * @param thermal     heat capacities and leak of the part (for the time constant)
     * @param coldestDay  the coldest day for the heating check, or null for none
     */
    public Optional<DriverSheet> sheet(ModuleArray array, CoolingCase coolingCase, DriveLimits limits,
                                       CooldownSetup thermal, HeatingDemand coldestDay) {
        if (array == null || coolingCase == null || limits == null || thermal == null) {
            String field = array == null ? "array" : coolingCase == null ? "coolingCase" : limits == null ? "limits"
                    : "thermal";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
        if (!(solver.solve(array, coolingCase, limits) instanceof Solved design)) {
            return Optional.empty();
        }
        ModuleParameters module = array.equivalent();

        double limitA = design.currentAtMaxHeatLoadA();
        DriverSheet.CurrentLimitBasis basis = DriverSheet.CurrentLimitBasis.CAPACITY_PEAK;
        if (limits.hasRatedImax() && limits.ratedImaxA() <= limitA) {
            limitA = limits.ratedImaxA();
            basis = DriverSheet.CurrentLimitBasis.RATED_IMAX;
        }
        if (!Double.isNaN(limits.supplyMaxA()) && limits.supplyMaxA() < limitA) {
            limitA = limits.supplyMaxA();
            basis = DriverSheet.CurrentLimitBasis.SUPPLY_CURRENT;
        }
        double voltageV = solver.atCurrent(array, coolingCase, DriveLimits.NONE, limitA) instanceof Solved atLimit
                ? atLimit.voltageV() : Double.NaN;
        boolean withinSupply = Double.isNaN(limits.supplyMaxV()) || voltageV <= limits.supplyMaxV();

        HeatingCheck.Result heating = coldestDay == null ? null : heatingCheck.check(module, coolingCase.setPointK(),
                coldestDay.coldAmbientK(), coldestDay.heatNeededW(), coolingCase.coldInterfaceKPerW(),
                coolingCase.hotPathKPerW(), limits.currentLimitA() < Double.POSITIVE_INFINITY
                        ? limits.currentLimitA() : Double.NaN);
        boolean hBridge = heating != null && heating.needsHeating() && design.currentA() > 0;

        double tauS = cooldown.run(array, coolingCase, thermal, design.currentA(), Double.NaN).timeConstantS();
        double gain = staticGainKPerA(module, coolingCase, design.currentA());

        double tripK = design.hotSideK() + TRIP_MARGIN_K;
        DriverSheet.TripBasis tripBasis = DriverSheet.TripBasis.DESIGN_PLUS_MARGIN;
        if (!Double.isNaN(limits.maxHotSideK()) && limits.maxHotSideK() < tripK) {
            tripK = limits.maxHotSideK();
            tripBasis = DriverSheet.TripBasis.MODULE_MAXIMUM;
        }
        double dropK = design.heatRejectedW() * coolingCase.hotInterfaceKPerW();

        return Optional.of(new DriverSheet(design.currentA(), design.voltageV(), design.powerW(), limitA, basis,
                voltageV, withinSupply, heating, hBridge, tauS, gain, tripK, tripBasis, dropK,
                sensorNote(design, tripK, dropK), cautions(design, limits, tripK)));
    }

    /**
     * d(set-point temperature)/d(current) at a fixed current and constant load, K/A (see the class comment): the
     * derivative of the Cramer solution of the fixed-current balance derived here, dTc/dI = (c1·a22 + K·c2)/det with
     * c1 = R·I − S·Tc and c2 = Rh(R·I + S·Th). NaN when the current has no steady state.
     *
     * @param module      module (or array equivalent) parameters
     * @param coolingCase the case (its load and network; its set-point is not used)
     * @param currentA    terminal current, A, ≥ 0
     */
    public static double staticGainKPerA(ModuleParameters module, CoolingCase coolingCase, double currentA) {
        Check.nonNegative("currentA", currentA);
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double rh = coolingCase.hotPathKPerW();
        double i = currentA;
        double a11 = s * i + k;
        double a22 = 1 + rh * k - rh * s * i;
        double det = a11 * a22 - rh * k * k;
        if (!(det > 0)) {
            return Double.NaN;
        }
        double b1 = coolingCase.heatLoadW() + 0.5 * r * i * i;
        double b2 = coolingCase.ambientK() + 0.5 * rh * r * i * i;
        double tc = (b1 * a22 + k * b2) / det;
        double th = (a11 * b2 + rh * k * b1) / det;
        double c1 = r * i - s * tc;
        double c2 = rh * (r * i + s * th);
        return (c1 * a22 + k * c2) / det;
    }

    private static String sensorNote(Solved design, double tripK, double dropK) {
        return format("Control sensor: on the cooled part, or on the cold plate right next to it, not on the module's"
                        + " ceramic: the loop holds what the sensor reads. Bond it with a thermal adhesive or a clamp,"
                        + " and run its leads along the cold side first so that they do not carry heat into it."
                        + " Over-temperature sensor: on the heat-sink base right beside the module's hot face, wired to"
                        + " a cut-off that does not depend on the temperature controller. At the design point the hot"
                        + " face runs %.1f K above the sink base (%.1f °C against %.1f °C), so a sensor on the base"
                        + " should trip about %.1f K below the %.1f °C hot-face trip.",
                dropK, Units.celsiusFromKelvin(design.hotSideK()), Units.celsiusFromKelvin(design.hotSideK() - dropK),
                dropK, Units.celsiusFromKelvin(tripK));
    }

    private static List<String> cautions(Solved design, DriveLimits limits, double tripK) {
        List<String> cautions = new ArrayList<>();
        cautions.add("Results are estimates from a lumped model: confirm the limits, the trip and the loop on the"
                + " built assembly before relying on them.");
        cautions.add("Keep the module below its rated Imax and Vmax and the driver within its own ratings; size wires,"
                + " connectors and fuses for the current limit.");
        cautions.add("Never power the module without its heat sink: if a fan or pump fails, the hot side overheats"
                + " within seconds. The over-temperature cut-off must not depend on the temperature controller.");
        if (!Double.isNaN(limits.maxHotSideK()) && design.hotSideK() >= limits.maxHotSideK()) {
            cautions.add(format("The design hot side %.1f °C is already at or above the module's %.1f °C limit.",
                    Units.celsiusFromKelvin(design.hotSideK()), Units.celsiusFromKelvin(limits.maxHotSideK())));
        }
        if (design.hasWarning(Warning.Code.CONDENSATION_RISK)) {
            cautions.add("The cold side runs near or below the dew point: seal, insulate or purge it, or raise the"
                    + " set-point.");
        }
        cautions.add(format("The heat sink can exceed safe touch temperatures before the %.1f °C trip: guard it.",
                Units.celsiusFromKelvin(tripK)));
        cautions.add("Follow local electrical codes, product-safety standards and licensed practice.");
        return cautions;
    }

    private static String format(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
