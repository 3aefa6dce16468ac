package org.chillwright.catalog;

import jakarta.annotation.Nullable;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.physics.Units;

/**
 * Maximum ratings as a supplier states them, at the edge's units (hot side in °C). Wrapper types,
 * because input may lack a value: {@link ModuleDefinitionCheck} names what is missing.
 *
 * @param qmaxW          optional: null when the supplier states no Qmax
 * @param method         which three ratings fix the parameters; null means the default
 * @param testAtmosphere optional
 */
public record RatedInputs(Double imaxA, Double vmaxV, @Nullable Double qmaxW, Double dtmaxK, Double hotSideC,
                          RatingsMethod method, @Nullable TestAtmosphere testAtmosphere) {

    public RatedInputs {
        method = method == null ? RatingsMethod.IMAX_VMAX_DTMAX : method;
    }

    /** The ratings for the physics engine; call only on checked inputs. */
    public MaxRatings toMaxRatings() {
        return new MaxRatings(imaxA, vmaxV, qmaxW == null ? Double.NaN : qmaxW, dtmaxK,
                Units.kelvinFromCelsius(hotSideC));
    }
}
