"""Independent check values for the plate measurement (ElasticFitTest): the free orthotropic
Kirchhoff rectangle by Rayleigh-Ritz with products of Legendre polynomials (numpy.polynomial.legendre),
Gauss-Legendre integrals (numpy.polynomial.legendre.leggauss) and the generalised symmetric
eigenproblem (scipy.linalg.eigh). Written apart from the Java solver; it shares no code with it.

Prints, for each plate, the twisting (1,1), long-grain (2,0) and cross-grain (0,2) frequencies, picked as
the eigenvectors with the largest mass-weighted share on P1(xi)P1(eta), P2(xi)P0(eta) and P0(xi)P2(eta).
Usage: python3 free_plate_ritz.py
"""
import numpy as np
from numpy.polynomial import legendre as L
from scipy.linalg import eigh

N = 18  # Legendre polynomials per direction (degree 0..17)


def one_d(n, q):
    x, w = L.leggauss(q)
    P = np.zeros((n, q)); dP = np.zeros((n, q)); ddP = np.zeros((n, q))
    for i in range(n):
        c = np.zeros(n); c[i] = 1
        P[i] = L.legval(x, c)
        dP[i] = L.legval(x, L.legder(c, 1))
        ddP[i] = L.legval(x, L.legder(c, 2))
    E0 = (P * w) @ P.T
    E11 = (ddP * w) @ ddP.T
    E20 = (ddP * w) @ P.T   # int P_i'' P_k
    E1 = (dP * w) @ dP.T
    return E0, E11, E20, E1


def modes(a, b, h, rho, ex, ey, g, nuxy, count=8):
    nuyx = nuxy * ey / ex
    den = 12 * (1 - nuxy * nuyx)
    D11 = ex * h**3 / den; D22 = ey * h**3 / den; D12 = nuxy * D22; D66 = g * h**3 / 12
    E0, E11, E20, E1 = one_d(N, N + 6)
    sx = 2 / a; sy = 2 / b; jac = a * b / 4
    K = (D11 * sx**4 * np.kron(E11, E0) + D22 * sy**4 * np.kron(E0, E11)
         + D12 * sx**2 * sy**2 * (np.kron(E20, E20.T) + np.kron(E20.T, E20))
         + 4 * D66 * sx**2 * sy**2 * np.kron(E1, E1)) * jac
    M = rho * h * jac * np.kron(E0, E0)
    K = (K + K.T) / 2
    vals, vecs = eigh(K, M)
    f = np.sqrt(np.clip(vals, 0, None)) / (2 * np.pi)
    out = {}
    for name, (i, j) in {"twisting": (1, 1), "along": (2, 0), "across": (0, 2)}.items():
        idx = i * N + j
        best, bk = -1, -1
        for k in range(3, 3 + count):
            v = vecs[:, k]
            share = v[idx]**2 * M[idx, idx] / (v @ M @ v)
            if share > best:
                best, bk = share, k
        out[name] = (f[bk], best)
    return out, f[3:3 + count]


if __name__ == "__main__":
    plates = [
        # a, b, h (m), rho, E along, E across, G (Pa), nu_xy
        (0.300, 0.120, 0.0030, 430.0, 12.0e9, 0.90e9, 0.70e9, 0.37),
        (0.250, 0.200, 0.0025, 380.0, 9.5e9, 0.75e9, 0.62e9, 0.30),
        (0.200, 0.150, 0.0020, 2700.0, 69e9, 69e9, 69e9 / 2.66, 0.33),
    ]
    for p in plates:
        out, lowest = modes(*p)
        print(p)
        for k, (fr, share) in out.items():
            print(f"  {k:9s} {fr:.6f} Hz  share {share:.3f}")
        print("  lowest", np.array2string(lowest, precision=4))
