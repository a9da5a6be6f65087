"""Independent check values for the thickness solver (ThicknessTunerTest): a free orthotropic
Kirchhoff rectangle whose thickness is Shepard's inverse-distance interpolation (power 2) of control
points, by Rayleigh-Ritz with products of Legendre polynomials (numpy.polynomial.legendre), a 48 x 48
Gauss-Legendre product rule for the area integrals (numpy.polynomial.legendre.leggauss) and the
generalised symmetric eigenproblem (scipy.linalg.eigh). Shares no code with the Java solver.
Usage: python3 graduated_plate_ritz.py
"""
import numpy as np
from numpy.polynomial import legendre as L
from scipy.linalg import eigh

N = 12
Q = 48


def shepard(x, y, pts):
    num = np.zeros_like(x); den = np.zeros_like(x)
    for (px, py, h) in pts:
        d2 = (x - px)**2 + (y - py)**2
        d2 = np.maximum(d2, 1e-30)
        num += h / d2; den += 1 / d2
    return num / den


def modes(a, b, rho, ex, ey, g, nuxy, pts, count=6):
    nuyx = nuxy * ey / ex
    den = 12 * (1 - nuxy * nuyx)
    xg, wg = L.leggauss(Q)
    P = np.zeros((N, Q)); dP = np.zeros((N, Q)); ddP = np.zeros((N, Q))
    for i in range(N):
        c = np.zeros(N); c[i] = 1
        P[i] = L.legval(xg, c); dP[i] = L.legval(xg, L.legder(c)); ddP[i] = L.legval(xg, L.legder(c, 2))
    sx = 2 / a; sy = 2 / b; jac = a * b / 4
    X = (xg + 1) * a / 2; Y = (xg + 1) * b / 2
    XX, YY = np.meshgrid(X, Y, indexing="ij")
    H = shepard(XX, YY, pts)
    W = np.outer(wg, wg) * jac
    # basis index (i, j) -> i*N + j ; values on the grid
    phi = np.einsum("iq,jr->ijqr", P, P).reshape(N * N, Q, Q)
    wxx = np.einsum("iq,jr->ijqr", ddP, P).reshape(N * N, Q, Q) * sx**2
    wyy = np.einsum("iq,jr->ijqr", P, ddP).reshape(N * N, Q, Q) * sy**2
    wxy = np.einsum("iq,jr->ijqr", dP, dP).reshape(N * N, Q, Q) * sx * sy
    h3 = H**3 / den
    D11 = ex * h3; D22 = ey * h3; D12 = nuxy * ey * h3; D66 = g * H**3 / 12
    def form(A, B, C):
        return np.einsum("aqr,qr,bqr->ab", A, B * W, C)
    K = (form(wxx, D11, wxx) + form(wyy, D22, wyy) + form(wxx, D12, wyy) + form(wyy, D12, wxx)
         + 4 * form(wxy, D66, wxy))
    M = form(phi, rho * H, phi)
    K = (K + K.T) / 2; M = (M + M.T) / 2
    vals = eigh(K, M, eigvals_only=True)
    return np.sqrt(np.clip(vals, 0, None))[3:3 + count] / (2 * np.pi)


if __name__ == "__main__":
    a, b = 0.300, 0.200
    mat = (430.0, 12.0e9, 0.90e9, 0.70e9, 0.37)
    base = [(0.150, 0.100, 0.0030), (0.150, 0.030, 0.0030), (0.040, 0.100, 0.0027), (0.260, 0.100, 0.0027)]
    solved = [(0.150, 0.100, 0.0034), (0.150, 0.030, 0.0025), (0.040, 0.100, 0.0027), (0.260, 0.100, 0.0027)]
    for name, pts in (("start", base), ("answer", solved)):
        print(name, np.array2string(modes(a, b, *mat, pts), precision=6))
    for n in (10, 14):
        N = n
        print("N", n, np.array2string(modes(a, b, *mat, solved), precision=6))
