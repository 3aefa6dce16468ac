// Draws a module's performance curves with uPlot from the JSON block the page carries
// (the page's CSP allows no inline script, and a JSON block is data, not code).
(function () {
    "use strict";
    var source = document.getElementById("curve-data");
    if (!source || typeof uPlot === "undefined") {
        return;
    }
    var data = JSON.parse(source.textContent);
    var colours = ["#1f5f7a", "#2f6b3a", "#a67c00", "#a63d26", "#6b3f8a", "#55606d", "#0f8a8a"];

    // at ΔT = 0 the COP grows without bound as the current falls, which would flatten the other curves
    function draw(targetId, key, yLabel, skipZeroDeltaT) {
        var target = document.getElementById(targetId);
        if (!target) {
            return;
        }
        var series = [{ label: "Current (A)" }];
        var columns = [data.currentA];
        data.curves.forEach(function (curve, i) {
            if (skipZeroDeltaT && curve.deltaTK === 0) {
                return;
            }
            series.push({ label: "ΔT = " + curve.deltaTK + " K", stroke: colours[i % colours.length], width: 2 });
            columns.push(curve[key]);
        });
        var width = Math.max(280, Math.min(target.clientWidth || 520, 640));
        new uPlot({
            width: width,
            height: 300,
            series: series,
            scales: { x: { time: false } },
            axes: [{ label: "Current (A)" }, { label: yLabel }]
        }, columns, target);
    }

    draw("qc-chart", "coldSideHeatW", "Qc (W)", false);
    draw("cop-chart", "cop", "COP", true);
})();
