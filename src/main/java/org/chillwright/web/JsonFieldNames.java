package org.chillwright.web;

import java.util.Map;

/**
 * Physics names its parameters in SI with kelvin ({@code setPointK}); the HTTP contract names the same
 * inputs at the edge units ({@code setPointC}). This maps the first to the second so that an error found
 * deep in a solver still names the field the client sent.
 */
public final class JsonFieldNames {

    private static final Map<String, String> EDGE_NAMES = Map.ofEntries(
            Map.entry("setPointK", "setPointC"),
            Map.entry("ambientK", "ambientC"),
            Map.entry("hotSideK", "hotSideC"),
            Map.entry("coldSideK", "coldSideC"),
            Map.entry("startK", "startC"),
            Map.entry("targetK", "targetC"),
            Map.entry("hotSourceK", "hotSourceC"),
            Map.entry("coldSinkK", "coldSinkC"),
            Map.entry("relativeHumidity", "relativeHumidityPct"),
            Map.entry("legAreaPM2", "legAreaMm2"),
            Map.entry("legAreaNM2", "legAreaNMm2"),
            Map.entry("legLengthM", "legLengthMm"));

    private JsonFieldNames() {
    }

    /** The request field name for a physics parameter name (unchanged when both are the same). */
    public static String of(String physicsName) {
        return EDGE_NAMES.getOrDefault(physicsName, physicsName);
    }
}
