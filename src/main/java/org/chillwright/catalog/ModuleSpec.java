package org.chillwright.catalog;

import java.math.BigDecimal;
import java.time.Instant;
import java.util.Optional;
import java.util.OptionalDouble;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.Units;

/**
 * One catalog entry as other features see it.
 *
 * @param parameters derived lumped parameters (from the ratings by their method, or from the construction)
 * @param ratings    the stated ratings at their hot side (Qmax NaN when not stated) for a rated
 *                   module; the ideal ratings at {@link CatalogService#CONSTRUCTION_REFERENCE_HOT_SIDE_C}
 *                   for a constructed one
 * @param archived   archived entries are hidden from search and the snapshot but stay readable by id
 */
public record ModuleSpec(long id, long version, ModuleDefinition definition, ModuleParameters parameters,
                         MaxRatings ratings, boolean archived, Instant createdAt, String createdBy,
                         Instant updatedAt, String updatedBy) {

    public String supplier() {
        return definition.supplier();
    }

    public String partNumber() {
        return definition.partNumber();
    }

    public Lifecycle lifecycle() {
        return definition.lifecycle();
    }

    /** Rated (or, for a constructed module, ideal) Imax, A: the current limit a solver must respect. */
    public double ratedImaxA() {
        return ratings.imaxA();
    }

    /** Stated Qmax, or the one implied by the other three ratings, W. */
    public double listedQmaxW() {
        return ratings.statedQmaxW().orElse(ratings.impliedQmaxW());
    }

    /** Highest hot-side temperature the module may see, K, when the supplier states one. */
    public OptionalDouble maxHotSideK() {
        return definition.maxOperatingC() == null ? OptionalDouble.empty()
                : OptionalDouble.of(Units.kelvinFromCelsius(definition.maxOperatingC()));
    }

    public Optional<BigDecimal> unitPriceAt(int quantity) {
        return definition.unitPriceAt(quantity);
    }

    /** Stated Qmax over the Qmax implied by the other three ratings; empty for a constructed module or without Qmax. */
    public OptionalDouble ratingsConsistency() {
        return definition.route() == EntryRoute.RATINGS ? ratings.consistency() : OptionalDouble.empty();
    }

    /** Dimensionless figure of merit Z·T at {@code temperatureK}. */
    public double ztAt(double temperatureK) {
        return parameters.figureOfMeritPerK() * temperatureK;
    }

    /** Ideal ratings of the derived parameters at another hot-side temperature (constant properties). */
    public MaxRatings ratingsAtHotSideC(double hotSideC) {
        return parameters.ratingsAt(Units.kelvinFromCelsius(hotSideC));
    }
}
