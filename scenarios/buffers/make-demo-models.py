#!/usr/bin/env python3
"""Writes the two invented demo buffer models, demo33.ibs and demo18.ibs (run from this folder).

Every number is invented for WaveSim's demos; no vendor's file or part was used. The laws:
  pulldown (NMOS, gate at the supply Vs):  I(V) = k*((Vs-Vt)*V - V^2/2)*(1+lam*V) in triode (0 <= V < Vs-Vt),
                                           I(V) = k/2*(Vs-Vt)^2*(1+lam*V) in saturation, and for V < 0 the channel
                                           conducts backwards with gate drive Vs-V: I(V) = -k*((Vs-V-Vt)*|V| - V^2/2)
  pullup (PMOS): the same law of the table voltage Vs - Vpin, with the current out of the pin (negative)
  clamps: a diode I = Is*(exp(Vd/(n*VT)) - 1) behind a series resistance Rs, solved for the current by bisection
Switching: Ku(t), Kd(t) follow raised cosines over Tsw, starting at t0; the waveforms come from integrating
  (C_comp + C_fixture) dV/dt = (V_fixture - V)/R_fixture - Ku*Ipu(V) - Kd*Ipd(V) - Iclamps(V)
with the tables as written (linear between their points) by fourth-order Runge-Kutta, 0.25 ps steps.
[Ramp] is the 20-80 % swing and time of the waveform into R_load = 50 ohm (to ground for the rising edge, to the
supply for the falling one).
"""
import math

VT = 0.025852  # thermal voltage at 300 K


def mos(k, vt, vs, lam, v):
    if v >= 0:
        vov = vs - vt
        if v < vov:
            return k * (vov * v - v * v / 2) * (1 + lam * v)
        return k / 2 * vov * vov * (1 + lam * v)
    a = -v
    return -k * ((vs + a - vt) * a - a * a / 2)


def diode(i_s, n, rs, vd):
    """Current of a diode behind rs at a total forward voltage vd (A), by bisection on the junction voltage."""
    if vd <= 0:
        return i_s * (math.exp(vd / (n * VT)) - 1)
    lo, hi = 0.0, vd
    for _ in range(200):
        vj = (lo + hi) / 2
        if i_s * (math.exp(vj / (n * VT)) - 1) * rs + vj > vd:
            hi = vj
        else:
            lo = vj
    return i_s * (math.exp(lo / (n * VT)) - 1)


def eng(x, unit=""):
    if x == 0:
        return "0" + unit
    for s, f in (("", 1), ("m", 1e-3), ("u", 1e-6), ("n", 1e-9), ("p", 1e-12), ("f", 1e-15)):
        if abs(x) >= f * 0.9999:
            return f"{x / f:.4g}{s}{unit}"
    return f"{x:.4g}{unit}"


class Pwl:
    def __init__(self, pts):
        self.x = [p[0] for p in pts]
        self.y = [p[1] for p in pts]

    def __call__(self, v):
        x, y = self.x, self.y
        k = 0 if v < x[0] else len(x) - 2 if v >= x[-1] else max(i for i in range(len(x) - 1) if x[i] <= v)
        return y[k] + (y[k + 1] - y[k]) * (v - x[k]) / (x[k + 1] - x[k])


def grid(vs):
    pts = [-vs + i * vs / 5 for i in range(4)]                   # -Vs .. -0.4 Vs, coarse
    pts += [-0.2 * vs + i * 0.05 * vs for i in range(30)]       # -0.2 Vs .. 1.25 Vs, fine
    pts += [1.3 * vs + i * 0.7 * vs / 7 for i in range(8)]      # 1.3 Vs .. 2 Vs, coarse
    return [round(p, 4) for p in pts]


def clamp_grid(vs):
    return [round(-vs + i * 0.05 * vs, 4) for i in range(41)]


def raised(t, t0, tsw):
    if t <= t0:
        return 0.0
    if t >= t0 + tsw:
        return 1.0
    return 0.5 - 0.5 * math.cos(math.pi * (t - t0) / tsw)


