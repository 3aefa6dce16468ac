package org.chillwright.catalog;

import java.util.Optional;
import java.util.OptionalDouble;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;

/**
 * A module ready for the solvers: its lumped parameters, and the stated ratings and maximum hot-side
 * temperature when it has them (they feed the Imax limit and the warnings).
 *
 * @param parameters  lumped S, R, K of one module
 * @param ratings     the stated maximum ratings, when the module was described by them
 * @param maxHotSideK the module's maximum operating temperature, K, when known
 */
public record ResolvedModule(ModuleParameters parameters, Optional<MaxRatings> ratings, OptionalDouble maxHotSideK) {

    /**
     * The drive limits of {@code seriesCount × parallelCount} of these modules on one supply.
     *
     * @param supplyMaxV the supply's voltage limit, V, or NaN when none
     * @param supplyMaxA the supply's current limit, A, or NaN when none
     */
    public DriveLimits limits(int seriesCount, int parallelCount, double supplyMaxV, double supplyMaxA) {
        double ratedImaxA = ratings.map(r -> r.imaxA() * parallelCount).orElse(Double.NaN);
        return new DriveLimits(ratedImaxA, supplyMaxV, supplyMaxA, maxHotSideK.orElse(Double.NaN));
    }
}
