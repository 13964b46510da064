"""Independent reference values for the withdrawal check files (run with /usr/bin/python3; needs scipy, gsw).

1. Craya (1949) tangency criterion solved numerically (scipy.optimize.minimize_scalar) instead of in closed form.
2. Withdrawal limits and outflow salinity of a point sink in a linearly salt-stratified profile at 10 degC, with densities
   from TEOS-10 (gsw; our profile uses EOS-80: the difference in N is far below the tolerance), limits by brentq and the
   flow-weighted salinity by quad with the velocity shape 1 - (drho/drho_limit)^2.
Prints JSON fragments that were pasted into the check files.
"""
import json
import math
import gsw
from scipy.optimize import brentq, minimize_scalar
from scipy.integrate import quad

G = 9.80665

def craya(kind, angle):
    if kind == 'point':
        f = lambda y: -(y ** 4 * (1 - y))
        m = minimize_scalar(f, bounds=(0, 1), method='bounded', options={'xatol': 1e-12})
        return angle * math.sqrt(2 * -m.fun)
    f = lambda y: -(y ** 2 * (1 - y))
    m = minimize_scalar(f, bounds=(0, 1), method='bounded', options={'xatol': 1e-12})
    return angle * math.sqrt(2 * -m.fun)

out = {
    'point_wall': craya('point', 2 * math.pi), 'point_wall_foot': craya('point', math.pi),
    'line_wall': craya('line', math.pi), 'line_wall_foot': craya('line', math.pi / 2),
}

# linear salinity 30 -> 32 PSU over 0..40 m, 10 degC
def sal(d): return 30 + 2 * d / 40
def rho(d):
    sa = gsw.SA_from_SP(sal(d), 0, 0, 0)
    ct = gsw.CT_from_t(sa, 10, 0)
    return gsw.rho(sa, ct, 0)

def limit(port, q, sign, amax):
    rp = rho(port)
    def f(a):
        n2 = G * sign * (rho(port + sign * a) - rp) / (rp * a)
        return a - (q / math.sqrt(n2)) ** (1 / 3)
    if f(amax) < 0: return amax
    return brentq(f, 1e-6, amax, xtol=1e-10)

cases = []
for port, q in [(20, 2.0), (20, 10.0), (12, 5.0)]:
    up = limit(port, q, -1, port); lo = limit(port, q, 1, 40 - port)
    rp = rho(port); dru = rp - rho(port - up); drl = rho(port + lo) - rp
    w = lambda d: 1 - ((abs(rho(d) - rp)) / (dru if d < port else drl)) ** 2
    num = quad(lambda d: w(d) * sal(d), port - up, port + lo, points=[port])[0]
    den = quad(w, port - up, port + lo, points=[port])[0]
    cases.append({'port': port, 'discharge': q, 'upper': up, 'lower': lo, 'salinity': num / den})
out['linear_salt'] = cases
print(json.dumps(out, indent=1))
