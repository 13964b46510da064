#!/usr/bin/env python3
"""Independent reference for maximal two-layer exchange through a contraction with net flow (Armi & Farmer 1986,
J. Fluid Mech. 164, 27-51). python3 with scipy (Debian python3-scipy or scipy 1.17 here); no gprime code.

Unknowns (g' = H = b_min = 1): upper-layer thickness at the narrows h1n, lower-layer flux q2, upper-layer thickness at the
virtual control h1v and its width bv; q1 = q0 + q2. Four conditions, solved together with scipy.optimize.fsolve:
  narrows critical        q1^2/h1n^3 + q2^2/(1-h1n)^3 = 1
  virtual control         |u1| = |u2|, i.e. q1/(bv h1v) = q2/(bv (1-h1v))
  virtual control critical (q1/(bv h1v))^2/h1v + (q2/(bv (1-h1v)))^2/(1-h1v) = 1
  same internal energy    E = h2 + (u2^2 - u1^2)/2 at both controls.
Continuation in q0 from a rough start at q0 = 0.1 (bv > 1, off the degenerate branch bv = 1).
Run: python3 exchange_net_flow.py  (writes ../exchange-contraction-net-flow-armi-farmer-1986.json)
"""
import json, math, os
from scipy.optimize import fsolve

OUT = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), 'exchange-contraction-net-flow-armi-farmer-1986.json')


def energy(h1, q1, q2, b):
    h2 = 1 - h1
    return h2 + 0.5 * ((q2 / (b * h2)) ** 2 - (q1 / (b * h1)) ** 2)


def equations(v, q0):
    h1n, q2, h1v, bv = v
    q1 = q0 + q2
    u1v, u2v = q1 / (bv * h1v), q2 / (bv * (1 - h1v))
    return [q1 ** 2 / h1n ** 3 + q2 ** 2 / (1 - h1n) ** 3 - 1,
            u1v - u2v,
            u1v ** 2 / h1v + u2v ** 2 / (1 - h1v) - 1,
            energy(h1n, q1, q2, 1.0) - energy(h1v, q1, q2, bv)]


def solve(q0_target, steps=200):
    # rough start at q0 = 0.1 away from the degenerate branch bv = 1 (virtual control on the narrows), then march
    v = [0.52, 0.2, 0.6, 1.02]
    for k in range(0, steps + 1):
        q0 = 0.1 + (q0_target - 0.1) * k / steps
        v, info, ier, msg = fsolve(equations, v, args=(q0,), xtol=1e-13, full_output=True)
        assert ier == 1 or max(abs(r) for r in info['fvec']) < 1e-13, msg
    assert max(abs(r) for r in equations(v, q0_target)) < 1e-12
    h1n, q2, h1v, bv = v
    assert bv > 1 + 1e-6 and 0.5 <= h1n < h1v < 1
    return {'q1': q0_target + q2, 'q2': q2, 'h1n': h1n, 'h1v': h1v, 'bv': bv}


cases = []
for gp, H, b, s in [(0.02, 10.0, 50.0, 0.1), (0.02, 10.0, 50.0, 0.3), (0.1, 4.0, 8.0, 0.45), (0.005, 30.0, 500.0, -0.2), (0.01, 5.0, 20.0, 0.52)]:
    scale = b * math.sqrt(gp * H ** 3)
    r = solve(abs(s))
    up, low = (r['q1'], r['q2']) if s >= 0 else (r['q2'], r['q1'])
    base = {'g_prime': gp, 'depth': H, 'width': b, 'net_discharge': s * scale}
    cases += [{'inputs': {**base, 'output': 'upper'}, 'expected': up * scale},
              {'inputs': {**base, 'output': 'lower'}, 'expected': low * scale},
              {'inputs': {**base, 'output': 'virtual_width'}, 'expected': r['bv'] * b},
              {'inputs': {**base, 'output': 'upper_at_narrows'}, 'expected': (r['h1n'] if s >= 0 else 1 - r['h1n']) * H}]

limit = (2 / 3) ** 1.5
checks = [
    {'source': 'Armi & Farmer (1986) J. Fluid Mech. 164, 27–51: without net flow the maximal exchange is q = ¼√(g′H³) per unit width of the narrows each way',
     'tolerance': {'rel': 1e-12},
     'cases': [{'inputs': {'g_prime': 0.04, 'depth': 9.0, 'width': 10.0, 'net_discharge': 0.0, 'output': o}, 'expected': 0.25 * 10 * math.sqrt(0.04 * 729)} for o in ('upper', 'lower')]},
    {'source': 'Independent reference: scipy.optimize.fsolve of the four control conditions of Armi & Farmer (1986) (narrows critical, |u1| = |u2| and G² = 1 at the virtual control, equal internal energy), generators/exchange_net_flow.py',
     'tolerance': {'rel': 1e-8}, 'cases': cases},
    {'source': 'Analytic end of the maximal-exchange branch of the Armi & Farmer (1986) conditions (derived here, not a printed value): the opposing flux vanishes when the outflowing layer is critical over a stagnant layer at the narrows with E = 0, h = 2H/3, |Q0| = (2/3)^{3/2} b√(g′H³) — the critical overflow from a reservoir of depth H (Turner 1973 §3.2)',
     'tolerance': {'rel': 1e-12},
     'cases': [{'inputs': {'g_prime': 0.02, 'depth': 10.0, 'width': 50.0, 'net_discharge': 0.0, 'output': 'flushing'}, 'expected': limit * 50 * math.sqrt(0.02 * 1000)}]},
    {'source': 'Same analytic limit approached from inside: at |Q0| = (1 − 1e-6)(2/3)^{3/2} b√(g′H³) the opposing layer carries almost nothing (absolute tolerance 1e-3 of b√(g′H³))',
     'tolerance': {'abs': 1e-3 * 50 * math.sqrt(0.02 * 1000)},
     'cases': [{'inputs': {'g_prime': 0.02, 'depth': 10.0, 'width': 50.0, 'net_discharge': (1 - 1e-6) * limit * 50 * math.sqrt(0.02 * 1000), 'output': 'lower'}, 'expected': 0.0}]},
]
with open(OUT, 'w') as fh:
    json.dump({'method': 'exchange-contraction-net-flow-armi-farmer-1986', 'checks': checks}, fh, indent=1, ensure_ascii=False)
    fh.write('\n')
print('ok')
