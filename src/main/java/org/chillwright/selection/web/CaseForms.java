package org.chillwright.selection.web;

import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.selection.Objective;
import org.chillwright.web.PowerUnit;
import org.chillwright.web.TemperatureUnit;
import org.springframework.util.MultiValueMap;
import org.springframework.web.util.UriComponentsBuilder;
import org.springframework.web.util.UriUtils;

/** Reads back a case form stored as its query string (a saved study). */
final class CaseForms {

    private CaseForms() {
    }

    static CaseForm parse(String query) {
        MultiValueMap<String, String> raw = UriComponentsBuilder.newInstance().query(query).build().getQueryParams();
        Map<String, String> v = raw.entrySet().stream().collect(Collectors.toMap(Map.Entry::getKey,
                e -> UriUtils.decode(e.getValue().get(0), java.nio.charset.StandardCharsets.UTF_8)));
        Set<Lifecycle> lifecycles = raw.getOrDefault("lifecycles", java.util.List.of()).stream()
                .map(Lifecycle::valueOf).collect(Collectors.toSet());
        return new CaseForm(
                v.containsKey("temperatureUnit") ? TemperatureUnit.valueOf(v.get("temperatureUnit")) : null,
                v.containsKey("powerUnit") ? PowerUnit.valueOf(v.get("powerUnit")) : null,
                d(v, "setPointTemperature"), d(v, "ambientTemperature"), d(v, "coldestAmbientTemperature"),
                d(v, "activeLoad"), d(v, "convectionWPerM2K"),
                d(v, "exposedAreaCm2"), d(v, "emissivity"), d(v, "leadConductanceMWPerK"),
                v.containsKey("sizeSink") ? Boolean.valueOf(v.get("sizeSink")) : null,
                d(v, "sinkResistanceKPerW"), d(v, "sinkRiseK"), d(v, "coldInterfaceKPerW"), d(v, "hotInterfaceKPerW"),
                d(v, "supplyMaxV"), d(v, "supplyMaxA"), d(v, "relativeHumidityPct"), i(v, "maxModules"),
                v.containsKey("objective") ? Objective.valueOf(v.get("objective")) : null, v.get("supplier"),
                lifecycles, v.containsKey("listId") ? Long.valueOf(v.get("listId")) : null, d(v, "minMarginK"),
                d(v, "maxImaxPct"), i(v, "costQuantity"), i(v, "limit"));
    }

    private static Double d(Map<String, String> values, String name) {
        return values.containsKey(name) ? Double.valueOf(values.get(name)) : null;
    }

    private static Integer i(Map<String, String> values, String name) {
        return values.containsKey(name) ? Integer.valueOf(values.get(name)) : null;
    }
}
