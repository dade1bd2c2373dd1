#!/usr/bin/python3
"""Independent numpy/scipy/matplotlib re-computation of the calculation memo of
testdata/bench/bench-thick.md (1000 turns of AWG 24 copper, 60 mm mean
diameter, 18.5 mm long, 18 mm radial build, 1 A, still air at 25 degC).

Stages (each timed):
  layout     turn-by-turn winding layout (touching turns, layers from the bore)
  resist     wire data, resistance at 20 degC, mass
  heat       steady heat balance (Churchill-Chu horizontal cylinder + radiation,
             resistance at the mean winding temperature, radial conduction rise),
             thermal time constant, 400-ring finite-volume cross-check
  induct     L = sum_i sum_j M_ij (Maxwell's elliptic formula, i != j; round-wire
             self term mu0 a (ln(8a/r) - 7/4) for i == j), Wheeler cross-check
  axis       centre field, moment, far-axis profile (241 pts), bore profile
             (241 pts), +-1 % flat region, end ratio, moment extrapolation,
             far-field check at 20 sizes, dipole distances (axis, plane, any
             direction in 10 deg steps, 1 % and 0.1 %), 0.5 mT reach
  map        |B| over the meridian plane, 201 x 201 nodes over +-62.4 mm,
             every turn's exact loop field summed at every node outside the
             winding (rho >= 0 half computed, rho < 0 mirrored; --full-map
             computes both halves)
  verify     numerical Biot-Savart line integral (scipy.integrate.quad) at the
             centre (sample of turns) and at the off-axis test point (every turn)
  warmup     lumped warm-up from ambient (mean, internal lags), time to 130 degC
  pdf        multipage PDF (summary, cross-section, bore profile, axis profile
             with dipole, |B| map with LogNorm and contours, warm-up)

Run with /usr/bin/python3 (Debian numpy/scipy/matplotlib).
"""
import json
import os
import tempfile
import sys
import time

import numpy as np
from scipy.special import ellipk, ellipe, ellipkm1
from scipy.integrate import quad, solve_ivp
from scipy.optimize import brentq
from scipy.linalg import solve_banded

import matplotlib
matplotlib.use("Agg")
import matplotlib.pyplot as plt
from matplotlib.backends.backend_pdf import PdfPages
from matplotlib.colors import LogNorm
from matplotlib.collections import EllipseCollection
from matplotlib.patches import Rectangle

T_START = time.perf_counter()
TIMES = {}


class stage:
    def __init__(self, name):
        self.name = name

    def __enter__(self):
        self.t0 = time.perf_counter()

    def __exit__(self, *a):
        TIMES[self.name] = time.perf_counter() - self.t0


FULL_MAP = "--full-map" in sys.argv
OUT_PDF = os.path.join(tempfile.gettempdir(), "bench_thick.pdf")

MU0 = 1.25663706212e-6
SIGMA = 5.670374419e-8
G = 9.80665
C2K = 273.15

# ---------------------------------------------------------------- the spec
D_MEAN = 60e-3
LENGTH = 18.5e-3
BUILD = 18e-3
N_TURNS = 1000
AWG = 24
I = 1.0
T_AMB = 25.0 + C2K
EMISS = 0.85
K_WIND = 0.30           # W/(m K), effective conductivity across the turns
T_CLASS = 130.0 + C2K   # insulation class 130 (B)

# copper
RHO20 = 1 / 58e6        # Ohm m (IEC 60028: 1/58 Ohm mm2/m; the memo prints it rounded, 1.7241e-8)
ALPHA20 = 0.00393       # 1/K
DENSITY = 8890.0        # kg/m3
CP = 385.0              # J/(kg K)

