#!/usr/bin/python3
"""Check values from published closed forms and worked numbers (evaluated here with plain Python / scipy, no gprime code).
Writes the check-value files for interfacial-celerity-boussinesq, solitary-wave-kdv, internal-seiche-modes,
wind-stress-large-pond-1981 and wedderburn."""
import json, math, os
from scipy import optimize

G = 9.80665
OUT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))


def write(method, checks):
    with open(os.path.join(OUT, method + '.json'), 'w') as fh:
        json.dump({'method': method, 'checks': checks}, fh, indent=1, ensure_ascii=False)
        fh.write('\n')


# Boussinesq long interfacial wave
bq = [{'inputs': {'g_prime': gp, 'upper_thickness': h1, 'lower_thickness': h2}, 'expected': math.sqrt(gp * h1 * h2 / (h1 + h2))}
      for gp, h1, h2 in [(0.02, 5, 15), (0.05, 10, 10), (0.2, 2, 50)]]
# deep lower layer: c -> sqrt(g' h1) (Turner 1973 §2.1, reduced-gravity shallow layer)
deep = [{'inputs': {'g_prime': 0.03, 'upper_thickness': 4, 'lower_thickness': 1e4}, 'expected': math.sqrt(0.03 * 4)}]
write('interfacial-celerity-boussinesq', [
    {'source': 'Gill (1982) Atmosphere–Ocean Dynamics §6.3, c² = g′h1h2/(h1+h2)', 'tolerance': {'rel': 1e-12}, 'cases': bq},
    {'source': 'Turner (1973) Buoyancy Effects in Fluids §2.1, deep lower layer: c → √(g′h1)', 'tolerance': {'rel': 5e-4}, 'cases': deep},
])

# KdV solitary wave (Helfrich & Melville 2006, two-layer Boussinesq coefficients)
kdv = []
for r1, r2, h1, h2, a in [(998.0, 1000.0, 5.0, 15.0, 2.0), (1020.0, 1026.0, 30.0, 10.0, 3.0)]:
    gp = G * (r2 - r1) / r2
    c0 = math.sqrt(gp * h1 * h2 / (h1 + h2))
    alpha = 1.5 * c0 * (h1 - h2) / (h1 * h2)
    signed_a = -a if h1 < h2 else a          # polarity rule
    beta = c0 * h1 * h2 / 6
    base = {'rho_upper': r1, 'rho_lower': r2, 'upper_thickness': h1, 'lower_thickness': h2, 'amplitude': a}
    kdv.append({'inputs': {**base, 'output': 'celerity'}, 'expected': c0 + alpha * signed_a / 3})
    kdv.append({'inputs': {**base, 'output': 'half_width'}, 'expected': math.sqrt(12 * beta / (alpha * signed_a))})
lim = [{'inputs': {'rho_upper': 998.0, 'rho_lower': 1000.0, 'upper_thickness': h1, 'lower_thickness': h2, 'amplitude': 0, 'output': 'limiting_amplitude'},
        'expected': abs(h2 - h1) / 2, 'note': 'interface at mid-depth'} for h1, h2 in [(5, 15), (30, 10)]]
write('solitary-wave-kdv', [
    {'source': 'Helfrich & Melville (2006) Annu. Rev. Fluid Mech. 38 §2: KdV with α = 3c0(h1−h2)/(2h1h2), β = c0h1h2/6, c = c0 + αa/3, λ² = 12β/(αa)',
     'tolerance': {'rel': 1e-9}, 'cases': kdv},
    {'source': 'Amick & Turner (1986); Lamb & Wan (1998): Boussinesq two-layer solitary waves are limited by the conjugate flow with the interface at mid-depth',
     'tolerance': {'rel': 1e-12}, 'cases': lim},
])

# Seiche from mode speeds: constant N, c_n = NH/(nπ) -> T = 2L nπ/(m N H)
seiche_modes = [{'inputs': {'basin_length': L, 'celerity': N * H / (n * math.pi), 'horizontal_mode': m}, 'expected': 2 * L * n * math.pi / (m * N * H)}
                for L, N, H, n, m in [(4000, 0.01, 40, 1, 1), (4000, 0.01, 40, 2, 1), (12000, 0.02, 60, 1, 2)]]
