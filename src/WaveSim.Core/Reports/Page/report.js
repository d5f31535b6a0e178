// WaveSim's interactive results page. Reads the run's data from the JSON block #wavesim-data and draws it with uPlot
// (inlined beside this script). Everything the tests drive is reachable as window.wavesimPage.
(function () {
  "use strict";
  var source = document.getElementById("wavesim-data");
  if (!source) return;
  var data = JSON.parse(source.textContent.replace(/^\s*<!\[CDATA\[/, "").replace(/\]\]>\s*$/, ""));
  var page = window.wavesimPage = { data: data, charts: {}, cursors: [null, null], frame: 0, ready: false };
  var probes = data.probes;
  var n = probes.length;
  // Our own palette: distinct on white, readable in print.
  var colours = ["#1f5fbf", "#d0572a", "#2a9d4b", "#8e3fb5", "#b08a00", "#1b9aa6", "#c2378a", "#5a5a5a"];
  var colour = function (i) { return colours[i % colours.length]; };

  // Engineering text: a prefix and `digits` significant digits, never an exponent.
  var prefixes = [[1e12, "T"], [1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""], [1e-3, "m"], [1e-6, "\u00b5"], [1e-9, "n"], [1e-12, "p"], [1e-15, "f"]];
  function eng(x, unit, digits) {
    digits = digits || 4;
    if (x === null || x === undefined || !isFinite(x)) return "-";
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
  page.eng = eng;

  // The finest record carried: every sample when the page holds it, else the min/max pairs.
  var fine = data.full || data.overview;

  function lowerBound(t, x) {
    var lo = 0, hi = t.length;
    while (lo < hi) { var mid = (lo + hi) >> 1; if (t[mid] < x) lo = mid + 1; else hi = mid; }
    return lo;
  }

  // The samples of [t0, t1] as min/max pairs per pixel column (the same thinning as the page's own): series 0..n-1 are
  // voltages, n..2n-1 currents.
  function view(t0, t1, cols) {
    var rec = fine, t = rec.t, all = rec.v.concat(rec.a);
    var i0 = Math.max(0, lowerBound(t, t0) - 1), i1 = Math.min(t.length, lowerBound(t, t1) + 1);
    if (data.full === null && t0 <= t[0] && t1 >= t[t.length - 1]) { i0 = 0; i1 = t.length; }
    var out = [[]], s;
    for (s = 0; s < all.length; s++) out.push([]);
    if (i1 - i0 <= 2 * cols) {
      out[0] = t.slice(i0, i1);
      for (s = 0; s < all.length; s++) out[s + 1] = all[s].slice(i0, i1);
      return out;
    }
    var span = t[i1 - 1] - t[i0], start = i0;
    for (var c = 0; c < cols && start < i1; c++) {
      var edge = t[i0] + span * (c + 1) / cols, end = start;
      while (end < i1 && (t[end] < edge || c === cols - 1)) end++;
      if (end === start) continue;
      if (end - start === 1) {
        out[0].push(t[start]);
        for (s = 0; s < all.length; s++) out[s + 1].push(all[s][start]);
      } else {
        out[0].push(t[start], t[end - 1]);
        for (s = 0; s < all.length; s++) {
          var x = all[s], lo = start, hi = start;
          for (var k = start + 1; k < end; k++) {
            if (x[k] === null) continue;   // a gap (an overlay's trace outside its record)
            if (x[lo] === null || x[k] < x[lo]) lo = k;
            if (x[hi] === null || x[k] > x[hi]) hi = k;
          }
          if (lo <= hi) out[s + 1].push(x[lo], x[hi]); else out[s + 1].push(x[hi], x[lo]);
        }
      }
      start = end;
    }
    return out;
  }

  // A probe's value at instant t, linearly between the finest samples (series as in view()).
  function valueAt(series, t) {
    var rec = fine, ts = rec.t, x = series < n ? rec.v[series] : rec.a[series - n];
    var i = lowerBound(ts, t);
    if (i <= 0) return x[0];
    if (i >= ts.length) return x[ts.length - 1];
    if (x[i - 1] === null || x[i] === null) return null;
    var f = (t - ts[i - 1]) / (ts[i] - ts[i - 1]);
    return x[i - 1] + f * (x[i] - x[i - 1]);
  }
  page.valueAt = valueAt;

  var range = { min: data.window[0], max: data.window[1] };
  var current = null;   // the last view: [t, v..., a...]
  var syncing = false;

  function chartData(kind) {
    var d = [current[0]];
    for (var i = 0; i < n; i++) d.push(current[1 + (kind === "a" ? n : 0) + i]);
    return d;
  }

  function columns() {
    var el = document.getElementById("chart-v");
    return Math.max(100, Math.round((el && el.clientWidth) || 1000));
  }

  function refresh(min, max) {
    range = { min: min, max: max };
    current = view(min, max, columns());
    syncing = true;
    try {
      ["v", "a"].forEach(function (k) {
        var u = page.charts[k];
        if (!u) return;
        u.setData(chartData(k), false);
        u.setScale("x", { min: min, max: max });
      });
    } finally { syncing = false; }
    page.range = range;
  }
  page.zoom = refresh;

  function resetZoom() { refresh(0, data.durationS); }
  page.resetZoom = resetZoom;

  function clip(u, ctx) {
    var b = u.bbox;
    ctx.save();
    ctx.beginPath();
    ctx.rect(b.left, b.top, b.width, b.height);
    ctx.clip();
  }

  function vline(u, t, stroke, dash, label) {
    if (t === null || t < u.scales.x.min || t > u.scales.x.max) return;
    var ctx = u.ctx, b = u.bbox, x = Math.round(u.valToPos(t, "x", true)) + 0.5;
    ctx.strokeStyle = stroke;
    ctx.lineWidth = 1.5 * devicePixelRatio;
    ctx.setLineDash(dash);
    ctx.beginPath(); ctx.moveTo(x, b.top); ctx.lineTo(x, b.top + b.height); ctx.stroke();
    if (label) { ctx.setLineDash([]); ctx.fillStyle = stroke; ctx.textAlign = "left"; ctx.textBaseline = "top"; ctx.font = (11 * devicePixelRatio) + "px sans-serif"; ctx.fillText(label, x + 3 * devicePixelRatio, b.top + 12 * devicePixelRatio); }
  }

  function overlay(kind) {
    return function (u) {
      var ctx = u.ctx, b = u.bbox;
      clip(u, ctx);
      if (kind === "v") {
        // Receiver thresholds of every shown probe that has them, dashed in the probe's colour.
        probes.forEach(function (p, i) {
          if (p.vihV === undefined || !u.series[i + 1].show) return;
          [["Vih", p.vihV], ["Vil", p.vilV]].forEach(function (th) {
            var y = Math.round(u.valToPos(th[1], "y", true)) + 0.5;
            ctx.strokeStyle = colour(i); ctx.lineWidth = devicePixelRatio; ctx.setLineDash([6 * devicePixelRatio, 4 * devicePixelRatio]);
            ctx.beginPath(); ctx.moveTo(b.left, y); ctx.lineTo(b.left + b.width, y); ctx.stroke();
            ctx.setLineDash([]); ctx.fillStyle = colour(i); ctx.font = (11 * devicePixelRatio) + "px sans-serif"; ctx.textAlign = "left"; ctx.textBaseline = "bottom";
            ctx.fillText(th[0] + " " + p.name + " " + eng(th[1], "V", 3), b.left + 4 * devicePixelRatio, y - 3 * devicePixelRatio);
          });
        });
      }
      if (data.frames) vline(u, data.frames.t[page.frame], "#7a7a7a", [2 * devicePixelRatio, 3 * devicePixelRatio], "frame");
      vline(u, page.cursors[0], "#111111", [], "A");
      vline(u, page.cursors[1], "#111111", [8 * devicePixelRatio, 3 * devicePixelRatio], "B");
      ctx.restore();
    };
  }

  // The crosshair readout: the instant under the pointer and every shown probe's value there.
  function readout(u) {
    var box = document.getElementById("readout");
    var idx = u.cursor.idx;
    if (idx === null || idx === undefined || !box) return;
    var t = u.data[0][idx], kind = u === page.charts.a ? "a" : "v", unit = kind === "a" ? "A" : "V";
    box.setAttribute("data-t", String(t));
    box.setAttribute("data-kind", kind);
    var parts = ["<span class=\"ro-time\">t = " + eng(t, "s", 5) + "</span>"];
    for (var i = 0; i < n; i++) {
      if (!u.series[i + 1].show) continue;
      var v = u.data[i + 1][idx];
      parts.push("<span class=\"ro-probe\" data-probe=\"" + esc(probes[i].name) + "\" data-v=\"" + String(v) + "\" style=\"color:" + colour(i) + "\">" +
        esc(probes[i].name) + " " + eng(v, unit, 4) + "</span>");
    }
    box.innerHTML = parts.join(" ");
  }

  function esc(s) { return String(s).replace(/[&<>"']/g, function (c) { return "&#" + c.charCodeAt(0) + ";"; }); }

  // The two cursors' readout: Δt, 1/Δt and each shown probe's values at A and B and their difference.
  function cursorTable() {
    var box = document.getElementById("cursor-readout");
    if (!box) return;
    var a = page.cursors[0], b = page.cursors[1];
    if (a === null) { box.innerHTML = "<p class=\"note\">Click the chart to place cursor A, click again for cursor B; a third click moves the nearer one. Drag to zoom, double-click to show the whole record.</p>"; return; }
    var rows = ["<tr><th>probe</th><th>V at A</th><th>V at B</th><th>\u0394V (B \u2212 A)</th></tr>"];
    for (var i = 0; i < n; i++) {
      if (!page.charts.v.series[i + 1].show) continue;
      var va = valueAt(i, a), vb = b === null ? null : valueAt(i, b);
      rows.push("<tr data-probe=\"" + esc(probes[i].name) + "\"><td>" + esc(probes[i].name) + "</td><td>" + eng(va, "V") + "</td><td>" + (vb === null ? "-" : eng(vb, "V")) +
        "</td><td class=\"dv\" data-dv=\"" + (vb === null ? "" : String(vb - va)) + "\">" + (vb === null ? "-" : eng(vb - va, "V")) + "</td></tr>");
    }
    var dt = b === null ? null : b - a;
    box.setAttribute("data-dt", dt === null ? "" : String(dt));
    box.innerHTML = "<p class=\"cursor-times\">A = " + eng(a, "s", 5) + (b === null ? "" : ", B = " + eng(b, "s", 5) + ", \u0394t = " + eng(dt, "s", 4) +
      ", 1/\u0394t = " + (dt === 0 ? "-" : eng(1 / Math.abs(dt), "Hz", 4))) + "</p><table class=\"cursor-table\">" + rows.join("") + "</table>";
  }

  function placeCursor(t) {
    var c = page.cursors;
    if (c[0] === null) c[0] = t;
    else if (c[1] === null) c[1] = t;
    else if (Math.abs(t - c[0]) <= Math.abs(t - c[1])) c[0] = t;
    else c[1] = t;
    cursorTable();
    redrawAll();
  }
  page.placeCursor = placeCursor;

  function redrawAll() { ["v", "a"].forEach(function (k) { if (page.charts[k]) page.charts[k].redraw(false); }); }

  function makeChart(kind) {
    var el = document.getElementById("chart-" + kind);
    var unit = kind === "a" ? "A" : "V";
    var opts = {
      width: Math.max(300, el.clientWidth || 1000),
      height: kind === "a" ? 260 : 380,
      scales: { x: { time: false } },
      legend: { show: false },
      axes: [
        { values: function (u, vals) { return vals.map(function (v) { return eng(v, "s", 3); }); }, label: "time", size: 44, space: 70 },
        { values: function (u, vals) { return vals.map(function (v) { return eng(v, unit, 3); }); }, label: kind === "a" ? "current" : "voltage", size: 74 },
      ],
      series: [{ label: "time" }].concat(probes.map(function (p, i) {
        return { label: p.name, stroke: colour(i), width: 1.5, show: p.shown, points: { show: false } };
      })),
      cursor: {
        sync: { key: "wavesim-time" },
        drag: { x: true, y: false, setScale: true },
        points: { size: 6 },
        bind: { dblclick: function () { return null; } },
      },
      hooks: {
        setCursor: [readout],
        draw: [overlay(kind)],
        setScale: [function (u, key) {
          if (key !== "x" || syncing) return;
          var min = u.scales.x.min, max = u.scales.x.max;
          if (min === range.min && max === range.max) return;
          // After uPlot has finished its own update: new data inside its hook would be overwritten.
          range = { min: min, max: max };
          queueMicrotask(function () { refresh(min, max); });
        }],
      },
    };
    // Built with the hooks quiet: uPlot's own first scaling must not count as a zoom.
    syncing = true;
    var u;
    try {
      u = new uPlot(opts, chartData(kind), el);
      u.setScale("x", { min: range.min, max: range.max });
    } finally { syncing = false; }
    var down = null;
    u.over.addEventListener("mousedown", function (e) { down = [e.clientX, e.clientY]; });
    u.over.addEventListener("mouseup", function (e) {
      if (down && Math.abs(e.clientX - down[0]) < 3 && Math.abs(e.clientY - down[1]) < 3)
        placeCursor(u.posToVal(e.clientX - u.over.getBoundingClientRect().left, "x"));
      down = null;
    });
    u.over.addEventListener("dblclick", function () { resetZoom(); });
    page.charts[kind] = u;
    return u;
  }

  function toggles() {
    var box = document.getElementById("probe-toggles");
    probes.forEach(function (p, i) {
      var label = document.createElement("label");
      label.className = "toggle";
      var input = document.createElement("input");
      input.type = "checkbox"; input.checked = p.shown; input.setAttribute("data-probe", p.name);
      input.addEventListener("change", function () { setProbe(i, input.checked); });
      var swatch = document.createElement("span");
      swatch.className = "swatch"; swatch.style.background = colour(i);
      label.appendChild(input); label.appendChild(swatch); label.appendChild(document.createTextNode(" " + p.name + " (" + p.at + ")"));
      box.appendChild(label);
    });
    var cur = document.getElementById("show-currents");
    if (!data.currents) cur.parentNode.hidden = true;
    cur.addEventListener("change", showCurrents);
    function showCurrents() {
      var el = document.getElementById("chart-a-box");
      el.hidden = !cur.checked;
      if (cur.checked && !page.charts.a) { makeChart("a"); probes.forEach(function (p, i) { page.charts.a.setSeries(i + 1, { show: page.charts.v.series[i + 1].show }); }); }
    }
    if (data.currentsShown) { cur.checked = true; page.showCurrentsAtStart = showCurrents; }
    document.getElementById("reset-zoom").addEventListener("click", resetZoom);
    document.getElementById("clear-cursors").addEventListener("click", function () { page.cursors = [null, null]; cursorTable(); redrawAll(); });
  }

  function setProbe(i, show) {
    ["v", "a"].forEach(function (k) { if (page.charts[k]) page.charts[k].setSeries(i + 1, { show: show }); });
    cursorTable();
  }
  page.setProbe = setProbe;

  // Frames: V(z) along the main line at each snapshot instant, on a scrubber with a play button.
  function frames() {
    var f = data.frames;
    if (!f) return;
    var lo = Infinity, hi = -Infinity;
    f.v.forEach(function (row) { row.forEach(function (x) { if (x < lo) lo = x; if (x > hi) hi = x; }); });
    var pad = (hi - lo) * 0.05 || 0.1;
    var el = document.getElementById("frame-chart");
    var u = new uPlot({
      width: Math.max(300, el.clientWidth || 1000), height: 300,
      scales: { x: { time: false }, y: { range: [lo - pad, hi + pad] } },
      legend: { show: false },
      axes: [
        { values: function (u, vals) { return vals.map(function (v) { return eng(v, "m", 3); }); }, label: "position along the line", size: 44, space: 70 },
        { values: function (u, vals) { return vals.map(function (v) { return eng(v, "V", 3); }); }, label: "voltage", size: 74 },
      ],
      series: [{ label: "z" }, { label: "V(z)", stroke: "#1f5fbf", width: 2, points: { show: false } }],
      cursor: { drag: { x: false, y: false } },
    }, [f.z, f.v[0]], el);
    page.charts.frame = u;
    var slider = document.getElementById("scrubber");
    slider.max = String(f.t.length - 1);
    slider.addEventListener("input", function () { setFrame(Number(slider.value)); });
    var play = document.getElementById("play"), timer = null;
    play.addEventListener("click", function () {
      if (timer !== null) { clearInterval(timer); timer = null; play.textContent = "play"; return; }
      if (page.frame >= f.t.length - 1) setFrame(0);
      play.textContent = "pause";
      timer = setInterval(function () {
        if (page.frame >= f.t.length - 1) { clearInterval(timer); timer = null; play.textContent = "play"; return; }
        setFrame(page.frame + 1);
      }, 50);
    });
    setFrame(0);
  }

  function setFrame(k) {
    var f = data.frames;
    k = Math.max(0, Math.min(f.t.length - 1, Math.round(k)));
    page.frame = k;
    page.charts.frame.setData([f.z, f.v[k]], false);
    document.getElementById("scrubber").value = String(k);
    var label = document.getElementById("frame-label");
    label.textContent = "frame " + (k + 1) + " of " + f.t.length + " at t = " + eng(f.t[k], "s", 4);
    label.setAttribute("data-frame", String(k));
    label.setAttribute("data-t", String(f.t[k]));
    redrawAll();
  }
  page.setFrame = setFrame;

  // The space-time map: one pixel per frame (down) and position (across), coloured by voltage; the pointer reads z, t, V.
  function spaceTime() {
    var f = data.frames, canvas = document.getElementById("spacetime-map");
    if (!f || !canvas) return;
    var w = f.z.length, h = f.t.length, lo = Infinity, hi = -Infinity;
    f.v.forEach(function (row) { row.forEach(function (x) { if (x < lo) lo = x; if (x > hi) hi = x; }); });
    if (!(hi > lo)) hi = lo + 1;
    canvas.width = w; canvas.height = h;
    var ctx = canvas.getContext("2d"), img = ctx.createImageData(w, h);
    // Our own ramp: deep blue (lowest) through pale grey to orange-red (highest).
    var stops = [[24, 52, 112], [232, 232, 226], [196, 64, 28]];
    for (var r = 0; r < h; r++) for (var c = 0; c < w; c++) {
      var q = (f.v[r][c] - lo) / (hi - lo), s = q < 0.5 ? 0 : 1, g = q < 0.5 ? q * 2 : q * 2 - 1, o = 4 * (r * w + c);
      for (var ch = 0; ch < 3; ch++) img.data[o + ch] = Math.round(stops[s][ch] + g * (stops[s + 1][ch] - stops[s][ch]));
      img.data[o + 3] = 255;
    }
    ctx.putImageData(img, 0, 0);
    document.getElementById("spacetime-scale").textContent = "colour from " + eng(lo, "V", 3) + " (blue) to " + eng(hi, "V", 3) +
      " (red); position 0 to " + eng(f.z[w - 1], "m", 3) + " across, time 0 to " + eng(f.t[h - 1], "s", 3) + " down";
    var out = document.getElementById("spacetime-readout");
    // The cell under the pointer, measured inside the canvas's border.
    function cell(e) {
      var box = canvas.getBoundingClientRect();
      return [Math.min(w - 1, Math.max(0, Math.floor((e.clientX - box.left - canvas.clientLeft) / canvas.clientWidth * w))),
        Math.min(h - 1, Math.max(0, Math.floor((e.clientY - box.top - canvas.clientTop) / canvas.clientHeight * h)))];
    }
    canvas.addEventListener("mousemove", function (e) {
      var at = cell(e), c = at[0], r = at[1];
      out.setAttribute("data-row", String(r)); out.setAttribute("data-column", String(c));
      out.setAttribute("data-z", String(f.z[c])); out.setAttribute("data-t", String(f.t[r])); out.setAttribute("data-v", String(f.v[r][c]));
      out.textContent = "z = " + eng(f.z[c], "m", 4) + ", t = " + eng(f.t[r], "s", 4) + ", V = " + eng(f.v[r][c], "V", 4);
    });
    canvas.addEventListener("click", function (e) { setFrame(cell(e)[1]); });
  }

  function start() {
    current = view(range.min, range.max, columns());
    toggles();
    makeChart("v");
    if (page.showCurrentsAtStart) page.showCurrentsAtStart();
    cursorTable();
    frames();
    spaceTime();
    window.addEventListener("resize", function () {
      ["v", "a", "frame"].forEach(function (k) {
        var u = page.charts[k], el = u && u.root.parentNode;
        if (u && el.clientWidth > 0) u.setSize({ width: el.clientWidth, height: u.height });
      });
    });
    page.range = range;
    page.ready = true;
  }
  start();
})();
