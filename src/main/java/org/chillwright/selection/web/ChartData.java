package org.chillwright.selection.web;

import java.util.List;
import java.util.Locale;
import org.chillwright.physics.Solved;
import org.chillwright.selection.CandidateDetail;

/**
 * The curves of a candidate as JSON for the page's chart script (numbers only, so it is safe in a data
 * attribute): current grid, cooling with the case's sink, COP, voltage, the fixed-ΔT family, and the
 * operating point to mark.
 */
final class ChartData {

    private ChartData() {
    }

    static String of(CandidateDetail detail) {
        var curves = detail.curves();
        var json = new StringBuilder("{\"series\":[");
        List<List<Double>> series = curves.series();
        for (int s = 0; s < series.size(); s++) {
            json.append(s == 0 ? "" : ",").append('[');
            var values = series.get(s);
            for (int n = 0; n < values.size(); n++) {
                json.append(n == 0 ? "" : ",").append(format(values.get(n)));
            }
            json.append(']');
        }
        json.append("],\"deltaTK\":[");
        for (int f = 0; f < curves.fixedDeltaTK().length; f++) {
            json.append(f == 0 ? "" : ",").append(format(curves.fixedDeltaTK()[f]));
        }
        json.append(']');
        if (detail.point() instanceof Solved p) {
            json.append(",\"point\":{\"currentA\":").append(format(p.currentA()))
                    .append(",\"coolingW\":").append(format(p.heatLoadW()))
                    .append(",\"cop\":").append(format(Double.isFinite(p.cop()) ? p.cop() : null))
                    .append(",\"voltageV\":").append(format(p.voltageV())).append('}');
        }
        return json.append('}').toString();
    }

    private static String format(Double value) {
        return value == null || !Double.isFinite(value) ? "null" : String.format(Locale.ROOT, "%.6g", value);
    }
}
