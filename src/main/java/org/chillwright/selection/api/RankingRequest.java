package org.chillwright.selection.api;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.Set;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.selection.Objective;

/**
 * {@code POST /api/v1/rankings}: rank the catalog (or an approved list) against one cooling case. Give
 * {@code sinkResistanceKPerW}, or {@code sinkRiseK} to have the heat sink each design needs sized for a
 * base that many kelvin above ambient. With {@code coldestAmbientC} each design also gets a heating check:
 * the reversed current that holds the set-point on the coldest day, when the load then is
 * {@code heatLoadAtColdestW} (default {@code heatLoadW}; negative when the object loses heat).
 */
public record RankingRequest(
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double setPointC,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double ambientC,
        @NotNull @PositiveOrZero Double heatLoadW,
        @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double coldestAmbientC,
        Double heatLoadAtColdestW,
        @PositiveOrZero Double sinkResistanceKPerW,
        @Positive @DecimalMax("100") Double sinkRiseK,
        @PositiveOrZero Double coldInterfaceKPerW,
        @PositiveOrZero Double hotInterfaceKPerW,
        @Positive Double supplyMaxV,
        @Positive Double supplyMaxA,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100") Double relativeHumidityPct,
        @Min(1) @Max(8) Integer maxModules,
        Objective objective,
        @Min(1) @Max(500) Integer limit,
        @Size(max = 200) String supplier,
        Set<Lifecycle> lifecycles,
        @Positive Long listId,
        @PositiveOrZero @DecimalMax("200") Double minMarginK,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double maxFractionOfImax,
        @Min(1) @Max(10_000_000) Integer costQuantity) {
}