class Corner:
    def __init__(self, vs, kn, kp, vtn, vtp, ccomp, tsw, is_scale):
        self.vs, self.kn, self.kp, self.vtn, self.vtp, self.ccomp, self.tsw, self.is_scale = vs, kn, kp, vtn, vtp, ccomp, tsw, is_scale


def tables(c, lam, span):
    g = grid(span)
    pd = [(v, mos(c.kn, c.vtn, c.vs, lam, v)) for v in g]
    pu = [(v, -mos(c.kp, c.vtp, c.vs, lam, v)) for v in g]  # v is Vs - Vpin; current out of the pin
    cg = clamp_grid(span)
    gnd = [(v, -diode(1e-14 * c.is_scale, 1.05, 4.0, -v)) for v in cg]    # conducts when the pin is below ground
    pwr = [(v, diode(1e-14 * c.is_scale, 1.05, 4.0, -v)) for v in cg]     # v is Vs - Vpin: conducts into the pin above the supply
    return pd, pu, gnd, pwr


def waveform(c, tabs, rising, rfix, vfix, cfix, t_end, rows=100, pullup=True):
    pd, pu, gnd, pwr = (Pwl(t) for t in tabs)
    vs = c.vs

    def i_part(v, ku, kd):
        i = kd * pd(v) + gnd(v) + pwr(vs - v)
        if pullup:
            i += ku * pu(vs - v)
        return i

    def k(t):
        s = raised(t, 0.1e-9, c.tsw)
        return (s, 1 - s) if rising else (1 - s, s)

    def f(t, v):
        ku, kd = k(t)
        if not pullup:
            ku = 0.0
        return ((vfix - v) / rfix - i_part(v, ku, kd)) / (c.ccomp + cfix)

    # the start: the static level with the edge's initial coefficients, by bisection
    ku0, kd0 = k(0.0)
    if not pullup:
        ku0 = 0.0
    lo, hi = -vs, 2 * vs
    for _ in range(200):
        mid = (lo + hi) / 2
        if (vfix - mid) / rfix - i_part(mid, ku0, kd0) > 0:
            lo = mid
        else:
            hi = mid
    v = (lo + hi) / 2
    h = 0.25e-12
    n = int(round(t_end / h))
    every = n // (rows - 1)
    out = [(0.0, v)]
    t = 0.0
    for step in range(1, n + 1):
        k1 = f(t, v); k2 = f(t + h / 2, v + h / 2 * k1); k3 = f(t + h / 2, v + h / 2 * k2); k4 = f(t + h, v + h * k3)
        v += h / 6 * (k1 + 2 * k2 + 2 * k3 + k4)
        t += h
        if step % every == 0 and len(out) < rows:
            out.append((t, v))
    return out


def ramp(w):
    v0, v1 = w[0][1], w[-1][1]
    lo, hi = v0 + 0.2 * (v1 - v0), v0 + 0.8 * (v1 - v0)

    def cross(level):
        for (ta, va), (tb, vb) in zip(w, w[1:]):
            if (va - level) * (vb - level) <= 0 and va != vb:
                return ta + (level - va) * (tb - ta) / (vb - va)
        raise ValueError("no crossing")
    return abs(hi - lo), cross(hi) - cross(lo)


def rows3(cols):
    """Rows of (x, typ, min, max) from three corner tables on the same x."""
    return [(cols[0][i][0], cols[0][i][1], cols[1][i][1], cols[2][i][1]) for i in range(len(cols[0]))]


def write_table(out, header, rows, unit):
    out.append(f"| {header}")
    for x, a, b, c in rows:
        out.append(f"{x:>10.4g} {eng(a, unit):>12} {eng(b, unit):>12} {eng(c, unit):>12}")


