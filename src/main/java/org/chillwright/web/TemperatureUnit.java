package org.chillwright.web;

import org.chillwright.physics.Units;

/** Temperature units a person may type in a form; the engine always sees kelvin, the API °C. */
public enum TemperatureUnit {
    C("°C"), F("°F"), K("K");

    private final String symbol;

    TemperatureUnit(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }

    /** A temperature in this unit, in °C. °F by the definition °F = °C × 9/5 + 32 (NIST SP 811, 2008, B.8). */
    public double toCelsius(double value) {
        return switch (this) {
            case C -> value;
            case F -> (value - 32) * 5 / 9;
            case K -> Units.celsiusFromKelvin(value);
        };
    }

    public double fromCelsius(double temperatureC) {
        return switch (this) {
            case C -> temperatureC;
            case F -> temperatureC * 9 / 5 + 32;
            case K -> Units.kelvinFromCelsius(temperatureC);
        };
    }

    /** A temperature difference in this unit, in K (°F differences are 5/9 K). */
    public double differenceToKelvin(double difference) {
        return this == F ? difference * 5 / 9 : difference;
    }

    public double differenceFromKelvin(double differenceK) {
        return this == F ? differenceK * 9 / 5 : differenceK;
    }
}
