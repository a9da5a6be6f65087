"""Independent check values for the bar bench tests (not used by the application).

Shooting method on the beam equations written as first-order systems, integrated with
scipy.integrate.solve_ivp (DOP853, rtol 1e-12) segment by segment across the profile's breakpoints;
frequencies where the 2x2 end-condition determinant vanishes are found with scipy.optimize.brentq.
Nodes are zeros of w on the dense output, also by brentq.

State y = [w, psi, M, V], with M = EI psi' and V = kGA (w' - psi) (Timoshenko 1921):
  w'   = psi + V / (kGA)        (Euler-Bernoulli: w' = psi)
  psi' = M / EI
  M'   = -V - rho I omega^2 psi (Euler-Bernoulli: no rotary inertia)
  V'   = -rho A omega^2 w
Free end: M = V = 0; pinned: w = M = 0; clamped: w = psi = 0.

Run: python3 src/test/python/bar_reference.py
"""
import numpy as np
from scipy.integrate import solve_ivp
from scipy.optimize import brentq

FREE = ("M", "V")
PINNED = ("w", "M")
CLAMPED = ("w", "psi")
IDX = {"w": 0, "psi": 1, "M": 2, "V": 3}


class Beam:
    def __init__(self, length, width, points, rho, e, g, kappa, timoshenko):
        self.L = length
        self.b = width
        self.px = np.array([p[0] for p in points])
        self.pt = np.array([p[1] for p in points])
        self.rho, self.e, self.g, self.k = rho, e, g, kappa
        self.timo = timoshenko

    def t(self, x):
        return np.interp(x, self.px, self.pt)

    def rhs(self, x, y, om2):
        t = self.t(x)
        a = self.b * t
        i = self.b * t ** 3 / 12
        w, psi, m, v = y
        dw = psi + (v / (self.k * self.g * a) if self.timo else 0.0)
        dpsi = m / (self.e * i)
        dm = -v - (self.rho * i * om2 * psi if self.timo else 0.0)
        dv = -self.rho * a * om2 * w
        return [dw, dpsi, dm, dv]

    def shoot(self, om2, y0, dense=False):
        y = np.array(y0, dtype=float)
        sols = []
        for a, b in zip(self.px[:-1], self.px[1:]):
            s = solve_ivp(self.rhs, (a, b), y, args=(om2,), method="DOP853", rtol=1e-12, atol=1e-14 * max(1, abs(y).max()),
                          dense_output=dense)
            y = s.y[:, -1]
            sols.append(s)
        return y, sols


def starts(end):
    free = [k for k in IDX if k not in end]
    out = []
    for k in free:
        y = [0.0, 0.0, 0.0, 0.0]
        y[IDX[k]] = 1.0
        out.append(y)
    return out


def det(beam, om2, start, finish):
    ys = [beam.shoot(om2, y0)[0] for y0 in starts(start)]
    a = np.array([[ys[j][IDX[c]] for j in range(2)] for c in finish])
    # scale rows so the determinant is well conditioned in sign
    return np.linalg.det(a / np.abs(a).max(axis=1, keepdims=True).clip(1e-300))


def frequencies(beam, start, finish, count, fmax):
    fs = []
    grid = np.linspace(1.0, fmax, 4000)
    prev = det(beam, (2 * np.pi * grid[0]) ** 2, start, finish)
    for f0, f1 in zip(grid[:-1], grid[1:]):
        cur = det(beam, (2 * np.pi * f1) ** 2, start, finish)
        if np.sign(cur) != np.sign(prev):
            r = brentq(lambda f: det(beam, (2 * np.pi * f) ** 2, start, finish), f0, f1, xtol=1e-12, rtol=1e-14)
            fs.append(r)
            if len(fs) == count:
                break
        prev = cur
    return fs


def nodes(beam, f, start, finish):
    om2 = (2 * np.pi * f) ** 2
    st = starts(start)
    ys = [beam.shoot(om2, y0)[0] for y0 in st]
    a = np.array([[ys[j][IDX[c]] for j in range(2)] for c in finish])
    u, s, vt = np.linalg.svd(a)
    c = vt[-1]
    y0 = c[0] * np.array(st[0]) + c[1] * np.array(st[1])
    _, sols = beam.shoot(om2, y0, dense=True)
    xs, ws = [], []
    for s in sols:
        x = np.linspace(s.t[0], s.t[-1], 400)
        xs.append(x)
        ws.append(s.sol(x)[0])
    out = []
    for s in sols:
        x = np.linspace(s.t[0], s.t[-1], 400)
        w = s.sol(x)[0]
        for i in range(len(x) - 1):
            if w[i] * w[i + 1] < 0:
                out.append(brentq(lambda z: s.sol(z)[0], x[i], x[i + 1], xtol=1e-13))
    return out


def report(name, beam, start, finish, count, fmax):
    fs = frequencies(beam, start, finish, count, fmax)
    print(name)
    for n, f in enumerate(fs, 1):
        ns = nodes(beam, f, start, finish)
        print(f"  mode {n}: {f:.6f} Hz  nodes mm {[round(v * 1000, 4) for v in ns]}")


if __name__ == "__main__":
    # rosewood-like marimba bar of the tests: 380 x 60 x 22 mm, rho 1000, E 20 GPa, G 1.5 GPa, kappa 5/6
    L, b = 0.38, 0.060
    uniform = [(0.0, 0.022), (L, 0.022)]
    undercut = [(0.0, 0.022), (0.08, 0.022), (0.12, 0.018), (0.16, 0.011), (0.19, 0.009),
                (0.22, 0.011), (0.26, 0.018), (0.30, 0.022), (L, 0.022)]
    for timo in (False, True):
        tag = "timoshenko" if timo else "euler-bernoulli"
        report(f"uniform free-free {tag}", Beam(L, b, uniform, 1000, 20e9, 1.5e9, 5 / 6, timo), FREE, FREE, 4, 16000)
        report(f"undercut free-free {tag}", Beam(L, b, undercut, 1000, 20e9, 1.5e9, 5 / 6, timo), FREE, FREE, 4, 12000)
    # steel tine of the tests: clamped-free 60 x 3 x 1.0 mm, rho 7850, E 200 GPa, G 80 GPa, kappa Cowper(nu = 0.25)
    kappa = 10 * 1.25 / (12 + 11 * 0.25)
    tine = [(0.0, 0.001), (0.060, 0.001)]
    report("steel tine clamped-free timoshenko", Beam(0.060, 0.003, tine, 7850, 200e9, 80e9, kappa, True),
           CLAMPED, FREE, 3, 40000)
