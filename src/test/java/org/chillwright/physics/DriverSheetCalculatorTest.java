package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The driver sheet of module TM-A of check-cases.json (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K) in the set-up of check case
 * S10 (5 °C set-point at 25 °C, 10 W, 0.3 K/W sink, 0.1 and 0.05 K/W interfaces).
 */
class DriverSheetCalculatorTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final ModuleArray ONE = ModuleArray.single(TM_A);
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
    private static final CooldownSetup PART = new CooldownSetup(60, 0.05, 0, CooldownSetup.DEFAULT_SETTLE_BAND_K);
    private final DriverSheetCalculator calculator = new DriverSheetCalculator();
    private final OperatingPointSolver solver = new OperatingPointSolver();

    private DriverSheet sheet(DriveLimits limits, HeatingDemand coldestDay) {
        return calculator.sheet(ONE, S10, limits, PART, coldestDay).orElseThrow();
    }

    @ParameterizedTest(name = "{0} A")
    @ValueSource(doubles = {0.5, 1.5, 2.5, 3.5})
    void staticGainIsTheSlopeOfTheFixedCurrentSetPoint(double currentA) {
        // Independent check: a central finite difference of the set-point the fixed-current solve reaches
        // (OperatingPointSolver.atCurrent, the fixed-current balance derived here, case S12), step 1e-4 A (truncation error ~1e-9 K/A).
        double stepA = 1e-4;
        double above = ((Solved) solver.atCurrent(ONE, S10, DriveLimits.NONE, currentA + stepA)).setPointK();
        double below = ((Solved) solver.atCurrent(ONE, S10, DriveLimits.NONE, currentA - stepA)).setPointK();
        assertThat(DriverSheetCalculator.staticGainKPerA(TM_A, S10, currentA))
                .isCloseTo((above - below) / (2 * stepA), within(1e-6));
    }

    @Test
    void theSheetCarriesTheGainAtTheDesignCurrent() {
        DriverSheet sheet = sheet(DriveLimits.NONE, null);
        Solved design = (Solved) solver.solve(ONE, S10, DriveLimits.NONE);
        assertThat(sheet.designCurrentA()).isEqualTo(design.currentA());
        assertThat(sheet.gainKPerA()).isEqualTo(DriverSheetCalculator.staticGainKPerA(TM_A, S10, design.currentA()));
        assertThat(sheet.gainKPerA()).isNegative(); // below the capacity peak, more current holds the part colder
    }

    @Test
    void withoutLimitsTheCurrentIsLimitedAtTheCapacityPeak() {
        DriverSheet sheet = sheet(DriveLimits.NONE, null);
        Solved design = (Solved) solver.solve(ONE, S10, DriveLimits.NONE);
        assertThat(sheet.currentLimitBasis()).isEqualTo(DriverSheet.CurrentLimitBasis.CAPACITY_PEAK);
        assertThat(sheet.currentLimitA()).isEqualTo(design.currentAtMaxHeatLoadA());
    }

    @Test
    void aRatedImaxBelowThePeakSetsTheLimit() {
        DriverSheet sheet = sheet(DriveLimits.ofRatedImaxA(3.2), null);
        assertThat(sheet.currentLimitBasis()).isEqualTo(DriverSheet.CurrentLimitBasis.RATED_IMAX);
        assertThat(sheet.currentLimitA()).isEqualTo(3.2);
    }

    @Test
    void aSmallerSupplyCurrentSetsTheLimit() {
        DriverSheet sheet = sheet(new DriveLimits(3.2, Double.NaN, 3.0, Double.NaN), null);
        assertThat(sheet.currentLimitBasis()).isEqualTo(DriverSheet.CurrentLimitBasis.SUPPLY_CURRENT);
        assertThat(sheet.currentLimitA()).isEqualTo(3.0);
    }

    @Test
    void theVoltageIsWhatTheLimitCurrentNeedsInTheHottestSteadyState() {
        DriverSheet sheet = sheet(new DriveLimits(3.2, 7.0, Double.NaN, Double.NaN), null);
        Solved atLimit = (Solved) solver.atCurrent(ONE, S10, DriveLimits.NONE, 3.2);
        assertThat(sheet.voltageLimitV()).isEqualTo(atLimit.voltageV());
        assertThat(sheet.voltageLimitV()).isGreaterThan(sheet.designVoltageV());
        assertThat(sheet.voltageWithinSupply()).isEqualTo(atLimit.voltageV() <= 7.0);
    }

    @Test
    void heatingOnTheColdestDayNeedsAnHBridge() {
        // −20 °C outside: 6 W must reach the part through the module to hold 5 °C
        DriverSheet sheet = sheet(DriveLimits.ofRatedImaxA(3.8), new HeatingDemand(253.15, 6));
        assertThat(sheet.heating().needsHeating()).isTrue();
        assertThat(sheet.heating().currentA()).isPositive();
        assertThat(sheet.needsHBridge()).isTrue();
    }

    @Test
    void aPartThatStaysWarmEnoughNeedsNoHBridge() {
        DriverSheet sheet = sheet(DriveLimits.ofRatedImaxA(3.8), new HeatingDemand(273.15, -10));
        assertThat(sheet.heating().needsHeating()).isFalse();
        assertThat(sheet.needsHBridge()).isFalse();
    }

    @Test
    void withoutAColdestDayThereIsNoHeatingCheck() {
        DriverSheet sheet = sheet(DriveLimits.NONE, null);
        assertThat(sheet.heating()).isNull();
        assertThat(sheet.needsHBridge()).isFalse();
    }

    @Test
    void theTimeConstantIsTheCoolDownsAtTheDesignCurrent() {
        DriverSheet sheet = sheet(DriveLimits.NONE, null);
        double expected = new CooldownSolver().run(ONE, S10, PART, sheet.designCurrentA(), Double.NaN)
                .timeConstantS();
        assertThat(sheet.timeConstantS()).isEqualTo(expected).isPositive();
    }

    @Test
    void theTripSitsAMarginAboveTheDesignHotSideWhenTheModuleAllowsIt() {
        DriverSheet sheet = sheet(new DriveLimits(Double.NaN, Double.NaN, Double.NaN, 353.15), null);
        Solved design = (Solved) solver.solve(ONE, S10, DriveLimits.NONE);
        assertThat(sheet.tripBasis()).isEqualTo(DriverSheet.TripBasis.DESIGN_PLUS_MARGIN);
        assertThat(sheet.hotSideTripK()).isCloseTo(design.hotSideK() + 10, within(1e-12));
        assertThat(sheet.hotInterfaceDropK()).isCloseTo(design.heatRejectedW() * 0.05, within(1e-12));
        assertThat(sheet.sensorPlacementNote()).contains("cooled part").contains("heat-sink base");
    }

    @Test
    void theTripNeverExceedsTheModulesStatedMaximum() {
        Solved design = (Solved) solver.solve(ONE, S10, DriveLimits.NONE);
        double maxK = design.hotSideK() + 4;
        DriverSheet sheet = sheet(new DriveLimits(Double.NaN, Double.NaN, Double.NaN, maxK), null);
        assertThat(sheet.tripBasis()).isEqualTo(DriverSheet.TripBasis.MODULE_MAXIMUM);
        assertThat(sheet.hotSideTripK()).isEqualTo(maxK);
    }

    @Test
    void carriesTheUsualCautions() {
        assertThat(sheet(DriveLimits.NONE, null).cautions())
                .anySatisfy(c -> assertThat(c).contains("without its heat sink"))
                .anySatisfy(c -> assertThat(c).contains("local electrical codes"));
    }

    @Test
    void aDesignThatCannotHoldTheSetPointHasNoSheet() {
        assertThat(calculator.sheet(ONE, S10.withHeatLoadW(40), DriveLimits.NONE, PART, null)).isEmpty();
    }

    @Test
    void rejectsAMissingThermalSetupNamingIt() {
        assertThatThrownBy(() -> calculator.sheet(ONE, S10, DriveLimits.NONE, null, null))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> assertThat(e.field()).isEqualTo("thermal"));
    }
}
