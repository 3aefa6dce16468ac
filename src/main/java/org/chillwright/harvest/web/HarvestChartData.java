package org.chillwright.harvest.web;

import java.util.Locale;
import java.util.function.ToDoubleFunction;
import org.chillwright.harvest.HarvestCurves;
import org.chillwright.physics.GeneratorPoint;

/**
 * A design's curves as JSON for the page's chart script (numbers only, so it is safe in a data attribute):
 * the load grid, power, efficiency, voltage and current, and the indices of the points to mark.
 */
final class HarvestChartData {

    private HarvestChartData() {
    }

    static String of(HarvestCurves curves) {
        var json = new StringBuilder("{");
        column(json, "loadOhm", curves, GeneratorPoint::loadOhm);
        column(json, "powerW", curves, GeneratorPoint::powerW);
        column(json, "efficiencyPct", curves, p -> 100 * p.efficiency());
        column(json, "voltageV", curves, GeneratorPoint::voltageV);
        column(json, "currentA", curves, GeneratorPoint::currentA);
        return json.append("\"maxPowerAt\":").append(curves.maxPowerIndex())
                .append(",\"maxEfficiencyAt\":").append(curves.maxEfficiencyIndex()).append('}').toString();
    }

    private static void column(StringBuilder json, String name, HarvestCurves curves,
                               ToDoubleFunction<GeneratorPoint> value) {
        json.append('"').append(name).append("\":[");
        var points = curves.points();
        for (int n = 0; n < points.length; n++) {
            double v = value.applyAsDouble(points[n]);
            json.append(n == 0 ? "" : ",").append(Double.isFinite(v) ? String.format(Locale.ROOT, "%.6g", v) : "null");
        }
        json.append("],");
    }
}
