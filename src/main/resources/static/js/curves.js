// Draws a candidate's performance curves with uPlot from the numbers the server put in data-chart.
// No inline script (the page's content security policy forbids it) and no network: uPlot comes from the app.
(function () {
    "use strict";
    var host = document.getElementById("charts");
    if (!host || typeof uPlot === "undefined") {
        return;
    }
    var data = JSON.parse(host.dataset.chart);
    var s = data.series;           // [current, cooling@sink, cop@sink, voltage@sink, cooling@dT0, dT1, ...]
    var current = s[0];
    var point = data.point;
    var colours = ["#1f5f7a", "#a63d26", "#6b4fa3", "#2f6b3a", "#8a6d1d", "#55606d"];

    function withPoint(x, y) {
        // a second series that is empty except at the operating point, drawn as a dot
        var xs = x.slice();
        var marks = x.map(function () { return null; });
        if (point && y !== undefined && y !== null) {
            var at = 0;
            while (at < xs.length && xs[at] < point.currentA) { at++; }
            xs.splice(at, 0, point.currentA);
            marks.splice(at, 0, y);
            return { x: xs, marks: marks, at: at };
        }
        return { x: xs, marks: marks, at: -1 };
    }

    // a line gets a value at the inserted operating-point current too (linear between its neighbours),
    // so the marker does not cut a gap into it
    function spliced(values, at) {
        var copy = values.slice();
        if (at >= 0) {
            var before = at > 0 ? values[at - 1] : null;
            var after = at < values.length ? values[at] : null;
            var value = null;
            if (before !== null && after !== null) {
                var x0 = current[at - 1], x1 = current[at];
                value = before + (after - before) * (point.currentA - x0) / (x1 - x0);
            }
            copy.splice(at, 0, value);
        }
        return copy;
    }

    function draw(figure, yLabel, lines, pointY) {
        var target = figure.querySelector(".plot");
        var width = Math.max(320, target.clientWidth || 420);
        var p = withPoint(current, pointY);
        var seriesSpec = [{ label: "current (A)" }];
        var columns = [p.x];
        lines.forEach(function (line, n) {
            seriesSpec.push({ label: line.label, stroke: colours[n % colours.length], width: 2, spanGaps: false });
            columns.push(spliced(line.values, p.at));
        });
        seriesSpec.push({ label: "operating point", stroke: "#000", width: 0,
            points: { show: true, size: 9, fill: "#e0a100", stroke: "#000" } });
        columns.push(p.marks);
        var plot = new uPlot({
            width: width, height: 280,
            scales: { x: { time: false } },
            axes: [{ label: "current (A)" }, { label: yLabel }],
            series: seriesSpec
        }, columns, target);
        figure.querySelector(".save").addEventListener("click", function () {
            var canvas = plot.root.querySelector("canvas");
            var link = document.createElement("a");
            link.download = "chillwright-" + figure.dataset.kind + ".png";
            link.href = canvas.toDataURL("image/png");
            link.click();
        });
    }

    var charts = host.querySelectorAll("figure");
    charts.forEach(function (figure) {
        var kind = figure.dataset.kind;
        if (kind === "cooling") {
            var lines = [{ label: "with this heat sink (W)", values: s[1] }];
            data.deltaTK.forEach(function (dT, n) {
                lines.push({ label: "ΔT = " + dT + " K (W)", values: s[4 + n] });
            });
            draw(figure, "heat pumped (W)", lines, point ? point.coolingW : null);
        } else if (kind === "cop") {
            draw(figure, "COP", [{ label: "COP", values: s[2] }], point ? point.cop : null);
        } else if (kind === "voltage") {
            draw(figure, "voltage (V)", [{ label: "voltage (V)", values: s[3] }], point ? point.voltageV : null);
        }
    });
    host.dataset.drawn = "true";
})();
