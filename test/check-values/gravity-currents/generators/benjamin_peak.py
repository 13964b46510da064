"""Independent reference: maximum of Benjamin's (1968) U/sqrt(g'H) = sqrt(a(1-a)(2-a)/(1+a)) over a.
Run: /usr/bin/python3 benjamin_peak.py"""
import json
from scipy.optimize import minimize_scalar
f = lambda a: -(a * (1 - a) * (2 - a) / (1 + a)) ** 0.5
r = minimize_scalar(f, bounds=(0.01, 0.99), method='bounded', options={'xatol': 1e-12})
print(json.dumps({'a_peak': r.x, 'froude_total_peak': -r.fun}, indent=2))
