#!/usr/bin/env python3
"""Independent reference for the internal jump in a channel of finite depth D (rigid lid, Boussinesq, hydrostatic).
python3 with scipy (Debian python3-scipy or scipy 1.17 here); no gprime code.

The conservation laws are written with full hydrostatic pressures (reference density rho1, g = 9.80665, rho2 = rho1 (1 + g'/g)),
lid pressure P1 = 0 upstream, unknowns (y2, P2), solved with scipy.optimize.fsolve from a deep-layer (Belanger) start:
  total momentum  int(p + rho u^2) dz equal on both sides;
  closure A (Wood & Simpson 1984; Klemp, Rotunno & Skamarock 1997): Bernoulli along the lid for the contracting upper layer;
  closure B (layer momentum, interfacial pressure linear across the jump, attributed to Yih & Guha 1955 from memory):
      lower-layer momentum with the interfacial force (p_i1 + p_i2)/2 (y2 - y1).
Head loss: drop of the lower-layer Bernoulli head at the bed, divided by g'.
Run: python3 jump_finite_depth.py  (writes ../internal-jump-finite-depth.json)
"""
import json, math, os
from scipy.optimize import fsolve

OUT = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), 'internal-jump-finite-depth.json')
G, RHO1 = 9.80665, 1000.0  # standard gravity


def layer_pressures(P, y, D, gp):
    rho2 = RHO1 * (1 + gp / G)
    interface = P + RHO1 * G * (D - y)
    lower_int = interface * y + rho2 * G * y * y / 2          # integral of p over the lower layer
    upper_int = P * (D - y) + RHO1 * G * (D - y) ** 2 / 2      # integral of p over the upper layer
    return interface, lower_int, upper_int


def residuals(v, q, qu, y1, D, gp, closure):
    y2, P2 = v
    i1, l1, u1 = layer_pressures(0.0, y1, D, gp)
    i2, l2, u2 = layer_pressures(P2, y2, D, gp)
    total = (l2 + u2 + RHO1 * (q * q / y2 + qu * qu / (D - y2))) - (l1 + u1 + RHO1 * (q * q / y1 + qu * qu / (D - y1)))
    if closure == 'energy':
        second = (P2 / RHO1 + qu * qu / (2 * (D - y2) ** 2)) - (qu * qu / (2 * (D - y1) ** 2))
    else:
        second = ((l2 + RHO1 * q * q / y2) - (l1 + RHO1 * q * q / y1) - 0.5 * (i1 + i2) * (y2 - y1)) / RHO1 / D
    return [total / (RHO1 * gp * D * D), second / (gp * D)]


def solve(q, y1, gp, D, qu=None, closure='energy'):
    qu = -q if qu is None else qu
    F = q / math.sqrt(gp * y1 ** 3)
    guess = 0.5 * y1 * (math.sqrt(1 + 8 * F * F) - 1)
    v, info, ier, msg = fsolve(residuals, [min(guess, 0.6 * D), 0.0], args=(q, qu, y1, D, gp, closure), xtol=1e-12, full_output=True)
    assert max(abs(r) for r in info['fvec']) < 1e-12, msg
    y2, P2 = v
    head = lambda P, y: P / RHO1 + gp * y + 0.5 * (q / y) ** 2
    return y2, (head(0.0, y1) - head(P2, y2)) / gp


scipy_cases, deep_cases, deep_ip_cases, bore_cases = [], [], [], []
for q, y1, gp, D in [(0.05, 0.2, 0.02, 2.0), (0.038, 0.2, 0.02, 2.0), (0.125, 0.5, 0.02, 4.0), (0.00375, 0.05, 0.05, 0.5), (0.866, 1.0, 0.03, 12.0)]:
    base = {'q': q, 'y1': y1, 'g_prime': gp, 'total_depth': D}
    y2, loss = solve(q, y1, gp, D)
    y2b, _ = solve(q, y1, gp, D, closure='pressure')
    scipy_cases += [{'inputs': {**base, 'output': 'y2'}, 'expected': y2},
                    {'inputs': {**base, 'output': 'head_loss'}, 'expected': loss},
                    {'inputs': {**base, 'output': 'y2_interfacial_pressure'}, 'expected': y2b}]

