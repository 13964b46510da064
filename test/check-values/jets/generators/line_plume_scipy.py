#!/usr/bin/python3
"""Line (2-D) plume in a linearly stratified ambient, top-hat integral model (Morton, Taylor & Turner 1956 hypothesis):
  d(q)/dz = 2 alpha w, d(m)/dz = f / w, d(f)/dz = -N^2 q, with q = 2 b w, m = q w, f = q g'
Maximum rise z_max / l_b, l_b = f0^(1/3) / N, for a pure line plume started on its similarity solution.
alpha = 0.16 (top-hat; Gaussian plane-plume coefficient ~0.11 times sqrt(2); from memory).
Run: /usr/bin/python3 line_plume_scipy.py > line-plume-scipy.json
"""
import json
import numpy as np
from scipy.integrate import solve_ivp

ALPHA = 0.16


def rise(alpha):
    N, f0 = 1.0, 1.0
    # pure line plume similarity: w = (f0 / (2 alpha))^(1/3) constant, q = 2 alpha w z
    w0 = (f0 / (2 * alpha)) ** (1 / 3)
    z0 = 1e-4
    y0 = [2 * alpha * w0 * z0, 2 * alpha * w0 * w0 * z0, f0]
    f = lambda z, y: [2 * alpha * y[1] / y[0], y[2] * y[0] / y[1], -N * N * y[0]]
    top = lambda z, y: y[1] / y[0] - 1e-6
    top.terminal, top.direction = True, -1
    neutral = lambda z, y: y[2]
    s = solve_ivp(f, [z0, 50], y0, rtol=1e-11, atol=1e-14, events=[top, neutral])
    return float(s.t_events[0][0]), float(s.t_events[1][0])


if __name__ == '__main__':
    zmax, zn = rise(ALPHA)
    print(json.dumps({'generator': 'test/check-values/jets/generators/line_plume_scipy.py', 'alpha_top_hat': ALPHA,
                      'max_rise_over_lb': zmax, 'neutral_over_lb': zn}, indent=1))
