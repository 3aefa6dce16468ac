package org.chillwright.harvest.api;

import org.chillwright.physics.GeneratorCase;
import org.chillwright.physics.Units;
import org.chillwright.web.InvalidRequestException;

/** The generator case as the JSON gives it (°C, K/W), checked and turned into kelvin for the solvers. */
final class GeneratorEdge {

    private GeneratorEdge() {
    }

    /** @throws InvalidRequestException naming {@code hotSourceC} when the source is not warmer than the sink */
    static GeneratorCase generatorCase(double hotSourceC, double coldSinkC, double hotResistanceKPerW,
                                       double coldResistanceKPerW) {
        if (hotSourceC <= coldSinkC) {
            throw new InvalidRequestException("hotSourceC", "must be warmer than coldSinkC (" + coldSinkC
                    + " °C) for the module to generate, was " + hotSourceC + " °C");
        }
        return new GeneratorCase(Units.kelvinFromCelsius(hotSourceC), Units.kelvinFromCelsius(coldSinkC),
                hotResistanceKPerW, coldResistanceKPerW);
    }

    /** JSON has no NaN: an unknown value becomes null. */
    static Double number(double value) {
        return Double.isFinite(value) ? value : null;
    }

    static double celsius(double temperatureK) {
        return Units.celsiusFromKelvin(temperatureK);
    }
}
