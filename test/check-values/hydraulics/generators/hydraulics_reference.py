#!/usr/bin/python3
"""Independent references for the hydraulics check values (Debian /usr/bin/python3 with scipy; no gprime code).
- maximal exchange through a contraction: maximise q with G^2 = q^2/(g'h1^3) + q^2/(g'h2^3) = 1, h1 + h2 = H (scipy minimize_scalar);
- critical sill overflow: maximise q on the reduced-gravity specific-energy curve E = y + q^2/(2 g' y^2) = Y (brentq);
- internal jump: conservation of the reduced-gravity momentum function q^2/y + g' y^2/2 (brentq);
- curtain wall: Bernoulli with the interface at the lip, and its tangency with critical flow at a = 2Y/3.
"""
import json, math, os
from scipy import optimize

OUT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))


def write(method, checks):
    with open(os.path.join(OUT, method + '.json'), 'w') as fh:
        json.dump({'method': method, 'checks': checks}, fh, indent=1, ensure_ascii=False)
        fh.write('\n')

SCIPY = 'scipy reference (test/check-values/hydraulics/generators/hydraulics_reference.py): '

# composite Froude (Armi 1986)
cf = [{'inputs': {'u1': u1, 'u2': u2, 'h1': h1, 'h2': h2, 'g_prime': gp}, 'expected': math.sqrt(u1 ** 2 / (gp * h1) + u2 ** 2 / (gp * h2))}
      for u1, u2, h1, h2, gp in [(0.1, -0.1, 5, 5, 0.02), (0.3, 0.0, 2, 8, 0.05), (-0.05, 0.2, 10, 3, 0.01)]]
# critical exchange at the narrows (Armi & Farmer 1986): h1 = h2 = H/2, u = ±½√(g′H) gives G = 1
crit = [{'inputs': {'u1': 0.5 * math.sqrt(0.02 * 10), 'u2': -0.5 * math.sqrt(0.02 * 10), 'h1': 5, 'h2': 5, 'g_prime': 0.02}, 'expected': 1.0}]
write('composite-froude', [
    {'source': 'Armi (1986) J. Fluid Mech. 163: G² = F1² + F2²', 'tolerance': {'rel': 1e-12}, 'cases': cf},
    {'source': 'Armi & Farmer (1986) J. Fluid Mech. 164: maximal exchange is critical (G = 1) at the narrows with h1 = h2 = H/2, |u| = ½√(g′H)', 'tolerance': {'rel': 1e-12}, 'cases': crit},
])

# maximal exchange through a contraction
mx = []
for gp, H, b in [(0.02, 10, 50), (0.1, 4, 8), (0.005, 30, 500)]:
    q = lambda h1: math.sqrt(gp / (1 / h1 ** 3 + 1 / (H - h1) ** 3))
    best = optimize.minimize_scalar(lambda h1: -q(h1), bounds=(1e-6 * H, H * (1 - 1e-6)), method='bounded', options={'xatol': 1e-12})
    mx.append({'inputs': {'g_prime': gp, 'depth': H, 'width': b}, 'expected': b * q(best.x)})
write('maximal-exchange-contraction', [
    {'source': SCIPY + 'maximum over the interface position of q subject to G² = 1 at the narrows (Armi & Farmer 1986 control condition)', 'tolerance': {'rel': 1e-6}, 'cases': mx},
    {'source': 'Armi & Farmer (1986) J. Fluid Mech. 164: Q = ¼ b √(g′H³)', 'tolerance': {'rel': 1e-12},
     'cases': [{'inputs': {'g_prime': 0.04, 'depth': 9, 'width': 10}, 'expected': 0.25 * 10 * math.sqrt(0.04 * 729)}]},
])

# maximal exchange over a sill
write('maximal-exchange-sill', [
    {'source': 'Farmer & Armi (1986) J. Fluid Mech. 164, 53–76: sill alone, Q ≈ 0.208 b √(g′H³) (coefficient from memory)', 'tolerance': {'rel': 0.005},
     'cases': [{'inputs': {'g_prime': 0.02, 'depth': 10, 'width': 50}, 'expected': 0.208 * 50 * math.sqrt(0.02 * 1000)},
               {'inputs': {'g_prime': 0.1, 'depth': 3, 'width': 5}, 'expected': 0.208 * 5 * math.sqrt(0.1 * 27)}]},
    {'source': 'Farmer & Armi (1986): a sill alone passes less than the contraction bound ¼ b √(g′H³) of Armi & Farmer (1986); ratio 0.208/0.25 = 0.832 (from memory)', 'tolerance': {'rel': 0.01},
     'cases': [{'inputs': {'g_prime': 0.04, 'depth': 9, 'width': 10}, 'expected': 0.832 * 0.25 * 10 * math.sqrt(0.04 * 729)}]},
])

# critical sill overflow
so = []
for gp, Y in [(0.02, 3.0), (0.1, 0.5), (0.005, 20.0)]:
    # largest q for which E(y) = Y has a solution: maximise q(y) = y sqrt(2 g' (Y - y))
    best = optimize.minimize_scalar(lambda y: -y * math.sqrt(2 * gp * (Y - y)), bounds=(1e-9, Y), method='bounded', options={'xatol': 1e-12})
    so.append({'inputs': {'g_prime': gp, 'interface_above_crest': Y}, 'expected': best.x * math.sqrt(2 * gp * (Y - best.x))})
