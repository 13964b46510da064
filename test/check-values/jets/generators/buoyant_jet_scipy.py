#!/usr/bin/python3
"""Independent integration of the top-hat buoyant-jet equations with scipy's solve_ivp (DOP853, rtol 1e-11).

Equations (Morton, Taylor & Turner 1956 entrainment hypothesis; variable entrainment after Priestley & Ball 1955;
Gaussian coefficients of Fischer et al. 1979 Table 9.1 times sqrt(2) for top-hat; crossflow entrainment
beta = 0.6 of Hoult, Fay & Forney 1969; centreline/average dilution lambda^2/(1+lambda^2), lambda = 1.19):
  dX/ds = e, dQ/ds = E, d(Q u)/ds = E u_a + pi b^2 g' z_hat, d(Q (rho - rho_ref))/ds = E (rho_a - rho_ref)
  E = 2 pi b [alpha |u - u_a e_x| + beta u_a sqrt(1 - e_x^2)], alpha = a_j + (a_p - a_j) clamp(Ri / Ri_p, 0, 1)
Written from these equations, not from the TypeScript code. Run: /usr/bin/python3 buoyant_jet_scipy.py > buoyant-jet-scipy.json
"""
import json
import numpy as np
from scipy.integrate import solve_ivp

G = 9.80665
AJ, AP, BETA, LAM = np.sqrt(2) * 0.0535, np.sqrt(2) * 0.0833, 0.6, 1.19
RIP = 8 * AP / 5
CF = LAM**2 / (1 + LAM**2)


def make(case):
    D, U, H = case['diameter'], case['velocity'], case['portDepth']
    phi, th = np.radians(case['angle']), np.radians(case.get('horizontalAngle', 0.0))
    if 'table' in case:
        dep, rho_t = np.array(case['table']['depth']), np.array(case['table']['density'])
        rho_a = lambda d: float(np.interp(d, dep, rho_t))
    else:
        rho_a = lambda d: case['ambientDensity']
    if 'currentTable' in case:
        cd, cs = np.array(case['currentTable']['depths']), np.array(case['currentTable']['speeds'])
        cur = lambda d: float(np.interp(d, cd, cs))
    else:
        cur = lambda d: case.get('current', 0.0)
    rref = rho_a(H)

    def local(y):
        x, yy, z, Q, Mx, My, Mz, R = y
        m = np.sqrt(Mx * Mx + My * My + Mz * Mz)
        u = m / Q
        ex, ez = Mx / m, Mz / m
        b = np.sqrt(Q / (np.pi * u))
        d = H - z
        drho = rref + R / Q - rho_a(d)
        gp = -G * drho / rref
        ua = cur(d)
        sh = u - ua * ex
        cr = ua * np.sqrt(max(0.0, 1 - ex * ex))
        ri = gp * b * ez / max(sh * sh, 1e-30)
        al = AJ + (AP - AJ) * min(1.0, max(0.0, ri / RIP))
        E = 2 * np.pi * b * (al * abs(sh) + BETA * cr)
        return u, b, d, drho, gp, ua, E, m

    def f(s, y):
        x, yy, z, Q, Mx, My, Mz, R = y
        u, b, d, drho, gp, ua, E, m = local(y)
        return [Mx / m, My / m, Mz / m, E, E * ua, 0.0, Q * gp / u, E * (rho_a(d) - rref)]

    Q0 = np.pi * D * D * U / 4
    M0 = Q0 * U
    y0 = [0, 0, 0, Q0, M0 * np.cos(phi) * np.cos(th), M0 * np.cos(phi) * np.sin(th), M0 * np.sin(phi), Q0 * (case['effluentDensity'] - rref)]
    return f, y0, local, Q0, H


def run(case):
    f, y0, local, Q0, H = make(case)
    def ev(fun, terminal, direction):
        fun.terminal, fun.direction = terminal, direction
        return fun
    surface = ev(lambda s, y: y[2] - H, True, 1)
    ret = ev(lambda s, y: y[2], True, -1)
    top = ev(lambda s, y: y[6], case.get('stopAtTop', False), -1)
    neutral = ev(lambda s, y: local(y)[3], False, 0)
    sol = solve_ivp(f, [0, case['maxPath']], y0, method='DOP853', rtol=1e-11, atol=1e-14, events=[surface, ret, top, neutral])
    out = {}
    def point(y):
        u, b, d, drho, gp, ua, E, m = local(y)
        return {'z': y[2], 'horizontalDistance': float(np.hypot(y[0], y[1])), 'x': y[0], 'y': y[1], 'radius': b,
                'dilutionCentreline': max(1.0, y[3] / Q0 * CF), 'dilutionAverage': y[3] / Q0}
    for name, te, ye in zip(['surface contact', 'return to port level', 'maximum rise', 'neutral buoyancy'], sol.t_events, sol.y_events):
        if len(te):
            out[name] = {'s': float(te[0]), **{k: float(v) for k, v in point(ye[0]).items()}}
    return out


CASES = [
    {'name': 'dense jet 60 deg, uniform, still', 'diameter': 0.1, 'velocity': 2.0, 'angle': 60, 'portDepth': 30,
     'effluentDensity': 1051.0, 'ambientDensity': 1025.0, 'maxPath': 60},
    {'name': 'buoyant horizontal jet across a current', 'diameter': 0.2, 'velocity': 1.0, 'angle': 0, 'horizontalAngle': 90,
     'portDepth': 20, 'effluentDensity': 1000.0, 'ambientDensity': 1025.0, 'current': 0.15, 'maxPath': 400},
    {'name': 'vertical plume trapped in linear stratification, weak co-flow', 'diameter': 0.1, 'velocity': 0.5, 'angle': 90,
     'portDepth': 40, 'effluentDensity': 1000.0, 'current': 0.02, 'stopAtTop': True, 'maxPath': 400,
     'table': {'depth': [0, 40], 'density': [1022.0, 1026.0]}},
    {'name': '30 deg thermal jet, sheared current, two-layer stratification', 'diameter': 0.3, 'velocity': 2.5, 'angle': 30,
     'horizontalAngle': 45, 'portDepth': 30, 'effluentDensity': 1020.0, 'stopAtTop': True, 'maxPath': 600,
     'table': {'depth': [0, 8, 14, 30], 'density': [1023.0, 1023.3, 1025.2, 1025.6]},
     'currentTable': {'depths': [0, 30], 'speeds': [0.25, 0.05]}},
]

if __name__ == '__main__':
    res = [{'case': c, 'events': run(c)} for c in CASES]
    print(json.dumps({'generator': 'test/check-values/jets/generators/buoyant_jet_scipy.py',
                      'solver': 'scipy.integrate.solve_ivp DOP853 rtol=1e-11 atol=1e-14', 'results': res}, indent=1))
