package org.chillwright.harvest.api;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;
import org.chillwright.catalog.ModuleInput;

/**
 * {@code POST /api/v1/generator/operating-point}: a module between a hot source and a cold sink through
 * heat-exchanger resistances; without {@code loadOhm}, the load that gives the most power. Sources up to
 * 1,500 °C are accepted (exhaust, furnace and stove generators run hot); a hot junction above the module's
 * stated maximum temperature is warned about, not refused.
 */
public record GeneratorRequest(
        @NotNull @Valid ModuleInput module,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("1500") Double hotSourceC,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("1500") Double coldSinkC,
        @NotNull @PositiveOrZero Double hotResistanceKPerW,
        @NotNull @PositiveOrZero Double coldResistanceKPerW,
        @PositiveOrZero Double loadOhm) {
}