write('sill-overflow-critical', [
    {'source': SCIPY + 'maximum discharge on the reduced-gravity specific-energy curve (critical flow at the crest)', 'tolerance': {'rel': 1e-7}, 'cases': so},
    {'source': 'Whitehead, Leetmaa & Knox (1974) Geophys. Fluid Dyn. 6, non-rotating limit q = (2/3)^{3/2} √g′ Y^{3/2}', 'tolerance': {'rel': 1e-12},
     'cases': [{'inputs': {'g_prime': 0.03, 'interface_above_crest': 2.0}, 'expected': (2 / 3) ** 1.5 * math.sqrt(0.03 * 8)}]},
])

# internal hydraulic jump
ij = []
for q, y1, gp in [(0.2, 0.5, 0.02), (0.05, 0.3, 0.05), (1.0, 1.0, 0.1)]:
    M = lambda y: q * q / y + gp * y * y / 2
    yc = (q * q / gp) ** (1 / 3)
    y2 = optimize.brentq(lambda y: M(y) - M(y1), yc, 1e4, xtol=1e-14)
    ij.append({'inputs': {'q': q, 'y1': y1, 'g_prime': gp, 'output': 'y2'}, 'expected': y2})
    E = lambda y: y + q * q / (2 * gp * y * y)
    ij.append({'inputs': {'q': q, 'y1': y1, 'g_prime': gp, 'output': 'head_loss'}, 'expected': E(y1) - E(y2)})
write('internal-hydraulic-jump', [
    {'source': SCIPY + 'conjugate depth from the reduced-gravity momentum function, head loss from the specific energy (deep upper layer, Yih & Guha 1955 limit)',
     'tolerance': {'rel': 1e-9}, 'cases': ij},
    {'source': 'Wilkinson & Wood (1971) J. Fluid Mech. 47: Bélanger form y2/y1 = ½(√(1+8F1²) − 1); F1 = 2 gives y2/y1 = 2.3723',
     'tolerance': {'rel': 1e-4}, 'cases': [{'inputs': {'q': 2 * math.sqrt(0.02 * 0.125), 'y1': 0.5, 'g_prime': 0.02, 'output': 'y2'}, 'expected': 0.5 * 2.3723}]},
])

# curtain wall
cw = []
for gp, a, Y in [(0.02, 2.0, 5.0), (0.05, 1.0, 1.5), (0.01, 3.0, 12.0)]:
    # Bernoulli from rest (interface Y) to the lip section with the interface at the lip: Y = a + q^2/(2 g' a^2)
    q = optimize.brentq(lambda q: a + q * q / (2 * gp * a * a) - Y, 0, 1e3)
    cw.append({'inputs': {'g_prime': gp, 'lip_height': a, 'interface_height': Y}, 'expected': q})
tang = [{'inputs': {'g_prime': 0.03, 'lip_height': 2.0, 'interface_height': 3.0}, 'expected': math.sqrt(0.03 * 8),
         'note': 'a = 2Y/3: equals the critical discharge √(g′a³)'}]
write('curtain-wall-withdrawal', [
    {'source': SCIPY + 'reduced-gravity Bernoulli equation Y = a + q²/(2g′a²) solved for q (Craya 1949 energy argument)', 'tolerance': {'rel': 1e-9}, 'cases': cw},
    {'source': 'Turner (1973) §3.2 critical flow q = √(g′ h_c³) at h_c = 2Y/3 (the largest discharge the energy Y allows)', 'tolerance': {'rel': 1e-12}, 'cases': tang},
])

# stratified obstacle flow
ob = []
for U, N, h, H in [(0.05, 0.02, 5.0, 30.0), (0.2, 0.01, 4.0, 50.0), (0.1, 0.05, 2.0, 20.0)]:
    ob.append({'inputs': {'velocity': U, 'buoyancy_frequency': N, 'obstacle_height': h, 'depth': H, 'output': 'froude'}, 'expected': U / (N * h)})
    ob.append({'inputs': {'velocity': U, 'buoyancy_frequency': N, 'obstacle_height': h, 'depth': H, 'output': 'lee_wavelength'}, 'expected': 2 * math.pi * U / N})
ch = [{'inputs': {'velocity': 0.05, 'buoyancy_frequency': 0.02, 'obstacle_height': 5.0, 'depth': 30.0, 'output': 'channel_lee_wavelength'},
       'expected': 2 * math.pi / math.sqrt((0.02 / 0.05) ** 2 - (math.pi / 30) ** 2)}]
# Snyder et al. (1985) towing-tank data follow H_s/h = 1 − U/(Nh); scatter about ±0.1 h (from memory)
sn = [{'inputs': {'velocity': U, 'buoyancy_frequency': 0.5, 'obstacle_height': 0.2, 'depth': 1.2, 'output': 'dividing_streamline'}, 'expected': 0.2 * (1 - U / (0.5 * 0.2))}
      for U in (0.02, 0.05, 0.08)]
write('stratified-obstacle-flow', [
    {'source': 'Baines (1995) Topographic Effects in Stratified Flows Ch. 5: Fr = U/(Nh), λ = 2πU/N', 'tolerance': {'rel': 1e-12}, 'cases': ob},
    {'source': 'Baines (1995) Ch. 5: mode-1 lee wave in a channel, k² = N²/U² − (π/H)²', 'tolerance': {'rel': 1e-12}, 'cases': ch},
    {'source': 'Snyder et al. (1985) J. Fluid Mech. 152 towing-tank experiments: dividing streamline H_s = h(1 − U/(Nh)) (Sheppard 1956); scatter ±0.1h from memory',
     'tolerance': {'abs': 0.02}, 'cases': sn},
])
print('ok')
