#!/usr/bin/python3
"""Independent references for the internal-waves check values (run with Debian's /usr/bin/python3).

Nothing here reuses gprime code. Methods:
- dispersion: the linear potential-flow eigenproblem of two layers (Lamb 1932 §231) set up from its boundary
  conditions as a 3x3 determinant in (A, B, C) and solved for omega^2 with scipy.optimize.brentq;
- vertical modes: shooting with scipy.integrate.solve_ivp on w'' + N^2/c^2 w = 0 and brentq on c;
- tridiagonal eigenpairs: scipy.linalg.eigh_tridiagonal and scipy.linalg.eigh (generalized, dense);
- Lake number: scipy.integrate.quad of the Imberger & Patterson (1990) integrals for a conical basin.
Writes generators/internal_waves_reference.json (raw) and the scipy sections of the check-value files.
"""
import json, math, os
import numpy as np
from scipy import integrate, optimize, linalg

G = 9.80665
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.dirname(HERE)


def det_two_layer(w2, k, r1, r2, h1, h2, lid):
    """Determinant of the linear two-layer problem; interface at z=0, phi1 = A cosh kz + B sinh kz, phi2 = C cosh k(z+h2)."""
    ch, sh = math.cosh(k * h1), math.sinh(k * h1)
    if lid:  # w = 0 at z = h1
        row_top = [k * sh, k * ch, 0.0]
    else:    # phi_tt + g phi_z = 0 at z = h1
        row_top = [-w2 * ch + G * k * sh, -w2 * sh + G * k * ch, 0.0]
    row_kin = [0.0, 1.0, -math.sinh(k * h2)]                      # phi1_z = phi2_z at z = 0
    row_dyn = [w2 * r1, (r2 - r1) * G * k, -w2 * r2 * math.cosh(k * h2)]  # pressure continuity at the interface
    return np.linalg.det(np.array([row_top, row_kin, row_dyn]))


def dispersion_roots(k, r1, r2, h1, h2, lid):
    f = lambda w2: det_two_layer(w2, k, r1, r2, h1, h2, lid)
    grid = np.geomspace(1e-14, 1e4, 6000) * G * k
    vals = [f(x) for x in grid]
    roots = [optimize.brentq(f, grid[i], grid[i + 1], xtol=1e-300, rtol=1e-15) for i in range(len(grid) - 1) if vals[i] * vals[i + 1] < 0]
    return sorted(math.sqrt(w2) / k for w2 in roots)


def shoot_modes(n2, H, nmodes, free_surface=False):
    """Phase speeds (descending) of w'' + N^2/c^2 w = 0, w(H) = 0 (depth d down); top: w = 0, or c^2 dw/dz = g w (free surface)."""
    def miss(c):
        # integrate from the bottom (d = H) up to the surface; y = (w, dw/dd)
        sol = integrate.solve_ivp(lambda d, y: [y[1], -n2(d) / c ** 2 * y[0]], [H, 0.0], [0.0, -1.0], rtol=1e-11, atol=1e-14, max_step=H / 400)
        w, wd = sol.y[0, -1], sol.y[1, -1]
        # free surface with z up: c^2 dw/dz = g w; dw/dz = -dw/dd
        return w if not free_surface else -c * c * wd - G * w
    cs = np.geomspace(1.5 * math.sqrt(G * H) if free_surface else 5.0, 0.02, 400)
    vals = [miss(c) for c in cs]
    roots = [optimize.brentq(miss, cs[i + 1], cs[i], xtol=1e-14, rtol=1e-13) for i in range(len(cs) - 1) if vals[i] * vals[i + 1] < 0]
    return roots[:nmodes]


def tanh_n2(n0, nb, d0, delta):
    return lambda d: n0 ** 2 / math.cosh((d - d0) / delta) ** 2 + nb ** 2


def write(method, checks):
    path = os.path.join(OUT, method + '.json')
    with open(path, 'w') as fh:
        json.dump({'method': method, 'checks': checks}, fh, indent=1, ensure_ascii=False)
        fh.write('\n')


raw = {}
SCIPY = 'scipy reference (test/check-values/internal-waves/generators/internal_waves_reference.py): '

# ---- dispersion ------------------------------------------------------------------------------------------
states = [(998.0, 1000.0, 5.0, 15.0), (1000.0, 1025.0, 10.0, 40.0), (850.0, 1000.0, 3.0, 2.0)]
lams = [20.0, 60.0, 200.0, 2000.0]
fs_cases, lid_cases = [], []
for (r1, r2, h1, h2) in states:
    for lam in lams:
        k = 2 * math.pi / lam
        fs = dispersion_roots(k, r1, r2, h1, h2, False)
        lid = dispersion_roots(k, r1, r2, h1, h2, True)
        base = {'rho_upper': r1, 'rho_lower': r2, 'upper_thickness': h1, 'lower_thickness': h2, 'wavelength': lam}
        fs_cases.append({'inputs': {**base, 'root': 'interfacial'}, 'expected': fs[0]})
        fs_cases.append({'inputs': {**base, 'root': 'surface'}, 'expected': fs[-1]})
        lid_cases.append({'inputs': base, 'expected': lid[0]})
