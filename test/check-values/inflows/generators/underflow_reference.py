"""Independent reference values for underflow-ellison-turner1959.json (run with /usr/bin/python3; needs scipy, gsw).

Normal-state underflow (Ellison & Turner 1959) with the Parker et al. (1987) entrainment law:
  Ri_n tan(theta) = C_D + E(Ri_n)  (brentq);  U^3 = g' q sin(theta) / (C_D + E);  dq/dx = E U b;  d(q rho)/dx = E U b rho_a.
1. Uniform ambient: g' q is conserved, so U is constant and q(x) = q0 + E U b x, t(x) = x / U (closed form).
2. Ambient 10 degC, practical salinity linear 30 -> 32 over 0..40 m (TEOS-10 densities from gsw): insertion depth by
   scipy solve_ivp (LSODA) with a terminal event where the current density equals the ambient.
"""
import json, math
import gsw
from scipy.optimize import brentq
from scipy.integrate import solve_ivp

G = 9.80665
E = lambda ri: 0.075 / math.sqrt(1 + 718 * ri ** 2.4)

def rho_amb(sp):
    sa = gsw.SA_from_SP(sp, 0, 0, 0)
    return float(gsw.rho(sa, gsw.CT_from_t(sa, 10, 0), 0))

def normal(slope, cd):
    ri = brentq(lambda r: r * slope - cd - E(r), 0, (cd + 0.1) / slope + 1, xtol=1e-14)
    return ri, E(ri)

out = {}
# 1. uniform ambient S = 30, current 0.5 kg/m3 denser
slope, cd, b, q0 = 0.02, 0.005, 50.0, 10.0
ri, e = normal(slope, cd)
sin = slope / math.sqrt(1 + slope ** 2)
ra = rho_amb(30.0)
gp = G * 0.5 / ra
U = (gp * (q0 / b) * sin / (cd + e)) ** (1 / 3)
# U stays constant: d(q g')/dx = 0 and g' q / b is the buoyancy flux per width
x = 1000.0
out['uniform'] = {'Ri_n': ri, 'E': e, 'U': U, 'q_at_1000m': q0 + e * U * b * x, 'time_at_1000m': x / U}

# 2. linear salinity 30 -> 32 over 40 m; start at 2 m with density of ambient at 20 m; slope 0.01; C_D 0.005
slope, cd, b, q0, d0 = 0.01, 0.005, 40.0, 5.0, 2.0
ri, e = normal(slope, cd)
sin = slope / math.sqrt(1 + slope ** 2)
sal = lambda d: 30 + 2 * min(max(d, 0), 40) / 40
rho0 = rho_amb(sal(20.0))
def rhs(x, y):
    q, r = y
    d = d0 + x * sin
    a = rho_amb(sal(d))
    g = G * (r - a) / a
    u = (g * (q / b) * sin / (cd + e)) ** (1 / 3) if g > 0 else 0.0
    w = e * u * b
    return [w, w * (a - r) / q]
ev = lambda x, y: y[1] - rho_amb(sal(d0 + x * sin))
ev.terminal = True; ev.direction = -1
sol = solve_ivp(rhs, [0, (40 - d0) / sin], [q0, rho0], method='LSODA', events=ev, rtol=1e-9, atol=1e-11)
xi = sol.t_events[0][0]
out['linear_salt'] = {'start_density': rho0, 'insertion_depth': d0 + xi * sin, 'insertion_distance': xi, 'q_at_insertion': sol.y_events[0][0][0]}
print(json.dumps(out, indent=1))
