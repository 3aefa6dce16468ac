package org.chillwright.harvest.api;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.Set;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.harvest.HarvestObjective;

/**
 * {@code POST /api/v1/harvest/rankings}: rank the catalog's modules, alone and in arrays, as generators
 * between a hot source and a cold sink through heat-exchanger resistances (the whole assembly's).
 * Obsolete modules are left out unless {@code lifecycles} asks for them.
 */
public record HarvestRankingRequest(
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("1500") Double hotSourceC,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("1500") Double coldSinkC,
        @NotNull @PositiveOrZero @DecimalMax("1000") Double hotResistanceKPerW,
        @NotNull @PositiveOrZero @DecimalMax("1000") Double coldResistanceKPerW,
        @Min(1) @Max(8) Integer maxModules,
        HarvestObjective objective,
        @PositiveOrZero @DecimalMax("10000") Double minLoadVoltageV,
        @Size(max = 200) String supplier,
        Set<Lifecycle> lifecycles,
        @Min(1) @Max(10_000_000) Integer costQuantity,
        @Min(1) @Max(500) Integer limit) {
}