raw['dispersion_free_surface'] = fs_cases
raw['dispersion_rigid_lid'] = lid_cases

long_fs = []
for (r1, r2, h1, h2) in states:
    # long-wave limit (Gill 1982 §6.2): c^4 - g(h1+h2)c^2 + (1 - r1/r2) g^2 h1 h2 = 0, roots by numpy.roots
    roots = sorted(np.sqrt(np.roots([1.0, -G * (h1 + h2), (1 - r1 / r2) * G * G * h1 * h2]).real))
    base = {'rho_upper': r1, 'rho_lower': r2, 'upper_thickness': h1, 'lower_thickness': h2}
    long_fs += [{'inputs': {**base, 'root': 'interfacial'}, 'expected': roots[0]}, {'inputs': {**base, 'root': 'surface'}, 'expected': roots[1]}]
write('interfacial-dispersion-free-surface', [
    {'source': SCIPY + 'linear potential-flow eigenproblem of Lamb (1932) §231 built from its boundary conditions, roots by brentq',
     'tolerance': {'rel': 1e-8}, 'cases': fs_cases},
    {'source': 'Gill (1982) Atmosphere–Ocean Dynamics §6.2, long-wave limit c⁴ − g(h1+h2)c² + (1 − ρ1/ρ2)g²h1h2 = 0 (roots by numpy.roots)',
     'tolerance': {'rel': 1e-9}, 'cases': long_fs},
])
long_lid = []
for (r1, r2, h1, h2) in states:
    long_lid.append({'inputs': {'rho_upper': r1, 'rho_lower': r2, 'upper_thickness': h1, 'lower_thickness': h2},
                     'expected': math.sqrt(G * (r2 - r1) * h1 * h2 / (r1 * h2 + r2 * h1))})
write('interfacial-dispersion-rigid-lid', [
    {'source': SCIPY + 'linear two-layer eigenproblem with w = 0 at the lid (Lamb 1932 §231), roots by brentq',
     'tolerance': {'rel': 1e-8}, 'cases': lid_cases},
    {'source': 'Turner (1973) Buoyancy Effects in Fluids §2.1, long-wave limit c² = g(ρ2 − ρ1)h1h2/(ρ1h2 + ρ2h1)',
     'tolerance': {'rel': 1e-12}, 'cases': long_lid},
])

# ---- vertical modes --------------------------------------------------------------------------------------
const_cases = []
for (N, H) in [(0.01, 100.0), (0.02, 30.0), (0.005, 1000.0)]:
    for n in (1, 2, 3):
        const_cases.append({'inputs': {'profile': 'constant', 'n': N, 'depth': H, 'mode': n}, 'expected': N * H / (n * math.pi),
                            'note': 'c_n = NH/(nπ)'})
tanh_cases = []
for (n0, nb, d0, delta, H) in [(0.05, 0.002, 8.0, 2.0, 40.0), (0.03, 0.0, 15.0, 5.0, 60.0)]:
    cs = shoot_modes(tanh_n2(n0, nb, d0, delta), H, 3)
    for i, c in enumerate(cs):
        tanh_cases.append({'inputs': {'profile': 'tanh', 'n0': n0, 'nb': nb, 'd0': d0, 'delta': delta, 'depth': H, 'mode': i + 1}, 'expected': c})
    cf = shoot_modes(tanh_n2(n0, nb, d0, delta), H, 2, free_surface=True)
    # the first free-surface root is the barotropic mode; the next is internal mode 1
    tanh_cases.append({'inputs': {'profile': 'tanh', 'n0': n0, 'nb': nb, 'd0': d0, 'delta': delta, 'depth': H, 'mode': 1, 'surface': 'free-surface'}, 'expected': cf[1]})
raw['modes_tanh'] = tanh_cases
write('vertical-modes', [
    {'source': 'Gill (1982) Atmosphere–Ocean Dynamics §6.11, analytic constant-N modes c_n = NH/(nπ)', 'tolerance': {'rel': 2e-5}, 'cases': const_cases},
    {'source': SCIPY + 'shooting (solve_ivp, rtol 1e-11) + brentq on c for N² = N0² sech²((d − d0)/δ) + Nb²', 'tolerance': {'rel': 2e-4}, 'cases': tanh_cases},
])

# ---- tridiagonal solver (used by test/core/numerics/tridiagonal-eigen.test.ts) ----------------------------
rng = np.random.default_rng(20240611)
n = 40
d = rng.uniform(-2, 3, n); e = rng.uniform(-1, 1, n - 1)
w_std, v_std = linalg.eigh_tridiagonal(d, e, select='i', select_range=(0, 4))
A = np.diag(np.full(n, 2.0)) + np.diag(np.full(n - 1, -1.0), 1) + np.diag(np.full(n - 1, -1.0), -1)
B = np.diag(rng.uniform(0.5, 2.0, n))
w_gen, v_gen = linalg.eigh(A, B, subset_by_index=[0, 4])
raw['tridiagonal'] = {'diag': d.tolist(), 'off': e.tolist(), 'standard_values': w_std.tolist(), 'standard_vector0': v_std[:, 0].tolist(),
                      'pencil_weight': np.diag(B).tolist(), 'pencil_values': w_gen.tolist(), 'pencil_vector0': v_gen[:, 0].tolist()}

