package org.chillwright.selection.api;

import org.chillwright.physics.Units;

/** Edge conversions shared by the computation responses: JSON has no NaN or infinity, so those become null. */
final class Json {

    private Json() {
    }

    static Double number(double value) {
        return Double.isFinite(value) ? value : null;
    }

    static Double celsius(double temperatureK) {
        return Double.isFinite(temperatureK) ? Units.celsiusFromKelvin(temperatureK) : null;
    }

    static double orNaN(Double value) {
        return value == null ? Double.NaN : value;
    }

    static double orZero(Double value) {
        return value == null ? 0 : value;
    }
}
