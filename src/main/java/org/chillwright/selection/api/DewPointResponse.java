package org.chillwright.selection.api;

import com.fasterxml.jackson.annotation.JsonInclude;

/**
 * Dew point of air, °C (Magnus form, Alduchov and Eskridge 1996 constants), with the frost point (Magnus over
 * ice, same paper) whenever the dew point is below 0 °C. {@code extrapolated} is true outside the fit's
 * −40 to 50 °C air, and {@code note} then says so.
 */
public record DewPointResponse(
        double dewPointC,
        @JsonInclude(JsonInclude.Include.NON_NULL) Double frostPointC,
        boolean extrapolated,
        @JsonInclude(JsonInclude.Include.NON_NULL) String note) {
}
