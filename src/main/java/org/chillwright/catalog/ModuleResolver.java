package org.chillwright.catalog;

import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.chillwright.physics.InvalidQuantityException;
import org.chillwright.physics.LegConstruction;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.physics.Units;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.JsonFieldNames;
import org.springframework.stereotype.Service;

/** Turns a {@link ModuleInput} into the parameters the solvers need, naming any bad field. */
@Service
public class ModuleResolver {

    private final CatalogService catalog;

    ModuleResolver(CatalogService catalog) {
        this.catalog = catalog;
    }

    /**
     * @param field the request field holding the module, e.g. {@code module} or {@code coldStage}; bad
     *              fields are named below it ({@code module.imaxA})
     */
    public ResolvedModule resolve(ModuleInput input, String field) {
        if (input == null) {
            throw new InvalidRequestException(field, "is required: give ratings, parameters, construction or moduleId");
        }
        var shape = input.shape().orElseThrow(() -> new InvalidRequestException(field,
                "give exactly one of: ratings (imaxA, vmaxV, dtmaxK, hotSideC), parameters (seebeckVPerK, "
                        + "resistanceOhm, conductanceWPerK), construction (couples, legAreaMm2, ...) or moduleId"));
        if (shape == ModuleInput.Shape.CATALOG) {
            if (input.maxOperatingC() != null) {
                throw new InvalidRequestException(field + ".maxOperatingC",
                        "a catalog module carries its own maximum temperature; leave maxOperatingC out");
            }
            var spec = catalog.find(input.moduleId()).orElseThrow(() -> new InvalidRequestException(
                    field + ".moduleId", "no catalog module with id " + input.moduleId()));
            return new ResolvedModule(spec.parameters(), Optional.ofNullable(spec.ratings()), spec.maxHotSideK());
        }
        try {
            var resolved = resolve(input, shape, field);
            return input.maxOperatingC() == null ? resolved : new ResolvedModule(resolved.parameters(),
                    resolved.ratings(), OptionalDouble.of(Units.kelvinFromCelsius(input.maxOperatingC())));
        } catch (InvalidQuantityException e) {
            throw new InvalidRequestException(field + "." + JsonFieldNames.of(e.field()), e.getMessage());
        }
    }

    private static ResolvedModule resolve(ModuleInput input, ModuleInput.Shape shape, String field) {
        return switch (shape) {
            case RATINGS -> fromRatings(input, field);
            case PARAMETERS -> new ResolvedModule(new ModuleParameters(
                    required(input.seebeckVPerK(), field, "seebeckVPerK"),
                    required(input.resistanceOhm(), field, "resistanceOhm"),
                    required(input.conductanceWPerK(), field, "conductanceWPerK")), Optional.empty(), OptionalDouble.empty());
            case CONSTRUCTION -> new ResolvedModule(construction(input, field).toParameters(), Optional.empty(),
                    OptionalDouble.empty());
            case CATALOG -> throw new IllegalStateException("catalog modules are resolved above");
        };
    }

    /** The ratings of a ratings-shaped input, validated; exposed for the catalog's own entries. */
    public static MaxRatings ratings(ModuleInput input, String field) {
        double imaxA = required(input.imaxA(), field, "imaxA");
        double vmaxV = required(input.vmaxV(), field, "vmaxV");
        double dtmaxK = required(input.dtmaxK(), field, "dtmaxK");
        double hotSideK = Units.kelvinFromCelsius(required(input.hotSideC(), field, "hotSideC"));
        if (dtmaxK >= hotSideK) {
            throw new InvalidRequestException(field + ".dtmaxK",
                    "must be below the rating hot-side temperature in kelvin (" + hotSideK + " K), was " + dtmaxK);
        }
        return input.qmaxW() == null ? MaxRatings.withoutQmax(imaxA, vmaxV, dtmaxK, hotSideK)
                : new MaxRatings(imaxA, vmaxV, input.qmaxW(), dtmaxK, hotSideK);
    }

    private static ResolvedModule fromRatings(ModuleInput input, String field) {
        var ratings = ratings(input, field);
        var method = method(input.method(), field);
        if (method == RatingsMethod.QMAX_IMAX_DTMAX && input.qmaxW() == null) {
            throw new InvalidRequestException(field + ".qmaxW", "is required by method QMAX_IMAX_DTMAX");
        }
        return new ResolvedModule(ModuleParameters.fromRatings(ratings, method), Optional.of(ratings),
                OptionalDouble.empty());
    }

    private static RatingsMethod method(String method, String field) {
        if (method == null) {
            return RatingsMethod.IMAX_VMAX_DTMAX;
        }
        try {
            return RatingsMethod.valueOf(method.trim().toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new InvalidRequestException(field + ".method",
                    "expected IMAX_VMAX_DTMAX or QMAX_IMAX_DTMAX, got '" + method + "'");
        }
    }

    private static LegConstruction construction(ModuleInput input, String field) {
        double areaPM2 = Units.squareMetresFromSquareMillimetres(required(input.legAreaMm2(), field, "legAreaMm2"));
        double areaNM2 = input.legAreaNMm2() == null ? areaPM2
                : Units.squareMetresFromSquareMillimetres(input.legAreaNMm2());
        double seebeckP = required(input.seebeckPVPerK(), field, "seebeckPVPerK");
        double seebeckN = required(input.seebeckNVPerK(), field, "seebeckNVPerK");
        if (seebeckP - seebeckN <= 0) {
            throw new InvalidRequestException(field + ".seebeckPVPerK",
                    "the couple's Seebeck coefficient seebeckPVPerK − seebeckNVPerK must be > 0 (n-type legs are "
                            + "negative), was " + (seebeckP - seebeckN));
        }
        return new LegConstruction(
                required(input.couples(), field, "couples"), areaPM2, areaNM2,
                Units.metresFromMillimetres(required(input.legLengthMm(), field, "legLengthMm")),
                seebeckP, seebeckN,
                required(input.resistivityPOhmM(), field, "resistivityPOhmM"),
                required(input.resistivityNOhmM(), field, "resistivityNOhmM"),
                required(input.conductivityPWPerMK(), field, "conductivityPWPerMK"),
                required(input.conductivityNWPerMK(), field, "conductivityNWPerMK"),
                input.contactResistivityOhmM2() == null ? 0 : input.contactResistivityOhmM2());
    }

    private static <T extends Number> T required(T value, String field, String name) {
        if (value == null) {
            throw new InvalidRequestException(field + "." + name, "is required");
        }
        if (value instanceof Double d && !Double.isFinite(d)) {
            throw new InvalidRequestException(field + "." + name, "must be a finite number, was " + d);
        }
        return value;
    }
}
