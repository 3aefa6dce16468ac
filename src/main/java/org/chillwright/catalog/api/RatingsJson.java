package org.chillwright.catalog.api;

import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.Units;

/** Ratings at one hot-side temperature, in the API's units. */
public record RatingsJson(double imaxA, double vmaxV, double qmaxW, double dtmaxK, double hotSideC) {

    static RatingsJson of(MaxRatings r) {
        return new RatingsJson(r.imaxA(), r.vmaxV(), r.statedQmaxW().orElse(r.impliedQmaxW()), r.dtmaxK(),
                Units.celsiusFromKelvin(r.hotSideK()));
    }
}
