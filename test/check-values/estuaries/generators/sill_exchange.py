"""Independent reference for maximal two-layer exchange over a sill (Farmer & Armi 1986): solves
crest criticality q^2/h1^3 + q^2/h2^3 = 1 and the Bernoulli difference from the virtual control,
1/2 q^2/h2^2 - 1/2 q^2/h1^2 - h1 = -3/2 q^(2/3) (g' = H = 1), with scipy.optimize.fsolve.
Run: /usr/bin/python3 sill_exchange.py"""
import json
from scipy.optimize import fsolve
def eqs(v):
    q, h1 = v
    return [q * q / h1 ** 3 + q * q / (1 - h1) ** 3 - 1, 0.5 * q * q / (1 - h1) ** 2 - 0.5 * q * q / h1 ** 2 - h1 + 1.5 * q ** (2 / 3)]
q, h1 = fsolve(eqs, (0.2, 0.6), xtol=1e-14)
print(json.dumps({'q_nondim': q, 'upper_thickness_nondim': h1}, indent=2))
