package org.chillwright.physics;

/**
 * The power converter between a thermoelectric generator and the storage: the input voltage it needs to
 * start, its efficiency over input voltage and power, and how it sets the generator's operating point.
 *
 * <p>Boost converters made for thermoelectric sources cold-start from tens of millivolts, typically about
 * {@value #TYPICAL_COLD_START_LOW_V} V to {@value #TYPICAL_COLD_START_HIGH_V} V (transformer or
 * oscillator-based start-up); general-purpose boost and charge-pump circuits need some hundreds of
 * millivolts (common practice, no source). The model starts the converter when the open-circuit voltage
 * reaches {@code coldStartV}; a converter that, once running, keeps going from its own output below that
 * voltage is not modelled, so the model errs on the side of "cannot start".
 *
 * @param name        a label for lists and pages, not blank
 * @param coldStartV  the least open-circuit voltage from which the converter starts, V, finite and ≥ 0
 * @param efficiency  output power over input power against input voltage and power
 * @param input       how the input sets the generator's operating point
 */
public record Converter(String name, double coldStartV, ConverterEfficiencyTable efficiency, InputStrategy input) {

    /** Low end of the typical cold-start voltage of converters for thermoelectric sources, V (common practice). */
    public static final double TYPICAL_COLD_START_LOW_V = 0.02;
    /** High end of the typical cold-start voltage of converters for thermoelectric sources, V (common practice). */
    public static final double TYPICAL_COLD_START_HIGH_V = 0.1;

    public Converter {
        if (name == null || name.isBlank()) {
            throw new InvalidQuantityException("name", Double.NaN, "name must be given, was blank");
        }
        Check.nonNegative("coldStartV", coldStartV);
        if (efficiency == null) {
            throw new InvalidQuantityException("efficiency", Double.NaN, "efficiency must be given, was null");
        }
        if (input == null) {
            throw new InvalidQuantityException("input", Double.NaN, "input must be given, was null");
        }
    }

    /** An ideal converter: starts from any voltage, efficiency 1, with the given input strategy. */
    public static Converter ideal(InputStrategy input) {
        return new Converter("ideal", 0, ConverterEfficiencyTable.constant(1), input);
    }

    /** The same converter with another input strategy. */
    public Converter withInput(InputStrategy strategy) {
        return new Converter(name, coldStartV, efficiency, strategy);
    }

    /**
     * An invented demo converter, "CW-HB20 demo boost" (our own name, no real product): cold start at 20 mV,
     * maximum-power-point tracking, and an efficiency table shaped as such converters commonly behave
     * (common practice, no source): poor at microwatts and at the lowest input voltages, about 80 to 90 %
     * from some millivolts and milliwatts up. Every number is invented for demonstration.
     */
    public static Converter demo() {
        double[] voltagesV = {0.02, 0.05, 0.1, 0.3, 1.0, 3.0};
        double[] powersW = {1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 1e-1, 1, 3};
        double[][] efficiencies = {
                {0.10, 0.20, 0.30, 0.35, 0.38, 0.38, 0.35, 0.30},   // 20 mV
                {0.15, 0.30, 0.45, 0.55, 0.60, 0.60, 0.55, 0.50},   // 50 mV
                {0.20, 0.40, 0.55, 0.65, 0.70, 0.72, 0.68, 0.62},   // 100 mV
                {0.25, 0.50, 0.65, 0.75, 0.80, 0.82, 0.80, 0.75},   // 300 mV
                {0.30, 0.55, 0.72, 0.82, 0.87, 0.88, 0.87, 0.84},   // 1 V
                {0.30, 0.55, 0.74, 0.84, 0.89, 0.90, 0.90, 0.88},   // 3 V
        };
        return new Converter("CW-HB20 demo boost (invented)", 0.02,
                new ConverterEfficiencyTable(voltagesV, powersW, efficiencies), InputStrategy.maximumPowerPoint());
    }
}
