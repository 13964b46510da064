#!/usr/bin/python3
"""Independent integration of the merged-diffuser model with scipy's solve_ivp (DOP853, rtol 1e-11).

Stage 1, round jets: the top-hat equations of buoyant_jet_scipy.py (imported from there), stopped where the plume
width reaches the port spacing, 2 b = s (the merging criterion of Wright, Wong, Zimmerman & Wallace 1982, from memory).
Stage 2, line plume with the fluxes per unit length q = Q/s, M/s, (Q drho)/s, followed as in still water:
  dX/ds = e, dq/ds = E = 2 alpha u, d(q u)/ds = (q g'/u) z_hat, d(q (rho - rho_ref))/ds = E (rho_a - rho_ref)
  b = q/(2u), Ri = g' b e_z / u^2, alpha = a_j + (a_p - a_j) clamp(Ri / a_p, 0, 1)
  Gaussian plane coefficients a_j = 0.052 (Fischer et al. 1979, Table 9.1), a_p = 0.11 (Richardson & Hunt 2022), times sqrt(2)
  for top-hat (from memory). Dilution refers to Q0/s, so its flux average is continuous at merging; after merging the
  centreline/average ratio is that of plane Gaussian profiles, lambda/sqrt(1+lambda^2) with lambda = 1.24 (plane plume,
  Fischer et al. 1979, Table 9.1; from memory).
Written from these equations, not from the TypeScript code. Run: /usr/bin/python3 diffuser_plume_scipy.py > diffuser-plume-scipy.json
"""
import json
import numpy as np
from scipy.integrate import solve_ivp
from buoyant_jet_scipy import make, CF, G

AJ2, AP2 = np.sqrt(2) * 0.052, np.sqrt(2) * 0.11
CF_PLANE = 1.24 / np.sqrt(1 + 1.24 ** 2)


def ev(fun, terminal, direction):
    fun.terminal, fun.direction = terminal, direction
    return fun


def run(case):
    f, y0, local, Q0, H = make(case)
    s_ = case['spacing']
    rref = None
    if 'table' in case:
        dep, rho_t = np.array(case['table']['depth']), np.array(case['table']['density'])
        rho_a = lambda d: float(np.interp(d, dep, rho_t))
    else:
        rho_a = lambda d: case['ambientDensity']
    rref = rho_a(H)
    out = {}

    def round_point(y):
        u, b, d, drho, gp, ua, E, m = local(y)
        return {'z': y[2], 'horizontalDistance': float(np.hypot(y[0], y[1])), 'radius': b,
                'dilutionCentreline': max(1.0, y[3] / Q0 * CF), 'dilutionAverage': y[3] / Q0}

    merge = ev(lambda s, y: 2 * local(y)[1] - s_, True, 1)
    neutral1 = ev(lambda s, y: local(y)[3], False, 0)
    surface1 = ev(lambda s, y: y[2] - H, True, 1)
    sol = solve_ivp(f, [0, case['maxPath']], y0, method='DOP853', rtol=1e-11, atol=1e-14, events=[merge, neutral1, surface1])
    for name, te, ye in zip(['plumes merge', 'neutral buoyancy', 'surface contact'], sol.t_events, sol.y_events):
        if len(te):
            out[name] = {'s': float(te[0]), **{k: float(v) for k, v in round_point(ye[0]).items()}}
    if 'plumes merge' not in out:
        return out
    s_m, ym = float(sol.t_events[0][0]), sol.y_events[0][0]

    def plane_local(y):
        x, yy, z, q, mx, my, mz, r = y
        m = np.sqrt(mx * mx + my * my + mz * mz)
        u = m / q
        ez = mz / m
        b = q / (2 * u)
        d = H - z
        drho = rref + r / q - rho_a(d)
        gp = -G * drho / rref
        ri = gp * b * ez / (u * u)
        al = AJ2 + (AP2 - AJ2) * min(1.0, max(0.0, ri / AP2))
        return u, b, d, drho, gp, 2 * al * u, m

    def g(s, y):
        x, yy, z, q, mx, my, mz, r = y
        u, b, d, drho, gp, E, m = plane_local(y)
        return [mx / m, my / m, mz / m, E, 0.0, 0.0, q * gp / u, E * (rho_a(d) - rref)]

    q0 = Q0 / s_
    y1 = [ym[0], ym[1], ym[2], ym[3] / s_, ym[4] / s_, ym[5] / s_, ym[6] / s_, ym[7] / s_]

    def plane_point(y):
        u, b, d, drho, gp, E, m = plane_local(y)
        return {'z': y[2], 'horizontalDistance': float(np.hypot(y[0], y[1])), 'radius': b,
                'dilutionCentreline': max(1.0, y[3] / q0 * CF_PLANE), 'dilutionAverage': y[3] / q0}

    surface = ev(lambda s, y: y[2] - H, True, 1)
    top = ev(lambda s, y: y[6], True, -1)
    neutral = ev(lambda s, y: plane_local(y)[3], False, 0)
    sol2 = solve_ivp(g, [s_m, case['maxPath']], y1, method='DOP853', rtol=1e-11, atol=1e-14, events=[surface, top, neutral])
    for name, te, ye in zip(['surface contact', 'maximum rise', 'neutral buoyancy'], sol2.t_events, sol2.y_events):
        if len(te):
            out[name] = {'s': float(te[0]), **{k: float(v) for k, v in plane_point(ye[0]).items()}}
    return out


CASES = [
    {'name': 'vertical plumes merging low in linear stratification, weak co-flow', 'diameter': 0.1, 'velocity': 0.5, 'angle': 90, 'portDepth': 40,
     'effluentDensity': 1000.0, 'current': 0.02, 'spacing': 1.0, 'maxPath': 400, 'table': {'depth': [0, 40], 'density': [1022.0, 1026.0]}},
    {'name': 'horizontal jets with a co-flowing current, uniform water', 'diameter': 0.2, 'velocity': 1.0, 'angle': 0, 'portDepth': 20,
     'effluentDensity': 1000.0, 'ambientDensity': 1025.0, 'current': 0.15, 'spacing': 3.0, 'maxPath': 400},
    {'name': '45 deg thermal jets, two-layer stratification, sheared current', 'diameter': 0.3, 'velocity': 2.5, 'angle': 45,
     'portDepth': 30, 'effluentDensity': 1020.0, 'spacing': 4.0, 'maxPath': 600,
     'table': {'depth': [0, 8, 14, 30], 'density': [1023.0, 1023.3, 1025.2, 1025.6]},
     'currentTable': {'depths': [0, 30], 'speeds': [0.25, 0.05]}},
]

if __name__ == '__main__':
    res = [{'case': c, 'events': run(c)} for c in CASES]
    print(json.dumps({'generator': 'test/check-values/jets/generators/diffuser_plume_scipy.py',
                      'solver': 'scipy.integrate.solve_ivp DOP853 rtol=1e-11 atol=1e-14', 'results': res}, indent=1))
