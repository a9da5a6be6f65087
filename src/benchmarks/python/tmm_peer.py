"""An independent numpy transfer-matrix sweep, the measuring peer for the HTTP speed check.

Input impedance of a bore of conical frusta (a cylinder where the diameters are equal), closed at
the input, open at the output, over a frequency grid, vectorised over frequency with numpy.
Written from the textbook physics, not from Nodewright's Java:

- spherical waves in a cone: q = x p obeys q'' + k^2 q = 0 along the distance x from the apex and
  U = -(Omega / (j w rho)) (x q' - q) (Fletcher & Rossing, The Physics of Musical Instruments, §8.7);
  each frustum carries (p, U) from its output end to its input end through that plane wave in q;
- wall losses to first order in 1/r_v (Keefe, J. Acoust. Soc. Am. 75, 58, 1984, the large-radius
  limit of Zwikker-Kosten): Gamma = j k (1 + (1 - j) / (sqrt(2) r_v) (1 + (gamma - 1) / sqrt(Pr))),
  at each element's mean radius;
- radiation of an unflanged pipe at low ka: Z_r = Z_c ((ka)^2 / 4 + j 0.6133 ka) (Levine &
  Schwinger, Phys. Rev. 73, 383, 1948);
- air from the ideal gas at 20 °C (c = 343.2 m/s, rho = 1.204 kg/m3, mu = 1.813e-5 Pa s, Pr = 0.71,
  gamma = 1.4; handbook values from memory).

Usage: python3 tmm_peer.py  (prints the time per sweep of the 200-frustum curved bore and its
lowest impedance peaks). Imported by http_check.py.
"""
import math
import time

import numpy as np

C = 343.2
RHO = 1.204
MU = 1.813e-5
PR = 0.71
GAMMA = 1.4


def curved_bore(n=200, length_m=0.600):
    """The speed case: 200 frusta whose radii follow r = 6 mm + 18 mm u^2, each with its own taper."""
    segs = []
    for i in range(n):
        ua, ub = i / n, (i + 1) / n
        segs.append((length_m / n, 0.006 + 0.018 * ua * ua, 0.006 + 0.018 * ub * ub))
    return segs


def input_impedance(segs, f, losses=True):
    """Z_in / (rho c / S_input) on the frequency grid f (Hz) for (length m, r_in m, r_out m) segments."""
    w = 2 * np.pi * f
    k0 = w / C
    r_end = segs[-1][2]
    s_end = math.pi * r_end * r_end
    zc_end = RHO * C / s_end
    ka = k0 * r_end
    p = zc_end * (0.25 * ka * ka + 0.6133j * ka)   # Z_r with U = 1 at the open end
    u = np.ones_like(p)
    for length, r1, r2 in reversed(segs):
        rm = 0.5 * (r1 + r2)
        sm = math.pi * rm * rm
        if losses:
            rv = rm * np.sqrt(RHO * w / MU)
            gam = 1j * k0 * (1 + (1 - 1j) / (math.sqrt(2) * rv) * (1 + (GAMMA - 1) / math.sqrt(PR)))
            zc = (RHO * C / sm) * (1 + (1 - 1j) / (math.sqrt(2) * rv) * (1 - (GAMMA - 1) / math.sqrt(PR)))
        else:
            gam = 1j * k0
            zc = np.full_like(k0, RHO * C / sm, dtype=complex)
        if abs(r2 - r1) < 1e-12 * rm:
            ch, sh = np.cosh(gam * length), np.sinh(gam * length)
            p, u = ch * p + zc * sh * u, sh / zc * p + ch * u
            continue
        k = -1j * gam
        jwrho = gam * zc * sm                      # series impedance per length times area
        x1 = r1 * length / (r2 - r1)               # signed distance of the input end from the apex
        x2 = x1 + length
        omega = math.pi * r1 * r1 / (x1 * x1)      # solid angle: S = Omega x^2
        q2 = x2 * p
        dq2 = (q2 - jwrho * u / omega) / x2
        c, s = np.cos(k * length), np.sin(k * length)
        q1 = q2 * c - dq2 * s / k
        dq1 = q2 * k * s + dq2 * c
        p, u = q1 / x1, -(omega / jwrho) * (x1 * dq1 - q1)
    s_in = math.pi * segs[0][1] ** 2
    return (p / u) / (RHO * C / s_in)


def peaks(f, z, count=4):
    mag = np.abs(z)
    idx = [i for i in range(1, len(f) - 1) if mag[i] > mag[i - 1] and mag[i] >= mag[i + 1]]
    return [float(f[i]) for i in idx[:count]]


def time_sweep(segs, points=4000, fmin=20.0, fmax=3000.0, repeats=20):
    f = np.linspace(fmin, fmax, points)
    input_impedance(segs, f)
    times = []
    for _ in range(repeats):
        t0 = time.perf_counter()
        input_impedance(segs, f)
        times.append(time.perf_counter() - t0)
    return float(np.median(times))


if __name__ == "__main__":
    segs = curved_bore()
    f = np.linspace(20, 3000, 4000)
    z = input_impedance(segs, f)
    print(f"median sweep {time_sweep(segs) * 1e3:.1f} ms; lowest peaks {peaks(f, z)} Hz")
    # Sanity check against the textbook closed-open cylinder: peaks near (2n-1) c / 4(L + 0.6133 a).
    cyl = [(0.6 / 10, 0.008, 0.008)] * 10
    zc = input_impedance(cyl, f, losses=False)
    print("cylinder peaks", peaks(f, zc), "expected", [(2 * n - 1) * C / (4 * (0.6 + 0.6133 * 0.008)) for n in (1, 2, 3, 4)])