# two-layer limit: c = sqrt(g' h1 h2 / H) gives the Merian period (Mortimer 1974)
merian = [{'inputs': {'basin_length': 8000, 'celerity': math.sqrt(0.02 * 6 * 24 / 30), 'horizontal_mode': 1}, 'expected': 16000 / math.sqrt(0.02 * 6 * 24 / 30)}]
write('internal-seiche-modes', [
    {'source': 'Münnich, Wüest & Imboden (1992) Limnol. Oceanogr. 37: T_nm = 2L/(m c_n) with the analytic constant-N speeds c_n = NH/(nπ) (Gill 1982 §6.11)',
     'tolerance': {'rel': 1e-12}, 'cases': seiche_modes},
    {'source': 'Mortimer (1974) Merian formula for the two-layer limit, T = 2L/c_i', 'tolerance': {'rel': 1e-12}, 'cases': merian},
])

# Wind stress (Large & Pond 1981) with rho_air = 1.225 kg/m3, rho_w = 1000 kg/m3
def cd(u):
    return 1.2e-3 if u < 11 else (0.49 + 0.065 * u) * 1e-3
ws = [{'inputs': {'wind_speed': u, 'output': 'stress'}, 'expected': 1.225 * cd(u) * u * u} for u in (5, 10, 15, 20)]
ws += [{'inputs': {'wind_speed': u, 'output': 'shear_velocity'}, 'expected': math.sqrt(1.225 * cd(u) * u * u / 1000)} for u in (5, 10, 15, 20)]
# common practice, no source: u*_water ≈ 1.2e-3 U10 for moderate winds (C_D ≈ 1.2e-3, ρ_air/ρ_w ≈ 1.2e-3)
rule = [{'inputs': {'wind_speed': 8, 'output': 'shear_velocity'}, 'expected': 1.2e-3 * 8}]
write('wind-stress-large-pond-1981', [
    {'source': 'Large & Pond (1981) J. Phys. Oceanogr. 11: 10³C_D = 1.2 (4–11 m/s), 0.49 + 0.065U10 (11–25 m/s); ρ_air = 1.225 kg/m³ (ISO 2533)',
     'tolerance': {'rel': 1e-12}, 'cases': ws},
    {'source': 'common practice, no source: u*_water ≈ 1.2e-3 U10 in moderate winds (±5 %)', 'tolerance': {'rel': 0.05}, 'cases': rule},
])

# Wedderburn number (Thompson & Imberger 1980)
wed = [{'inputs': {'g_prime': gp, 'upper_thickness': h, 'shear_velocity': u, 'basin_length': L}, 'expected': gp * h * h / (u * u * L)}
       for gp, h, u, L in [(0.02, 6, 0.01, 3000), (0.015, 4, 0.015, 5000), (0.05, 10, 0.005, 1000)]]
# threshold W = 1 (Thompson & Imberger 1980): for g' = 0.02, h = 6, L = 3000 the wind speed that gives W = 1
u_star_1 = math.sqrt(0.02 * 36 / 3000)
u10 = optimize.brentq(lambda u: math.sqrt(1.225 * cd(u) * u * u / 1000) - u_star_1, 1, 60)
thr = [{'inputs': {'g_prime': 0.02, 'upper_thickness': 6, 'wind_speed': u10, 'basin_length': 3000}, 'expected': 1.0,
        'note': 'wind speed solved with scipy brentq so that W = 1 with Large & Pond (1981) C_D'}]
write('wedderburn', [
    {'source': 'Thompson & Imberger (1980), W = g′h²/(u*²L)', 'tolerance': {'rel': 1e-12}, 'cases': wed},
    {'source': 'Thompson & Imberger (1980) upwelling threshold W = 1 with u* from Large & Pond (1981); wind speed found by scipy.optimize.brentq',
     'tolerance': {'rel': 1e-8}, 'cases': thr},
])
print('ok')
