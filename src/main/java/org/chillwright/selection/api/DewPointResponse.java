package org.chillwright.selection.api;

/** Dew point of air, °C (Magnus form, Alduchov and Eskridge 1996 constants). */
public record DewPointResponse(double dewPointC) {
}
