package org.chillwright.physics;

/**
 * Conversions between the units used at the edges and SI inside {@code physics}. The only place
 * the Celsius offset is written.
 */
public final class Units {

    /** Offset between the Celsius and kelvin scales (BIPM, The International System of Units, 9th ed., 2019). */
    private static final double CELSIUS_OFFSET_K = 273.15;
    private static final double SQUARE_METRES_PER_SQUARE_MILLIMETRE = 1e-6;
    private static final double METRES_PER_MILLIMETRE = 1e-3;

    private Units() {
    }

    /** Absolute temperature (K) of a Celsius temperature (°C). */
    public static double kelvinFromCelsius(double temperatureC) {
        return temperatureC + CELSIUS_OFFSET_K;
    }

    /** Celsius temperature (°C) of an absolute temperature (K). */
    public static double celsiusFromKelvin(double temperatureK) {
        return temperatureK - CELSIUS_OFFSET_K;
    }

    /** Area in m² from mm². */
    public static double squareMetresFromSquareMillimetres(double areaMm2) {
        return areaMm2 * SQUARE_METRES_PER_SQUARE_MILLIMETRE;
    }

    /** Length in m from mm. */
    public static double metresFromMillimetres(double lengthMm) {
        return lengthMm * METRES_PER_MILLIMETRE;
    }

    /** Fraction (0.6) from a percentage (60 %). */
    public static double fractionFromPercent(double percent) {
        return percent / 100.0;
    }

    /** Percentage (60 %) from a fraction (0.6). */
    public static double percentFromFraction(double fraction) {
        return fraction * 100.0;
    }
}