# ---- seiche ----------------------------------------------------------------------------------------------
seiche = []
for (L, r1, r2, h1, h2) in [(5000.0, 998.0, 1000.0, 8.0, 22.0), (20000.0, 997.5, 999.7, 12.0, 60.0), (1500.0, 1020.0, 1026.0, 4.0, 16.0)]:
    k = math.pi / L  # fundamental: half a wavelength over the basin
    c = dispersion_roots(k, r1, r2, h1, h2, False)[0]
    seiche.append({'inputs': {'basin_length': L, 'rho_upper': r1, 'rho_lower': r2, 'upper_thickness': h1, 'lower_thickness': h2}, 'expected': 2 * L / c})
raw['seiche'] = seiche
merian = [{'inputs': c['inputs'], 'expected': 2 * c['inputs']['basin_length'] / math.sqrt(
    G * (c['inputs']['rho_lower'] - c['inputs']['rho_upper']) / c['inputs']['rho_lower'] * c['inputs']['upper_thickness'] * c['inputs']['lower_thickness']
    / (c['inputs']['upper_thickness'] + c['inputs']['lower_thickness']))} for c in seiche]
write('internal-seiche-two-layer', [
    {'source': SCIPY + 'standing wave k = π/L of the two-layer free-surface eigenproblem (Lamb 1932 §231); finite-k dispersion included',
     'tolerance': {'rel': 2e-3}, 'cases': seiche},
    {'source': 'Mortimer (1974) internal Merian formula T = 2L/√(g′h1h2/(h1+h2)), Boussinesq rigid lid; differs by ≈ Δρ/(2ρ)', 'tolerance': {'rel': 3e-3}, 'cases': merian},
])

# ---- Lake number: conical basin, tanh density, scipy.integrate.quad --------------------------------------
def lake_number_quad(A0, zm, rho_fn, u, dT):
    area = lambda z: A0 * (z / zm) ** 2  # cone, apex at the bottom; z height above the bottom
    vol = integrate.quad(area, 0, zm)[0]
    zg = integrate.quad(lambda z: z * area(z), 0, zm)[0] / vol
    st = integrate.quad(lambda z: (zg - z) * area(z) * rho_fn(zm - z), 0, zm, points=[zm - dT], limit=200)[0]
    zT = zm - dT
    hv = integrate.quad(area, 0, zT)[0]
    rho0 = integrate.quad(lambda z: area(z) * rho_fn(zm - z), 0, zT, limit=200)[0] / hv
    return G * st * (1 - zT / zm) / (rho0 * u * u * A0 ** 1.5 * (1 - zg / zm))
lake = []
for (A0, zm, dT, drho, u) in [(1e6, 30.0, 8.0, 2.0, 0.005), (4e6, 50.0, 12.0, 1.2, 0.01)]:
    rho_fn = lambda d, dT=dT, drho=drho: 998.0 + drho / 2 * (1 + math.tanh((d - dT) / 1.5))
    lake.append({'inputs': {'basin': 'cone', 'surface_area': A0, 'depth': zm, 'thermocline_depth': dT, 'delta_rho': drho, 'shear_velocity': u},
                 'expected': lake_number_quad(A0, zm, rho_fn, u, dT)})
raw['lake_number'] = lake
cyl = []
for (A0, H, h1, drho, u) in [(1e6, 30.0, 8.0, 2.0, 0.005), (2.5e5, 20.0, 5.0, 1.0, 0.008)]:
    rho2 = 998.0 + drho
    gp = G * drho / rho2
    cyl.append({'inputs': {'basin': 'cylinder', 'surface_area': A0, 'depth': H, 'thermocline_depth': h1, 'delta_rho': drho, 'shear_velocity': u},
                'expected': gp * h1 ** 2 * (H - h1) / (u * u * math.sqrt(A0) * H)})
write('lake-number', [
    {'source': 'Imberger & Patterson (1990) Adv. Appl. Mech. 27, L_N reduced analytically for a two-layer lake in a vertical-walled basin: L_N = g′h1²h2/(u*²√A0 H)',
     'tolerance': {'rel': 2e-3}, 'cases': cyl},
    {'source': SCIPY + 'Imberger & Patterson (1990) L_N and Idso (1973) Schmidt stability by scipy.integrate.quad, conical basin, tanh thermocline',
     'tolerance': {'rel': 2e-3}, 'cases': lake},
])

with open(os.path.join(HERE, 'internal_waves_reference.json'), 'w') as fh:
    json.dump(raw, fh, indent=1)
    fh.write('\n')
print('ok')