def model_block(out, name, mtype, corners, lam, extra, waves, pullup=True, vin=None, ramp_only=False, keywords_ref=False):
    typ, mn, mx = corners
    out.append("|" + "-" * 79)
    out.append(f"[Model]        {name}")
    out.append(f"Model_type     {mtype}")
    if mtype != "Input":
        out.append("Polarity       Non-Inverting")
    if mtype in ("I/O", "3-state"):
        out.append("Enable         Active-High")
    if vin:
        out.append(f"Vinl = {vin[0]}V")
        out.append(f"Vinh = {vin[1]}V")
    out.extend(extra)
    out.append(f"C_comp         {eng(typ.ccomp, 'F')} {eng(mn.ccomp, 'F')} {eng(mx.ccomp, 'F')}")
    out.append("|")
    out.append("|              typ     min     max")
    if keywords_ref:
        out.append(f"[Pullup Reference]     {typ.vs}V {mn.vs}V {mx.vs}V")
        out.append("[Pulldown Reference]   0V    0V    0V")
        out.append("[GND Clamp Reference]  0V    0V    0V")
        out.append(f"[POWER Clamp Reference] {typ.vs}V {mn.vs}V {mx.vs}V")
    else:
        out.append(f"[Voltage Range] {typ.vs}V {mn.vs}V {mx.vs}V")
    tabs = [tables(c, lam, typ.vs) for c in corners]  # one voltage column: the typ corner's grid
    if mtype != "Input":
        out.append("[Pulldown]")
        write_table(out, "voltage    I(typ)       I(min)       I(max)", rows3([t[0] for t in tabs]), "A")
        if pullup:
            out.append("[Pullup]")
            out.append("| voltage is the pullup reference minus the pin voltage")
            write_table(out, "voltage    I(typ)       I(min)       I(max)", rows3([t[1] for t in tabs]), "A")
    out.append("[GND Clamp]")
    write_table(out, "voltage    I(typ)       I(min)       I(max)", rows3([t[2] for t in tabs]), "A")
    out.append("[POWER Clamp]")
    out.append("| voltage is the power clamp reference minus the pin voltage")
    write_table(out, "voltage    I(typ)       I(min)       I(max)", rows3([t[3] for t in tabs]), "A")
    if mtype == "Input":
        return
    # [Ramp] from waveforms into R_load = 50 ohm (to ground rising, to the supply falling; an open drain to the supply)
    rr, ff = [], []
    for c, t in zip(corners, tabs):
        t_end = 0.1e-9 + c.tsw * 3
        rise_to = c.vs if not pullup else 0.0
        rr.append(ramp(waveform(c, t, True, 50.0, rise_to, 0.0, t_end, pullup=pullup)))
        ff.append(ramp(waveform(c, t, False, 50.0, c.vs, 0.0, t_end, pullup=pullup)))
    out.append("[Ramp]")
    out.append("|             typ             min             max")
    out.append("dV/dt_r   " + "  ".join(f"{eng(dv)}/{eng(dt)}" for dv, dt in rr))
    out.append("dV/dt_f   " + "  ".join(f"{eng(dv)}/{eng(dt)}" for dv, dt in ff))
    out.append("R_load = 50")
    for rising, vfix_corner in waves:
        key = "[Rising Waveform]" if rising else "[Falling Waveform]"
        out.append(key)
        out.append("R_fixture = 50")
        vf = [vfix_corner(c) for c in corners]
        out.append(f"V_fixture = {vf[0]}")
        out.append(f"V_fixture_min = {vf[1]}")
        out.append(f"V_fixture_max = {vf[2]}")
        out.append("C_fixture = 0")
        t_end = 0.1e-9 + 3 * max(c.tsw for c in corners)  # one time axis for the three corners, long enough for the slowest
        cols = [waveform(c, t, rising, 50.0, v, 0.0, t_end, pullup=pullup) for c, t, v in zip(corners, tabs, vf)]
        out.append("| time        V(typ)      V(min)      V(max)")
        for i in range(len(cols[0])):
            out.append(f"{eng(cols[0][i][0], 's'):>10} " + " ".join(f"{volts(col[i][1]):>10}" for col in cols))


def volts(v):
    text = f"{v:.4f}"
    return ("0.0000" if text == "-0.0000" else text) + "V"


