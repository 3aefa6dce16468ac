// Draws a generator design's curves against load resistance with uPlot from the numbers the server put in
// data-chart, as the selection charts do: no inline script (the content security policy forbids it) and no
// network (uPlot comes from the app's webjar).
(function () {
    "use strict";
    var host = document.getElementById("charts");
    if (!host || typeof uPlot === "undefined") {
        return;
    }
    var data = JSON.parse(host.dataset.chart);
    var colours = { left: "#1f5f7a", right: "#a63d26" };

    // a series empty except at one index, drawn as a marker on the given scale
    function marker(values, at, label, scale, fill) {
        var marks = values.map(function () { return null; });
        marks[at] = values[at];
        return { spec: { label: label, scale: scale, stroke: "#000", width: 0,
            points: { show: true, size: 10, fill: fill, stroke: "#000" } }, values: marks };
    }

    // two quantities against load on a logarithmic axis, the left one on its own scale and the right on another
    function draw(figure, left, right) {
        var target = figure.querySelector(".plot");
        var width = Math.max(320, target.clientWidth || 420);
        var series = [{ label: "load (Ω)" },
            { label: left.label, scale: "left", stroke: colours.left, width: 2 },
            { label: right.label, scale: "right", stroke: colours.right, width: 2 }];
        var columns = [data.loadOhm, left.values, right.values];
        var marks = [marker(left.values, data.maxPowerAt, "operating point (most power)", "left", "#e0a100"),
            marker(right.values, data.maxPowerAt, "operating point", "right", "#e0a100")];
        if (right.markBestEfficiency) {
            marks.push(marker(right.values, data.maxEfficiencyAt, "best efficiency", "right", "#fff"));
        }
        marks.forEach(function (m) { series.push(m.spec); columns.push(m.values); });
        var plot = new uPlot({
            width: width, height: 300,
            scales: { x: { time: false, distr: 3 }, left: {}, right: {} },
            axes: [{ label: "load resistance (Ω)" },
                { scale: "left", label: left.label, stroke: colours.left },
                { scale: "right", label: right.label, side: 1, stroke: colours.right, grid: { show: false } }],
            series: series
        }, columns, target);
        figure.querySelector(".save").addEventListener("click", function () {
            var link = document.createElement("a");
            link.download = "chillwright-harvest-" + figure.dataset.kind + ".png";
            link.href = plot.root.querySelector("canvas").toDataURL("image/png");
            link.click();
        });
    }

    host.querySelectorAll("figure").forEach(function (figure) {
        if (figure.dataset.kind === "power") {
            draw(figure, { label: "power (W)", values: data.powerW },
                { label: "efficiency (%)", values: data.efficiencyPct, markBestEfficiency: true });
        } else if (figure.dataset.kind === "load-line") {
            draw(figure, { label: "voltage (V)", values: data.voltageV },
                { label: "current (A)", values: data.currentA });
        }
    });
    host.dataset.drawn = "true";
})();