# deep limit: D = 1e4 y1 against the Belanger form y2/y1 = (sqrt(1 + 8F^2) - 1)/2 and the loss (y2 - y1)^3/(4 y1 y2)
for q, y1, gp in [(0.2, 0.5, 0.02), (0.05, 0.3, 0.05), (1.0, 1.0, 0.1)]:
    F = q / math.sqrt(gp * y1 ** 3)
    y2 = 0.5 * y1 * (math.sqrt(1 + 8 * F * F) - 1)
    base = {'q': q, 'y1': y1, 'g_prime': gp, 'total_depth': 1e4 * y1}
    deep_cases += [{'inputs': {**base, 'output': 'y2'}, 'expected': y2},
                   {'inputs': {**base, 'output': 'head_loss'}, 'expected': (y2 - y1) ** 3 / (4 * y1 * y2)}]
    deep_ip_cases.append({'inputs': {**base, 'output': 'y2_interfacial_pressure'}, 'expected': y2})

# bore running into a resting two-layer fluid, seen from the bore: both layers arrive at speed c, h0 ahead, h1 behind;
# c^2 below follows from the two conservation laws of closure A (total momentum, upper-layer Bernoulli) eliminated by hand/sympy
c2 = lambda h0, h1, D, gp: gp * h1 * (D - h1) ** 2 * (h0 + h1) / (D * (h1 * h1 + 2 * D * h0 - 3 * h0 * h1))
for h0, h1, D, gp in [(0.1, 0.3, 1.0, 0.02), (0.2, 0.35, 1.0, 0.05), (1.0, 2.0, 10.0, 0.01)]:
    c = math.sqrt(c2(h0, h1, D, gp))
    # the subcritical conjugate only: composite Froude number behind the bore below 1
    assert (c * h0 / h1) ** 2 / (gp * h1) + (c * (D - h0) / (D - h1)) ** 2 / (gp * (D - h1)) < 1
    bore_cases.append({'inputs': {'q': c * h0, 'y1': h0, 'g_prime': gp, 'total_depth': D, 'upper_discharge': c * (D - h0), 'output': 'y2'}, 'expected': h1})

checks = [
    {'source': 'Independent reference: scipy.optimize.fsolve of total momentum with full hydrostatic pressures and the energy-conserving upper layer (Wood & Simpson 1984; Klemp, Rotunno & Skamarock 1997) or the layer momentum with linear interfacial pressure (Yih & Guha 1955, attribution from memory); upper layer returning the lower-layer discharge (generators/jump_finite_depth.py)',
     'tolerance': {'rel': 1e-8}, 'cases': scipy_cases},
    {'source': 'Deep upper layer limit (Yih & Guha 1955; Wilkinson & Wood 1971): y2/y1 = ½(√(1 + 8F1²) − 1), ΔE = (y2 − y1)³/(4y1y2), here with D = 10⁴ y1',
     'tolerance': {'rel': 1e-6}, 'cases': deep_cases},
    {'source': 'Same deep limit for the interfacial-pressure closure, which approaches it only as y/D (lid-pressure change of order 1/D): tolerance 1e-3 at D = 10⁴ y1',
     'tolerance': {'rel': 1e-3}, 'cases': deep_ip_cases},
    {'source': 'Closed-form bore speed of the energy-conserving-upper-layer closure, c² = g′h1(D − h1)²(h0 + h1)/(D(h1² + 2Dh0 − 3h0h1)), derived symbolically here (sympy), on its subcritical branch; D → ∞ gives the classical c² = g′h1(h0 + h1)/(2h0) and h0 → 0, h1 = D/2 gives Benjamin’s (1968) c = ½√(g′D)',
     'tolerance': {'rel': 1e-9}, 'cases': bore_cases},
]
with open(OUT, 'w') as fh:
    json.dump({'method': 'internal-jump-finite-depth', 'checks': checks}, fh, indent=1, ensure_ascii=False)
    fh.write('\n')
print('ok')