def header(out, fname, comp, pins, pkg):
    out += [
        "|" + "=" * 79,
        f"| {fname}: an INVENTED buffer model for WaveSim's demos. No real part, no vendor's data.",
        "| Written by make-demo-models.py from the square-law and diode equations stated there.",
        "|" + "=" * 79,
        "[IBIS Ver]      5.0",
        f"[File Name]     {fname}",
        "[File Rev]      1.0",
        "[Date]          2 December 2026",
        "[Source]        Invented: square-law transistors and ideal diodes, see make-demo-models.py",
        "[Notes]         Demo data only. The tables are not measurements of anything.",
        "[Disclaimer]    Invented numbers; do not use them to design hardware.",
        f"[Component]     {comp}",
        "[Manufacturer]  Invented for WaveSim demos",
        "[Package]",
        "| variable   typ      min      max",
    ]
    out += pkg
    out.append("[Pin]  signal_name  model_name   R_pin   L_pin   C_pin")
    out += pins


def demo33():
    lam = 0.05
    corners = [
        Corner(3.3, 0.0185, 0.016, 0.60, 0.65, 3.0e-12, 0.80e-9, 1.0),
        Corner(3.0, 0.0140, 0.012, 0.70, 0.75, 2.6e-12, 1.05e-9, 0.5),
        Corner(3.6, 0.0240, 0.021, 0.50, 0.55, 3.4e-12, 0.60e-9, 2.0),
    ]
    out = []
    header(out, "demo33.ibs", "DEMO33-IO4", [
        "1      IO0          demo33_io    0.30    3.1nH   0.70pF",
        "2      IO1          demo33_io    0.28    2.9nH   0.66pF",
        "3      IN0          demo33_in    NA      NA      NA",
        "4      VDD33        POWER        NA      NA      NA",
        "5      GND          GND          NA      NA      NA",
    ], ["R_pkg      0.25     0.20     0.30", "L_pkg      2.8nH    2.2nH    3.4nH", "C_pkg      0.65pF   0.55pF   0.75pF"])
    model_block(out, "demo33_io", "I/O", corners, lam, ["Vmeas = 1.65V", "Cref = 0pF", "Rref = 50", "Vref = 0V"],
                [(True, lambda c: 0.0), (True, lambda c: c.vs), (False, lambda c: 0.0), (False, lambda c: c.vs)],
                vin=(0.8, 2.0))
    model_block(out, "demo33_in", "Input", corners, lam, [], [], vin=(0.8, 2.0))
    out.append("[End]")
    return out


def demo18():
    lam = 0.08
    corners = [
        Corner(1.8, 0.035, 0.030, 0.45, 0.48, 2.0e-12, 0.50e-9, 1.0),
        Corner(1.62, 0.026, 0.022, 0.52, 0.55, 1.7e-12, 0.68e-9, 0.5),
        Corner(1.98, 0.046, 0.040, 0.40, 0.42, 2.3e-12, 0.38e-9, 2.0),
    ]
    out = []
    header(out, "demo18.ibs", "DEMO18-IO3", [
        "1      D0           demo18_out   0.22    2.1nH   0.45pF",
        "2      SDA          demo18_od    0.24    2.3nH   0.48pF",
        "3      VDD18        POWER        NA      NA      NA",
        "4      GND          GND          NA      NA      NA",
    ], ["R_pkg      0.20     0.16     0.25", "L_pkg      2.2nH    1.8nH    2.6nH", "C_pkg      0.45pF   0.38pF   0.52pF"])
    model_block(out, "demo18_out", "Output", corners, lam, ["Vmeas = 0.9V", "Cref = 0pF", "Rref = 50", "Vref = 0V"], [],
                keywords_ref=True)
    model_block(out, "demo18_od", "Open_drain", corners, lam, ["Vmeas = 0.9V"],
                [(False, lambda c: c.vs)], pullup=False, vin=(0.63, 1.17))
    out.append("[End]")
    return out


for name, lines in (("demo33.ibs", demo33()), ("demo18.ibs", demo18())):
    with open(name, "w", newline="\n") as f:
        f.write("\n".join(lines) + "\n")
    print("wrote", name, len(lines), "lines")