# ================================================================ layout
with stage("layout"):
    d_bare = 0.127e-3 * 92.0 ** ((36 - AWG) / 39)             # ASTM B258
    d_out = d_bare + 0.0813e-3 * (d_bare / 1.628e-3) ** 0.4   # heavy-build estimate
    r_in = D_MEAN / 2 - BUILD / 2
    tpl = int(np.floor(LENGTH / d_out + 1e-9))
    n_layers = -(-N_TURNS // tpl)
    a_list, z_list = [], []
    left = N_TURNS
    for k in range(n_layers):
        nk = min(tpl, left)
        left -= nk
        r = r_in + d_out / 2 + k * d_out
        z = (np.arange(nk) - (nk - 1) / 2) * d_out
        a_list.append(np.full(nk, r))
        z_list.append(z)
    A_T = np.concatenate(a_list)      # turn radii
    Z_T = np.concatenate(z_list)      # turn axial positions
    r_out = r_in + max(BUILD, n_layers * d_out)
    env = dict(R0=r_in, R1=r_in + BUILD, Z0=-LENGTH / 2, Z1=LENGTH / 2)
    assert A_T.size == N_TURNS

# ================================================================ resistance
with stage("resist"):
    area_cu = np.pi * d_bare ** 2 / 4
    wire_len = np.sum(2 * np.pi * A_T)
    R20 = RHO20 * wire_len / area_cu
    mass = DENSITY * area_cu * wire_len
    fill = N_TURNS * area_cu / (LENGTH * BUILD)
    J = I / area_cu
    moment = I * np.sum(np.pi * A_T ** 2)

# ================================================================ heating
AIR = np.array([  # Incropera & DeWitt, 6th ed., Table A.4: T K, nu m2/s, k W/(m K), Pr
    [200, 7.590e-6, 18.1e-3, 0.737], [250, 11.44e-6, 22.3e-3, 0.720],
    [300, 15.89e-6, 26.3e-3, 0.707], [350, 20.92e-6, 30.0e-3, 0.700],
    [400, 26.41e-6, 33.8e-3, 0.690], [450, 32.39e-6, 37.3e-3, 0.686],
    [500, 38.79e-6, 40.7e-3, 0.684], [550, 45.57e-6, 43.9e-3, 0.683],
    [600, 52.69e-6, 46.9e-3, 0.685], [650, 60.21e-6, 49.7e-3, 0.690],
    [700, 68.10e-6, 52.4e-3, 0.695], [750, 76.37e-6, 54.9e-3, 0.702],
    [800, 84.93e-6, 57.3e-3, 0.709]])

with stage("heat"):
    L_conv = 2 * r_out                                  # horizontal cylinder, outer diameter
    A_s = np.pi * 2 * r_out * LENGTH + 2 * np.pi * (r_out ** 2 - r_in ** 2)

    def h_conv(Ts):
        Tf = 0.5 * (Ts + T_AMB)
        nu = np.interp(Tf, AIR[:, 0], AIR[:, 1])
        ka = np.interp(Tf, AIR[:, 0], AIR[:, 2])
        pr = np.interp(Tf, AIR[:, 0], AIR[:, 3])
        ra = G / Tf * np.abs(Ts - T_AMB) * L_conv ** 3 / (nu * nu / pr)
        nu_d = (0.60 + 0.387 * ra ** (1 / 6) / (1 + (0.559 / pr) ** (9 / 16)) ** (8 / 27)) ** 2
        return nu_d * ka / L_conv, ra, nu_d

    def q_out(Ts):
        h = h_conv(Ts)[0]
        return h * A_s * (Ts - T_AMB) + EMISS * SIGMA * A_s * (Ts ** 4 - T_AMB ** 4)

    def power(T):
        return I * I * R20 * (1 + ALPHA20 * (T - 293.15))

    # internal rises per watt (uniform heating, radial conduction, bore adiabatic)
    a2 = r_out ** 2 - r_in ** 2
    qv = 1 / (np.pi * a2 * LENGTH)
    lg = np.log(r_out / r_in)
    rise_max = qv / (4 * K_WIND) * (a2 - 2 * r_in ** 2 * lg)
    rise_mean = qv / (2 * K_WIND) * (a2 * a2 / 4 - r_in ** 2 * a2 / 2 + r_in ** 4 * lg) / a2

    c_ = rise_mean * I * I * R20

    def mean_at_surface(Ts):      # T - Ts = rise_mean * P(T), P linear in T
        return Ts + c_ * (1 + ALPHA20 * (Ts - 293.15)) / (1 - c_ * ALPHA20)

    def balance(Ts):
        return q_out(Ts) - power(mean_at_surface(Ts))

    grid = np.arange(T_AMB + 1e-6, 1500.0, 1.0)
    bal = np.array([balance(t) for t in grid[:1300]])
    i0 = np.argmax(bal > 0)
    Ts = brentq(balance, grid[i0 - 1], grid[i0], xtol=1e-12, rtol=1e-15)
    T_mean = mean_at_surface(Ts)
    P = power(T_mean)
    T_hot = T_mean + (rise_max - rise_mean) * P
    R_hot = P / I ** 2
    h_s, ra_s, nu_s = h_conv(Ts)
    Qc = h_s * A_s * (Ts - T_AMB)
    Qr = EMISS * SIGMA * A_s * (Ts ** 4 - T_AMB ** 4)
    C_heat = mass * CP

    def residual(T):
        p = power(T)
        return q_out(T - rise_mean * p) - p

    hh = 1e-3 * T_mean
    tau_th = C_heat / ((residual(T_mean + hh) - residual(T_mean - hh)) / (2 * hh))

    # cross-check: 400 rings, each heated at its own resistance, radial conduction,
    # bore adiabatic, the outer face at the surface temperature that sheds the total heat
    NR = 400
    edges = np.linspace(r_in, r_out, NR + 1)
    rc = 0.5 * (edges[1:] + edges[:-1])
    vol = np.pi * (edges[1:] ** 2 - edges[:-1] ** 2) * LENGTH
    frac = vol / vol.sum()
    dr = edges[1] - edges[0]
    g_in = 2 * np.pi * edges[1:-1] * LENGTH * K_WIND / dr           # between ring i and i+1
    g_surf = 2 * np.pi * r_out * LENGTH * K_WIND / (dr / 2)         # last ring to the surface
    p20 = I * I * R20 * frac

    def rings(Tsurf):
        # g_in*(T_i - T_{i+1}) ... : A T = b with q_i = p20_i (1 + a (T_i - 293.15))
        diag = np.zeros(NR)
        diag[:-1] += g_in
        diag[1:] += g_in
        diag[-1] += g_surf
        diag -= p20 * ALPHA20
        ab = np.zeros((3, NR))
        ab[0, 1:] = -g_in
        ab[1] = diag
        ab[2, :-1] = -g_in
        b = p20 * (1 - ALPHA20 * 293.15)
        b[-1] += g_surf * Tsurf
        T = solve_banded((1, 1), ab, b)
        return T, np.sum(p20 * (1 + ALPHA20 * (T - 293.15)))

    Ts_fv = brentq(lambda t: q_out(t) - rings(t)[1], T_AMB + 1, Ts + 300, xtol=1e-12)
    T_fv = rings(Ts_fv)[0]
    rise_fv = T_fv.max() - T_AMB

# ================================================================ inductance
with stage("induct"):
    iu, ju = np.triu_indices(N_TURNS, 1)
    a, b = A_T[iu], A_T[ju]
    d = Z_T[iu] - Z_T[ju]
    D = (a + b) ** 2 + d ** 2
    m = 4 * a * b / D
    m1 = ((a - b) ** 2 + d ** 2) / D          # 1 - m, exact as written
    k = np.sqrt(m)
    K = ellipkm1(m1)
    E = ellipe(m)
    Mij = MU0 * np.sqrt(a * b) * ((2 / k - k) * K - 2 / k * E)
    L_self = MU0 * A_T * (np.log(8 * A_T / (d_bare / 2)) - 1.75)
    L = 2 * Mij.sum() + L_self.sum()
    # Wheeler multilayer (SI form)
    L_wheeler = 31.5e-6 * (D_MEAN / 2) ** 2 * N_TURNS ** 2 / (
        6 * D_MEAN / 2 + 9 * LENGTH + 10 * BUILD)
    tau_el = L / R_hot
    energy = 0.5 * L * I ** 2
    del iu, ju, a, b, d, D, m, m1, k, K, E, Mij


# ---------------------------------------------------------------- loop fields
def loop_field(rho, z, chunk=1024):
    """B_rho, B_z (T) at points (rho, z) (1-D arrays), summed over all turns."""
    rho = np.atleast_1d(np.asarray(rho, float))
    z = np.atleast_1d(np.asarray(z, float))
    br = np.empty(rho.size)
    bz = np.empty(rho.size)
    a = A_T[None, :]
    for s in range(0, rho.size, chunk):
        r = rho[s:s + chunk, None]
        zeta = z[s:s + chunk, None] - Z_T[None, :]
        s2 = a * a + r * r + zeta * zeta
        alpha2 = s2 - 2 * a * r
        beta2 = s2 + 2 * a * r
        beta = np.sqrt(beta2)
        m = 1 - alpha2 / beta2
        K = ellipk(m)
        E = ellipe(m)
        c = MU0 * I / np.pi
        bz[s:s + chunk] = np.sum(c / (2 * alpha2 * beta) * ((a * a - r * r - zeta * zeta) * E + alpha2 * K), axis=1)
        with np.errstate(invalid="ignore", divide="ignore"):
            t = c * zeta / (2 * alpha2 * beta * r) * ((a * a + r * r + zeta * zeta) * E - alpha2 * K)
        t = np.where(r == 0, 0.0, t)
        br[s:s + chunk] = np.sum(t, axis=1)
    return br, bz


def dipole_field(rho, z):
    r2 = rho * rho + z * z
    r = np.sqrt(r2)
    c = MU0 * moment / (4 * np.pi * r ** 3)
    ur, uz = rho / r, z / r
    return c * 3 * uz * ur, c * (3 * uz * uz - 1)


# ================================================================ axis, dipole
with stage("axis"):
    B0 = np.sum(MU0 * I * A_T ** 2 / (2 * (A_T ** 2 + Z_T ** 2) ** 1.5))
    size = max(D_MEAN / 2 + BUILD / 2, LENGTH / 2)
    # current sheet per layer at the centre
    sheet = 0.0
    for r, zl in zip(a_list, z_list):
        n = zl.size
        ext = (zl[-1] - zl[0]) * n / (n - 1)
        sheet += MU0 * n * I / ext * (ext / 2) / np.sqrt(r[0] ** 2 + (ext / 2) ** 2)
    # moment from the far axis field, Richardson
    fitm = lambda zz: 2 * np.pi * zz ** 3 * abs(loop_field([0.0], [zz])[1][0]) / MU0
    zf = 40 * size
    m_far = (4 * fitm(2 * zf) - fitm(zf)) / 3
    z780 = 20 * size
    B780 = loop_field([0.0], [z780])[1][0]
    B780_dip = MU0 * moment / (2 * np.pi * z780 ** 3)

    # dipole distances: error falls as (size/d)^2; scan inward by 2 % steps, bisect
    extent = np.max(np.hypot(A_T, np.abs(Z_T)))

    def rel_err(theta, dist):
        dist = np.atleast_1d(dist)
        rho, zz = dist * np.sin(theta), dist * np.cos(theta)
        br, bz = loop_field(rho, zz)
        dr, dz = dipole_field(rho, zz)
        return np.hypot(dr - br, dz - bz) / np.hypot(br, bz)

    def dipole_beyond(theta, tol):
        hi = 10 * extent / np.sqrt(tol)
        n = int(np.ceil(np.log(hi / extent) / np.log(1.02)))
        ds = hi / 1.02 ** np.arange(n + 1)
        ds = ds[ds > extent]
        e = rel_err(theta, ds)
        bad = np.nonzero(e > tol)[0]
        if bad.size == 0:
            return extent
        j = bad[0]
        return brentq(lambda x: rel_err(theta, x)[0] - tol, ds[j], ds[j - 1], xtol=1e-12)

    dip = {}
    for tol in (0.01, 0.001):
        ax_ = dipole_beyond(0.0, tol)
        pl_ = dipole_beyond(np.pi / 2, tol)
        btw = max(dipole_beyond(np.deg2rad(10 * kk), tol) for kk in range(1, 9))
        dip[tol] = (ax_, pl_, max(ax_, pl_, btw))

    # far axis profile with the dipole field
    zmax = max(6 * size, 1.5 * dip[0.01][0])
    z_prof = np.linspace(-zmax, zmax, 241)
    bprof = np.abs(loop_field(np.zeros_like(z_prof), z_prof)[1])
    with np.errstate(divide="ignore"):
        bdip = np.where(np.abs(z_prof) > size, MU0 * moment / (2 * np.pi * np.abs(z_prof) ** 3), np.nan)
    # bore profile
    half_b = max(1.5 * LENGTH, LENGTH / 2 + r_out)
    z_bore = np.linspace(-half_b, half_b, 241)
    z_bore[120] = 0.0
    bz_bore = loop_field(np.zeros_like(z_bore), z_bore)[1]
    bzc = lambda zz: loop_field([0.0], [zz])[1][0]
    i_out = 120 + np.argmax(np.abs(bz_bore[120:] / B0 - 1) > 0.01)
    flat = brentq(lambda zz: abs(bzc(zz) / B0 - 1) - 0.01, z_bore[i_out - 1], z_bore[i_out], xtol=1e-13)
    end_ratio = bzc(LENGTH / 2) / B0
    # 0.5 mT reach along the axis and in the plane
    reach_axis = brentq(lambda zz: abs(bzc(zz)) - 0.5e-3, LENGTH / 2, 1.0, xtol=1e-10)
    bplane = lambda rr: np.hypot(*[v[0] for v in loop_field([rr], [0.0])])
    reach_plane = brentq(lambda rr: bplane(rr) - 0.5e-3, r_out + 1e-6, 1.0, xtol=1e-10)

# ================================================================ map
with stage("map"):
    x_half = 1.6 * env["R1"]
    z_half = max(env["Z1"] + 0.9 * env["R1"], x_half)
    x_half = max(x_half, 0.35 * z_half)
    nx = nz = 200 | 1
    zs = np.linspace(-z_half, z_half, nz)
    zs[nz // 2] = 0.0
    xs = np.linspace(-x_half, x_half, nx)
    xs[nx // 2] = 0.0
    XX, ZZ = np.meshgrid(xs, zs, indexing="ij")
    eps = 1e-9 * BUILD
    inside = ((np.abs(XX) > env["R0"] + eps) & (np.abs(XX) < env["R1"] - eps)
              & (ZZ > env["Z0"] + eps) & (ZZ < env["Z1"] - eps))
    Bmap = np.full(XX.shape, np.nan)
    todo = ~inside if FULL_MAP else (~inside & (XX >= 0))
    br, bz = loop_field(np.abs(XX[todo]), ZZ[todo])
    Bmap[todo] = np.hypot(br, bz)
    if not FULL_MAP:
        Bmap[: nx // 2] = Bmap[::-1][: nx // 2]       # rho < 0 mirrors rho > 0
    n_nodes = int(todo.sum())
    edge = np.nanmax(np.concatenate([Bmap[0], Bmap[-1], Bmap[:, 0], Bmap[:, -1]]))
    Bc_map = Bmap[nx // 2, nz // 2]

# ================================================================ verification
with stage("verify"):
    c4 = MU0 * I / (4 * np.pi)

    def bs_quad(a, z0, px, pz):
        dz = pz - z0
        r3 = lambda ph: (px * px - 2 * a * px * np.cos(ph) + a * a + dz * dz) ** 1.5
        bx = 0.0  # on the axis B_x vanishes by symmetry (quad cannot reach a relative tolerance on 0)
        if px != 0:
            bx = quad(lambda ph: a * np.cos(ph) * dz / r3(ph), 0, 2 * np.pi, epsabs=0, epsrel=1e-10, limit=200)[0]
        bz_ = quad(lambda ph: (a * a - a * px * np.cos(ph)) / r3(ph), 0, 2 * np.pi, epsabs=0, epsrel=1e-10, limit=200)[0]
        return c4 * bx, c4 * bz_

    R = D_MEAN / 2
    px, pz = 0.37 * R, 0.29 * R + LENGTH / 2 + BUILD
    num = np.array([bs_quad(a_, z_, px, pz) for a_, z_ in zip(A_T, Z_T)]).sum(axis=0)
    ex = loop_field([px], [pz])
    B_off_ex = np.hypot(ex[0][0], ex[1][0])
    B_off_num = np.hypot(*num)
    # centre: every 10th turn, quad against the closed on-axis form of the same turns
    samp = slice(0, None, 10)
    num_c = sum(bs_quad(a_, z_, 0.0, 0.0)[1] for a_, z_ in zip(A_T[samp], Z_T[samp]))
    ex_c = np.sum(MU0 * I * A_T[samp] ** 2 / (2 * (A_T[samp] ** 2 + Z_T[samp] ** 2) ** 1.5))

# ================================================================ warm-up
with stage("warmup"):
    tau_i = mass * CP * rise_mean
    extra = rise_max - rise_mean

    def rhs(t, y):
        T, x, u = y
        p = power(T)
        return [(p - q_out(T - u)) / C_heat, (extra * p - x) / tau_i, (rise_mean * p - u) / tau_i]

    ev = lambda t, y: y[0] + y[1] - T_CLASS
    ev.terminal = False
    ev.direction = 1
    sol = solve_ivp(rhs, (0, 100 * tau_th), [T_AMB, 0, 0], method="RK45", rtol=1e-9, atol=1e-9,
                    events=ev, dense_output=True, max_step=tau_th / 10)
    t_limit = sol.t_events[0][0]
    t_end = max(5 * tau_th, 1.3 * t_limit)
    t_end = max(t_end, min(5 * tau_th, 3 * t_limit))
    tw = np.linspace(0, t_end, 400)
    yw = sol.sol(tw)
    hot_w = yw[0] + yw[1]

# ================================================================ PDF
with stage("pdf"):
    mm = 1e3
    with PdfPages(OUT_PDF) as pdf:
        # page 1: summary
        fig = plt.figure(figsize=(8.27, 11.69))
        lines = [
            "Thick multilayer coil - independent numpy/scipy recomputation",
            "",
            f"Wire AWG {AWG}: bare {d_bare*1e6:.1f} um, overall {d_out*1e6:.1f} um",
            f"Layout: {tpl} turns/layer, {n_layers} layers, {N_TURNS} turns",
            f"Wire length {wire_len:.2f} m, mass {mass*1e3:.0f} g, fill {fill:.3f}",
            f"R20 = {R20:.4f} Ohm, R(hot) = {R_hot:.3f} Ohm, P = {P:.2f} W",
            f"Surface {Ts-C2K:.1f} C, mean {T_mean-C2K:.1f} C, hottest {T_hot-C2K:.1f} C",
            f"h = {h_s:.2f} W/m2K (Ra = {ra_s:.3g}), Qc = {Qc:.2f} W, Qr = {Qr:.2f} W",
            f"Thermal time constant {tau_th/60:.1f} min, C = {C_heat:.1f} J/K",
            f"400-ring FV rise above ambient {rise_fv:.1f} K (lumped {T_hot-T_AMB:.1f} K)",
            f"L = {L*1e3:.3f} mH (Wheeler {L_wheeler*1e3:.2f} mH), tau = {tau_el*1e3:.3f} ms",
            f"B(centre) = {B0*1e3:.4f} mT (sheet {sheet*1e3:.4f} mT)",
            f"m = {moment:.5f} A m2 (far field {m_far:.5f})",
            f"Dipole 1 %: axis {dip[0.01][0]*mm:.0f} mm, plane {dip[0.01][1]*mm:.0f} mm",
            f"Flat +-1 %: +-{flat*mm:.2f} mm; end ratio {end_ratio:.3f}",
            f"0.5 mT reach: axis {reach_axis*mm:.0f} mm, plane {reach_plane*mm:.0f} mm",
            f"Off-axis |B| {B_off_ex*1e3:.6f} mT vs quad {B_off_num*1e3:.6f} mT",
            f"Time to 130 C: {t_limit/60:.2f} min",
            f"Map of |B|: z from {-z_half*mm:.1f} mm to {z_half*mm:.1f} mm, rho from "
            f"{-x_half*mm:.1f} mm to {x_half*mm:.1f} mm, {nz} x {nx} points",
        ]
        fig.text(0.08, 0.95, "\n".join(lines), va="top", family="monospace", fontsize=9)
        pdf.savefig(fig)
        plt.close(fig)

        # cross-section
        fig, ax = plt.subplots(figsize=(8, 5))
        offs = np.column_stack([Z_T * mm, A_T * mm])
        ec = EllipseCollection(d_out * mm, d_out * mm, 0, units="xy", offsets=offs,
                               offset_transform=ax.transData, facecolors="#c87533", edgecolors="k", linewidths=0.2)
        ax.add_collection(ec)
        ax.add_patch(Rectangle((env["Z0"] * mm, env["R0"] * mm), LENGTH * mm, BUILD * mm, fill=False, lw=1))
        ax.axhline(0, color="k", ls="-.", lw=0.8)
        ax.set_xlim(-LENGTH * mm, LENGTH * mm)
        ax.set_ylim(-2, r_out * mm + 3)
        ax.set_aspect("equal")
        ax.set_xlabel("Axial position z (mm)")
        ax.set_ylabel("Radius (mm)")
        ax.set_title("Cross-section (to scale, axis at the bottom)")
        pdf.savefig(fig)
        plt.close(fig)

        # bore profile
        fig, ax = plt.subplots(figsize=(8, 5))
        ax.plot(z_bore * mm, bz_bore * 1e3)
        for ze in (-LENGTH / 2, LENGTH / 2):
            ax.axvline(ze * mm, ls=":", color="k")
        ax.set_xlabel("Axial position z (mm)")
        ax.set_ylabel("Axial flux density Bz (mT)")
        ax.grid(alpha=0.3)
        pdf.savefig(fig)
        plt.close(fig)

        # far axis profile with dipole
        fig, ax = plt.subplots(figsize=(8, 5))
        ax.semilogy(z_prof * mm, bprof, label="exact")
        ax.semilogy(z_prof * mm, bdip, "--", label="point dipole")
        ax.set_xlabel("Axial position z (mm)")
        ax.set_ylabel("|B| (T)")
        ax.legend()
        ax.grid(alpha=0.3, which="both")
        pdf.savefig(fig)
        plt.close(fig)

        # |B| map
        fig, ax = plt.subplots(figsize=(8, 7))
        Bm = np.ma.masked_invalid(Bmap)
        norm = LogNorm(vmin=np.nanmin(Bmap), vmax=np.nanmax(Bmap))
        pc = ax.pcolormesh(zs * mm, xs * mm, Bm, norm=norm, cmap="viridis", shading="nearest", rasterized=True)
        lo, hi = np.floor(np.log10(np.nanmin(Bmap))), np.ceil(np.log10(np.nanmax(Bmap)))
        levels = np.array([s * 10.0 ** e for e in np.arange(lo, hi + 1) for s in (1, 2, 5)])
        levels = levels[(levels > np.nanmin(Bmap)) & (levels < np.nanmax(Bmap))]
        cs = ax.contour(zs * mm, xs * mm, Bm, levels=levels, colors="w", linewidths=0.6)
        ax.clabel(cs, fmt=lambda v: f"{v*1e3:g} mT", fontsize=6)
        for sgn in (1, -1):
            y0 = env["R0"] * mm if sgn > 0 else -env["R1"] * mm
            ax.add_patch(Rectangle((env["Z0"] * mm, y0), LENGTH * mm, BUILD * mm, fc="0.6", ec="k"))
        ax.set_aspect("equal")
        ax.set_xlabel("Axial position z (mm)")
        ax.set_ylabel("Radial position rho (mm)")
        cb = fig.colorbar(pc, ax=ax)
        cb.set_label("|B| (T)")
        pdf.savefig(fig)
        plt.close(fig)

        # warm-up
        fig, ax = plt.subplots(figsize=(8, 5))
        ax.plot(tw / 60, hot_w - C2K, label="hottest point")
        ax.plot(tw / 60, yw[0] - C2K, label="mean")
        ax.axhline(T_CLASS - C2K, ls="--", color="r", label="insulation class 130 C")
        ax.axhline(T_hot - C2K, ls=":", color="k")
        ax.set_xlabel("Time (min)")
        ax.set_ylabel("Temperature (C)")
        ax.legend()
        ax.grid(alpha=0.3)
        pdf.savefig(fig)
        plt.close(fig)

TOTAL = time.perf_counter() - T_START

# ================================================================ report
res = dict(resistance_20C_ohm=R20, resistance_hot_ohm=R_hot, inductance_H=L,
           field_center_T=B0, moment_A_m2=moment, wire_length_m=wire_len,
           conductor_mass_kg=mass, winding_temperature_C=T_hot - C2K,
           surface_temperature_C=Ts - C2K, mean_temperature_C=T_mean - C2K,
           heat_capacity_J_K=C_heat, time_constant_s=tau_el, energy_J=energy,
           time_to_limit_s=t_limit, dipole_distance_axis_1pct_m=dip[0.01][0],
           dipole_distance_axis_0p1pct_m=dip[0.001][0], dipole_distance_plane_1pct_m=dip[0.01][1],
           dipole_distance_plane_0p1pct_m=dip[0.001][1], dipole_distance_any_1pct_m=dip[0.01][2],
           dipole_distance_any_0p1pct_m=dip[0.001][2], turns_per_layer=tpl, layers=n_layers)
extra_res = dict(sheet_centre_T=sheet, moment_far_A_m2=m_far, B780_T=B780, B780_dipole_T=B780_dip,
                 offaxis_exact_T=B_off_ex, offaxis_quad_T=B_off_num,
                 offaxis_rel=abs(B_off_ex / B_off_num - 1), centre_sample_exact_T=ex_c,
                 centre_sample_quad_T=num_c, centre_sample_rel=abs(ex_c / num_c - 1),
                 rise_fv_K=rise_fv, rise_lumped_K=T_hot - T_AMB, L_wheeler_H=L_wheeler,
                 flat_m=flat, end_ratio=end_ratio, reach_axis_0p5mT_m=reach_axis,
                 reach_plane_0p5mT_m=reach_plane, map_nodes_computed=n_nodes,
                 map_shape=[nz, nx], map_centre_T=Bc_map, map_edge_max_T=edge,
                 map_extent_m=[z_half, x_half], tau_th_s=tau_th)
for kk, v in res.items():
    print(f"{kk:34s} {v:.10g}")
for kk, v in extra_res.items():
    print(f"{kk:34s} {v}")
print("stage times (s): " + "  ".join(f"{kk} {v:.3f}" for kk, v in TIMES.items()) + f"  total(in-script) {TOTAL:.3f}")
json.dump(dict(results=res, extra=extra_res, times=TIMES, total=TOTAL), open(os.path.join(tempfile.gettempdir(), "bench_thick_out.json"), "w"), indent=1)
