"""Independent reference for the arrested salt-wedge length: integrates the two-layer equation
(1 - F1^2) dh1/dx = f_i F1^2 H/(H - h1) (tau_i = rho f_i u1^2, F1^2 = F0^2 H^3/h1^3) with scipy.integrate.quad
from the critical section h1 = H F0^(2/3) to h1 = H. Run: /usr/bin/python3 salt_wedge_length.py"""
import json
from scipy.integrate import quad
def length(U0, H, gp, fi):
    F0 = U0 / (gp * H) ** 0.5
    integrand = lambda h1: (1 - F0 ** 2 * H ** 3 / h1 ** 3) * (H - h1) / (fi * F0 ** 2 * H ** 3 / h1 ** 3 * H)
    return quad(integrand, H * F0 ** (2 / 3), H, epsabs=0, epsrel=1e-12)[0]
cases = [(0.1, 8.0, 0.2, 2e-4), (0.3, 10.0, 0.19, 3e-4), (0.05, 5.0, 0.1, 1e-3), (0.5, 12.0, 0.2, 5e-4)]
print(json.dumps([{'river_velocity': u, 'depth': h, 'g_prime': g, 'interfacial_friction': f, 'length': length(u, h, g, f)} for u, h, g, f in cases], indent=2))
