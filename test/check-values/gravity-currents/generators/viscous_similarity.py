"""Independent reference for Huppert (1982) viscous similarity front coefficients eta_N.

Solves gamma*phi - beta*y*phi' = y^-j (y^j phi^3 phi')' with scipy's solve_ivp (LSODA)
inward from the front, and for alpha = 0 also evaluates the closed-form Barenblatt
solution with scipy.special.gamma. Run: /usr/bin/python3 viscous_similarity.py
"""
import json
import numpy as np
from scipy.integrate import solve_ivp, quad
from scipy.special import gamma as G


def eta_numeric(alpha, j):
    beta = (3 * alpha + 1) / 5 if j == 0 else (3 * alpha + 1) / 8
    gam = alpha - beta if j == 0 else alpha - 2 * beta
    eps = 1e-8
    y0, phi0 = 1 - eps, (3 * beta * eps) ** (1 / 3)

    def f(y, s):
        phi, w, _ = s
        dphi = w / (y ** j * phi ** 3)
        return [dphi, y ** j * (gam * phi - beta * y * dphi), -(2 * np.pi * y if j else 1.0) * phi]

    sol = solve_ivp(f, [y0, 1e-8], [phi0, y0 ** j * (-beta * y0 * phi0), 0.0], method='LSODA', rtol=1e-11, atol=1e-14)
    vol = sol.y[2, -1]
    return vol ** (-3 / 5) if j == 0 else vol ** (-3 / 8)


def eta_barenblatt(j):
    """alpha = 0: h_t = (D/4) Laplacian(h^4); Barenblatt profile (C - k xi^2)^(1/3)."""
    d, m = j + 1, 4
    a = 1 / (d * (m - 1) + 2)
    k = (m - 1) * a / (2 * m)
    if j == 0:
        integral = 0.5 * G(0.5) * G(4 / 3) / G(11 / 6)          # int_0^1 (1-s^2)^(1/3) ds
        vol_coef = k ** (1 / 3) * integral                       # A = vol_coef * xi_N^(5/3)
        xi = (1 / vol_coef) ** (3 / 5)
    else:
        vol_coef = 2 * np.pi * k ** (1 / 3) * 3 / 8              # V = vol_coef * xi_N^(8/3)
        xi = (1 / vol_coef) ** (3 / 8)
    return xi * 4 ** (-a)   # time rescaled by D/4 with D = g'/(3 nu)


out = {
    'planar_alpha0': eta_numeric(0, 0), 'axisymmetric_alpha0': eta_numeric(0, 1),
    'planar_alpha1': eta_numeric(1, 0), 'axisymmetric_alpha1': eta_numeric(1, 1),
    'planar_alpha0_closed_form': eta_barenblatt(0), 'axisymmetric_alpha0_closed_form': eta_barenblatt(1),
}
print(json.dumps(out, indent=2))
