package org.chillwright.catalog;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;

/**
 * A module as a request describes it (the HTTP contract): by maximum ratings, by lumped parameters, by
 * construction, or by a catalog id. Exactly one of the four shapes may be given; {@link #shape()} says
 * which, and {@link ModuleResolver} turns it into physics parameters. Units are in the names (°C, mm).
 * {@code maxOperatingC}, the module's stated maximum temperature, may come with any shape but a catalog
 * entry, which carries its own; without it the hot-side limit is unchecked.
 */
public record ModuleInput(
        // ratings
        @Positive Double imaxA,
        @Positive Double vmaxV,
        @Positive Double qmaxW,
        @Positive Double dtmaxK,
        @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double hotSideC,
        String method,
        // lumped parameters
        @Positive Double seebeckVPerK,
        @Positive Double resistanceOhm,
        @Positive Double conductanceWPerK,
        // construction
        @Min(1) @Max(10_000) Integer couples,
        @Positive Double legAreaMm2,
        @Positive Double legAreaNMm2,
        @Positive Double legLengthMm,
        Double seebeckPVPerK,
        Double seebeckNVPerK,
        @Positive Double resistivityPOhmM,
        @Positive Double resistivityNOhmM,
        @Positive Double conductivityPWPerMK,
        @Positive Double conductivityNWPerMK,
        @PositiveOrZero Double contactResistivityOhmM2,
        // catalog entry
        @Positive Long moduleId,
        // any shape but a catalog entry (which carries its own): the module's stated maximum temperature
        @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("1500") Double maxOperatingC) {

    /** Which way the module is described. */
    public enum Shape { RATINGS, PARAMETERS, CONSTRUCTION, CATALOG }

    /** A module given by its maximum ratings (Imax/Vmax/ΔTmax method). */
    public static ModuleInput ofRatings(double imaxA, double vmaxV, Double qmaxW, double dtmaxK, double hotSideC) {
        return new ModuleInput(imaxA, vmaxV, qmaxW, dtmaxK, hotSideC, null, null, null, null, null, null, null,
                null, null, null, null, null, null, null, null, null, null);
    }

    /** A module given by its lumped parameters. */
    public static ModuleInput ofParameters(double seebeckVPerK, double resistanceOhm, double conductanceWPerK) {
        return new ModuleInput(null, null, null, null, null, null, seebeckVPerK, resistanceOhm, conductanceWPerK,
                null, null, null, null, null, null, null, null, null, null, null, null, null);
    }

    /** A catalog entry. */
    public static ModuleInput ofCatalog(long moduleId) {
        return new ModuleInput(null, null, null, null, null, null, null, null, null, null, null, null, null, null,
                null, null, null, null, null, null, moduleId, null);
    }

    boolean hasRatings() {
        return imaxA != null || vmaxV != null || dtmaxK != null || hotSideC != null || qmaxW != null
                || method != null;
    }

    boolean hasParameters() {
        return seebeckVPerK != null || resistanceOhm != null || conductanceWPerK != null;
    }

    boolean hasConstruction() {
        return couples != null || legAreaMm2 != null || legAreaNMm2 != null || legLengthMm != null
                || seebeckPVPerK != null || seebeckNVPerK != null || resistivityPOhmM != null
                || resistivityNOhmM != null || conductivityPWPerMK != null || conductivityNWPerMK != null
                || contactResistivityOhmM2 != null;
    }

    /** The one shape this input has, or empty when it has none or mixes several. */
    public java.util.Optional<Shape> shape() {
        var shapes = new java.util.ArrayList<Shape>();
        if (hasRatings()) {
            shapes.add(Shape.RATINGS);
        }
        if (hasParameters()) {
            shapes.add(Shape.PARAMETERS);
        }
        if (hasConstruction()) {
            shapes.add(Shape.CONSTRUCTION);
        }
        if (moduleId != null) {
            shapes.add(Shape.CATALOG);
        }
        return shapes.size() == 1 ? java.util.Optional.of(shapes.get(0)) : java.util.Optional.empty();
    }
}
