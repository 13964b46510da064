#!/usr/bin/env python3
"""Independent reference for the largest upper-layer discharge over a weir before lower-layer water reaches the crest.
python3 with scipy (Debian python3-scipy or scipy 1.17 here); no gprime code.

Elevations above the bed: upstream water surface S0, crest c = S0 - h, upstream interface z_i = S0 - Y. Densities rho1 (upper) and
rho2 = rho1 (1 + g'/g), so g' = g (rho2 - rho1)/rho1. Unknowns at the crest section: surface S and discharge q, solved with
scipy.optimize.fsolve from
  Bernoulli along the surface of the upper layer   S + u^2/(2 g) = S0,  u = q/(S - c)
  stagnant lower layer, bed pressure unchanged     rho1 g (S - c) + rho2 g c = rho1 g (S0 - z_i) + rho2 g z_i   (interface at the crest)
Run: python3 weir_withdrawal.py  (writes ../weir-skimming-withdrawal.json)
"""
import json, math, os
from scipy.optimize import fsolve

OUT = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), 'weir-skimming-withdrawal.json')
G, RHO1, S0 = 9.80665, 1000.0, 20.0  # standard gravity


def solve(gp, h, Y):
    rho2 = RHO1 * (1 + gp / G)
    c, zi = S0 - h, S0 - Y

    def eqs(v):
        S, q = v
        u = q / (S - c)
        return [(S + u * u / (2 * G) - S0) / h,
                (RHO1 * G * (S - c) + rho2 * G * c - RHO1 * G * (S0 - zi) - rho2 * G * zi) / (RHO1 * G * h)]
    v, info, ier, msg = fsolve(eqs, [S0, h * math.sqrt(2 * gp * (Y - h))], xtol=1e-13, full_output=True)
    assert max(abs(r) for r in info['fvec']) < 1e-13, msg
    S, q = v
    assert q / (S - c) <= math.sqrt(G * (S - c)) + 1e-12  # not beyond free-surface critical flow over the crest
    return q


cases = [{'inputs': {'g_prime': gp, 'crest_depth': h, 'interface_depth': Y}, 'expected': solve(gp, h, Y)}
         for gp, h, Y in [(0.02, 1.0, 3.0), (0.05, 0.5, 0.8), (0.01, 2.0, 12.0), (0.002, 0.3, 6.0)]]
checks = [
    {'source': 'Independent reference: scipy.optimize.fsolve of the surface Bernoulli equation and the hydrostatics of the stagnant lower layer with densities (Craya 1949 energy argument, inverted curtain-wall case), generators/weir_withdrawal.py',
     'tolerance': {'rel': 1e-9}, 'cases': cases},
    {'source': 'Turner (1973) Buoyancy Effects in Fluids §3.2: critical flow of the skimmed layer, q = √(g′h³) at h = 2Y/3 (Boussinesq limit; the surface drawdown (g′/g)(Y − h)/h = 5e-6 here sets the tolerance)',
     'tolerance': {'rel': 1e-5}, 'cases': [{'inputs': {'g_prime': 1e-4, 'crest_depth': 2.0, 'interface_depth': 3.0}, 'expected': math.sqrt(1e-4 * 8)}]},
    {'source': 'Critical free-surface flow over a broad crest, q = (2/3)^{3/2}√(g h³) (e.g. Henderson 1966, Open Channel Flow, broad-crested weir; from memory): the limit when the interface is too deep to be lifted to the crest',
     'tolerance': {'rel': 1e-12}, 'cases': [{'inputs': {'g_prime': 0.01, 'crest_depth': 0.1, 'interface_depth': 40.0}, 'expected': (2 / 3) ** 1.5 * math.sqrt(G * 0.1 ** 3)}]},
]
with open(OUT, 'w') as fh:
    json.dump({'method': 'weir-skimming-withdrawal', 'checks': checks}, fh, indent=1, ensure_ascii=False)
    fh.write('\n')
print('ok')
