package org.chillwright.physics;

/**
 * How a converter sets the generator's operating point.
 * <ul>
 *   <li>{@link MaximumPowerPoint}: the input tracks the load of most generator power (the numerical optimum of
 *       {@link GeneratorSolver#maxPower}; with heat-exchanger resistances it is not RL = R, the Ioffe 1957 / Rowe 1995 generator equations).</li>
 *   <li>{@link FractionOfOpenCircuit}: the converter holds its input at a fixed fraction k of the open-circuit
 *       voltage it samples with the load disconnected. With ideal heat exchangers k = ½ is the matched load;
 *       converters for thermoelectric sources commonly sample about half (common practice, no source).</li>
 * </ul>
 */
public sealed interface InputStrategy
        permits InputStrategy.MaximumPowerPoint, InputStrategy.FractionOfOpenCircuit {

    /** The fraction of the open-circuit voltage fixed-fraction converters commonly hold (common practice). */
    double COMMON_FRACTION_OF_OPEN_CIRCUIT = 0.5;

    /** Maximum-power-point tracking. */
    static InputStrategy maximumPowerPoint() {
        return new MaximumPowerPoint();
    }

    /**
     * Input held at k·Voc.
     *
     * @param fractionOfOpenCircuit k, strictly between 0 and 1
     */
    static InputStrategy fractionOfOpenCircuit(double fractionOfOpenCircuit) {
        return new FractionOfOpenCircuit(fractionOfOpenCircuit);
    }

    /** The input tracks the generator's maximum power point. */
    record MaximumPowerPoint() implements InputStrategy {
    }

    /**
     * The input is held at {@code fractionOfOpenCircuit} × the open-circuit voltage.
     *
     * @param fractionOfOpenCircuit k, strictly between 0 (short circuit) and 1 (open circuit)
     */
    record FractionOfOpenCircuit(double fractionOfOpenCircuit) implements InputStrategy {

        public FractionOfOpenCircuit {
            Check.within("fractionOfOpenCircuit", fractionOfOpenCircuit, 0, 1);
            if (fractionOfOpenCircuit == 0 || fractionOfOpenCircuit == 1) {
                throw new InvalidQuantityException("fractionOfOpenCircuit", fractionOfOpenCircuit,
                        "fractionOfOpenCircuit must be > 0 and < 1, was " + fractionOfOpenCircuit);
            }
        }
    }
}
