package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ConverterEfficiencyTableTest {

    private static final ConverterEfficiencyTable TABLE = new ConverterEfficiencyTable(
            new double[] {0.1, 0.5}, new double[] {1e-4, 1e-3, 1e-2},
            new double[][] {{0.2, 0.4, 0.5}, {0.6, 0.8, 0.9}});

    @ParameterizedTest(name = "{0} V, {1} W -> {2}")
    @CsvSource({
            "0.1, 1e-4, 0.2", "0.5, 1e-2, 0.9", "0.1, 1e-3, 0.4", // grid points
            "0.3, 1e-4, 0.4",   // halfway in voltage: (0.2 + 0.6)/2
            "0.1, 5.5e-4, 0.3", // halfway in power: (0.2 + 0.4)/2
            "0.3, 5.5e-4, 0.5", // centre of a cell: mean of its four corners (bilinear identity)
    })
    void interpolatesBilinearlyInsideTheTable(double voltageV, double powerW, double expected) {
        assertThat(TABLE.at(voltageV, powerW)).isCloseTo(expected, within(1e-12));
    }

    @ParameterizedTest(name = "{0} V, {1} W -> {2}")
    @CsvSource({
            "0.01, 1e-4, 0.2", "9, 1e-4, 0.6",     // below and above the voltages
            "0.1, 0, 0.2", "0.1, 5, 0.5",          // below and above the powers
            "0, 0, 0.2", "9, 9, 0.9",              // the corners
            "0.3, 5, 0.7",                         // held in power, interpolated in voltage
    })
    void holdsTheEdgeValuesOutsideTheTable(double voltageV, double powerW, double expected) {
        assertThat(TABLE.at(voltageV, powerW)).isCloseTo(expected, within(1e-12));
    }

    @Test
    void aConstantTableGivesItsValueEverywhere() {
        var table = ConverterEfficiencyTable.constant(0.7);
        assertThat(table.at(0, 0)).isEqualTo(0.7);
        assertThat(table.at(12, 3)).isEqualTo(0.7);
    }

    @ParameterizedTest(name = "efficiency {0}")
    @CsvSource({"0", "-0.1", "1.01", "NaN"})
    void rejectsAnEfficiencyOutsideZeroToOne(double efficiency) {
        assertThatThrownBy(() -> new ConverterEfficiencyTable(new double[] {1}, new double[] {1, 2},
                new double[][] {{0.5, efficiency}}))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("efficiencies[0][1]"));
    }

    @Test
    void rejectsPowersThatDoNotIncrease() {
        assertThatThrownBy(() -> new ConverterEfficiencyTable(new double[] {1}, new double[] {1e-3, 1e-3},
                new double[][] {{0.5, 0.6}}))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("inputPowersW[1]"));
    }

    @Test
    void rejectsARowOfTheWrongLength() {
        assertThatThrownBy(() -> new ConverterEfficiencyTable(new double[] {1, 2}, new double[] {1e-3, 1e-2},
                new double[][] {{0.5, 0.6}, {0.7}}))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("efficiencies[1]"));
    }

    @Test
    void keepsItsOwnCopyOfTheTable() {
        double[][] rows = {{0.5}};
        var table = new ConverterEfficiencyTable(new double[] {1}, new double[] {1}, rows);
        rows[0][0] = 0.9;
        assertThat(table.at(1, 1)).isEqualTo(0.5);
        assertThat(table).isEqualTo(
                new ConverterEfficiencyTable(new double[] {1}, new double[] {1}, new double[][] {{0.5}}));
    }

    @Test
    void theDemoConverterIsAValidTableWithAColdStartInTheTypicalRange() {
        // Typical range: common practice (no source), see Converter.
        var demo = Converter.demo();
        assertThat(demo.coldStartV())
                .isBetween(Converter.TYPICAL_COLD_START_LOW_V, Converter.TYPICAL_COLD_START_HIGH_V);
        assertThat(demo.efficiency().at(1.0, 1e-2)).isGreaterThan(demo.efficiency().at(0.02, 1e-6));
    }
}
