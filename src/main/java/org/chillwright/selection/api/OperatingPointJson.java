package org.chillwright.selection.api;

import static org.chillwright.selection.api.Json.celsius;
import static org.chillwright.selection.api.Json.number;

import java.util.List;
import org.chillwright.physics.Infeasible;
import org.chillwright.physics.OperatingPoint;
import org.chillwright.physics.Solved;

/** Maps a physics operating point to its JSON shape. */
final class OperatingPointJson {

    private OperatingPointJson() {
    }

    static OperatingPointResponse of(OperatingPoint point, int seriesCount, int parallelCount) {
        if (point instanceof Solved s) {
            return solved(s, seriesCount, parallelCount);
        }
        var i = (Infeasible) point;
        // the capacity at the set-point stays, so a script sees how far off the design is
        return new OperatingPointResponse(false, new OperatingPointResponse.ReasonJson(i.reason().name(), i.detail()),
                null, null, null, null, null, null, null, null, null, null,
                number(i.maxHeatLoadW()), number(i.currentAtMaxHeatLoadA()), null, null, null, null,
                null, null, List.of(), null, seriesCount, parallelCount);
    }

    private static OperatingPointResponse solved(Solved s, int seriesCount, int parallelCount) {
        var share = s.perModule();
        return new OperatingPointResponse(true, null,
                s.currentA(), s.voltageV(), s.powerW(), number(s.cop()),
                celsius(s.setPointK()), celsius(s.coldSideK()), celsius(s.hotSideK()),
                s.heatLoadW(), s.heatRejectedW(), number(s.fractionOfImax()),
                number(s.maxHeatLoadW()), number(s.currentAtMaxHeatLoadA()), number(s.loadMarginPct()),
                number(s.marginK()), number(s.copOptimalCurrentA()), number(s.maxCop()),
                Double.isNaN(s.dewPointK()) ? null : celsius(s.dewPointK()),
                Double.isNaN(s.frostPointK()) ? null : celsius(s.frostPointK()),
                s.warnings().stream()
                        .map(w -> new OperatingPointResponse.WarningJson(w.code().name(), w.sentence())).toList(),
                new OperatingPointResponse.PerModule(share.currentA(), share.voltageV(), share.heatLoadW(),
                        share.heatRejectedW(), share.powerW()),
                seriesCount, parallelCount);
    }
}
