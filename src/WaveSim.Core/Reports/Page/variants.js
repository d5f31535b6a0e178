// WaveSim's page of a study of variants (a sweep, a termination comparison, Monte Carlo samples): a chart per figure over the variants with the
// best point and the limits marked; a click on a point shows that variant's waveforms. Reachable as window.wavesimPage.
(function () {
  "use strict";
  var source = document.getElementById("wavesim-data");
  if (!source) return;
  var data = JSON.parse(source.textContent.replace(/^\s*<!\[CDATA\[/, "").replace(/\]\]>\s*$/, ""));
  var page = window.wavesimPage = { data: data, charts: [], selected: null, ready: false };
  var colours = ["#1f5fbf", "#d0572a", "#2a9d4b", "#8e3fb5", "#b08a00", "#1b9aa6", "#c2378a", "#5a5a5a"];
  var colour = function (i) { return colours[i % colours.length]; };
  var prefixes = [[1e12, "T"], [1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""], [1e-3, "m"], [1e-6, "\u00b5"], [1e-9, "n"], [1e-12, "p"], [1e-15, "f"]];
  function eng(x, unit, digits) {
    digits = digits || 4;
    if (x === null || x === undefined || !isFinite(x)) return "-";
    if (unit === "%" || unit === "") return String(Number(x.toPrecision(digits))) + (unit ? " %" : "");
    var a = Math.abs(x);
    if (a < 1e-15 * 0.5) return "0 " + unit;
    for (var i = 0; i < prefixes.length; i++) {
      if (a < prefixes[i][0] * 0.9999999 && i < prefixes.length - 1) continue;
      var m = Number((x / prefixes[i][0]).toPrecision(digits));
      if (Math.abs(m) >= 1000 && i > 0) { i--; m = Number((x / prefixes[i][0]).toPrecision(digits)); }
      return String(m) + " " + prefixes[i][1] + unit;
    }
    return "0 " + unit;
  }
  function xText(x) {
    if (data.categorical) { var k = Math.round(x); return k >= 0 && k < data.labels.length && Math.abs(x - k) < 1e-9 ? data.labels[k] : ""; }
    return eng(x, data.xUnit, 3);
  }

  // A figure may carry its own horizontal axis (a Monte Carlo figure against its key); the chart needs it ascending, so
  // its variants are drawn in that order and fig.order maps a drawn index back to the variant.
  function xOf(fig, k) { return fig.axis ? fig.axis.values[k] : data.xs[k]; }
  function arrange(fig) {
    var n = data.xs.length, order = [];
    for (var k = 0; k < n; k++) order.push(k);
    if (fig.axis) order.sort(function (a, b) { return (fig.axis.values[a] - fig.axis.values[b]) || (a - b); });
    fig.order = order;
    fig.shown = [];
    data.probes.forEach(function (p, i) { if (fig.values[i].some(function (v) { return v !== null; })) fig.shown.push(i); });
    return [order.map(function (k) { return xOf(fig, k); })].concat(fig.shown.map(function (i) { return order.map(function (k) { return fig.values[i][k]; }); }));
  }

  function marks(fig) {
    return function (u) {
      var ctx = u.ctx, b = u.bbox, d = devicePixelRatio;
      ctx.save();
      ctx.beginPath(); ctx.rect(b.left, b.top, b.width, b.height); ctx.clip();
      ctx.font = (11 * d) + "px sans-serif"; ctx.textAlign = "left"; ctx.textBaseline = "bottom";
      fig.limits.forEach(function (l) {
        var y = Math.round(u.valToPos(l.value, "y", true)) + 0.5;
        ctx.strokeStyle = "#b3261e"; ctx.lineWidth = d; ctx.setLineDash([6 * d, 4 * d]);
        ctx.beginPath(); ctx.moveTo(b.left, y); ctx.lineTo(b.left + b.width, y); ctx.stroke();
        ctx.setLineDash([]); ctx.fillStyle = "#b3261e"; ctx.fillText(l.label, b.left + 4 * d, y - 2 * d);
      });
      [[data.best, "#2a7d2e", "best"], [page.selected, "#222222", "shown"]].forEach(function (m) {
        if (m[0] === null || m[0] === undefined) return;
        var x = Math.round(u.valToPos(xOf(fig, m[0]), "x", true)) + 0.5;
        ctx.strokeStyle = m[1]; ctx.lineWidth = 1.5 * d; ctx.setLineDash(m[2] === "best" ? [] : [3 * d, 3 * d]);
        ctx.beginPath(); ctx.moveTo(x, b.top); ctx.lineTo(x, b.top + b.height); ctx.stroke();
        ctx.setLineDash([]); ctx.fillStyle = m[1]; ctx.textBaseline = "top";
        ctx.fillText(m[2], x + 3 * d, b.top + (m[2] === "best" ? 2 : 16) * d);
      });
      ctx.restore();
    };
  }

  function figureChart(fig, box) {
    var head = document.createElement("h2");
    head.textContent = fig.name;
    box.appendChild(head);
    if (fig.note) { var p = document.createElement("p"); p.className = "note"; p.textContent = fig.note; box.appendChild(p); }
    var el = document.createElement("div");
    el.className = "chart"; el.setAttribute("data-figure", fig.name);
    box.appendChild(el);
    var width = Math.max(300, el.clientWidth || 1000);
    var xLabel = fig.axis ? fig.axis.label : data.xLabel;
    var xFmt = fig.axis ? function (v) { return eng(v, fig.axis.unit, 4); } : xText;
    var rows = arrange(fig);
    var u = new uPlot({
      width: width, height: 280,
      scales: { x: { time: false } },
      legend: { show: true, live: true },
      axes: [
        { label: xLabel, values: function (u, vals) { return vals.map(xFmt); }, size: 44,
          splits: data.categorical && !fig.axis ? function () { return data.xs.slice(); } : undefined },
        { label: fig.name, values: function (u, vals) { return vals.map(function (v) { return eng(v, fig.unit, 3); }); }, size: 74 },
      ],
      series: [{ label: xLabel, value: function (u, v) { return v === null ? "-" : xFmt(v); } }].concat(fig.shown.map(function (i) {
        var s = { label: data.probes[i], stroke: colour(i), width: 1.5, points: { show: true, size: 7, fill: colour(i) },
          value: function (u, v) { return eng(v, fig.unit, 4); } };
        if (fig.pointsOnly) s.paths = function () { return null; };
        return s;
      })),
      cursor: { drag: { x: false, y: false } },
      hooks: { draw: [marks(fig)] },
    }, rows, el);
    var down = null;
    u.over.addEventListener("mousedown", function (e) { down = [e.clientX, e.clientY]; });
    u.over.addEventListener("mouseup", function (e) {
      if (down && Math.abs(e.clientX - down[0]) < 3 && Math.abs(e.clientY - down[1]) < 3 && u.cursor.idx !== null) select(fig.order[u.cursor.idx]);
      down = null;
    });
    page.charts.push(u);
  }

  function select(k) {
    page.selected = k;
    var w = data.waves[k], title = document.getElementById("variant-title");
    title.setAttribute("data-index", String(k));
    if (!w) { title.textContent = data.labels[k] + ": its waveforms were not kept."; }
    else {
      title.textContent = data.labels[k];
      var d = [w.t].concat(w.v);
      if (!page.wave) {
        var el = document.getElementById("variant-chart");
        page.wave = new uPlot({
          width: Math.max(300, el.clientWidth || 1000), height: 320,
          scales: { x: { time: false } },
          axes: [
            { label: "time", values: function (u, vals) { return vals.map(function (v) { return eng(v, "s", 3); }); }, size: 44 },
            { label: "voltage", values: function (u, vals) { return vals.map(function (v) { return eng(v, "V", 3); }); }, size: 74 },
          ],
          series: [{ label: "time", value: function (u, v) { return eng(v, "s", 5); } }].concat(data.probes.map(function (p, i) {
            return { label: p, stroke: colour(i), width: 1.5, value: function (u, v) { return eng(v, "V", 4); } };
          })),
        }, d, el);
      } else page.wave.setData(d);
    }
    page.charts.forEach(function (u) { u.redraw(false); });
  }
  page.select = select;

  var box = document.getElementById("figure-charts");
  data.figures.forEach(function (f) { figureChart(f, box); });
  select(data.best !== null ? data.best : 0);
  page.ready = true;
})();
