#!/usr/bin/python3
"""Analytic reference values for the combined (interfering) withdrawal of several point-sink ports.

Profile: density rho(d) = 1000 + 0.05 d kg/m3 (linear, so N^2 = g 0.05 / rho(d_port) at every distance from the port) and a
tracer c(d) = (d - 30)^2 [1], over 0..60 m. Inertial point sink: half-thickness delta = (Q/N)^(1/3) on both sides
(Imberger & Patterson 1990, from memory); velocity shape 1 - (a/delta)^2 on both sides (Bohan & Grace 1973 in linear
stratification), so a port's flow-weighted tracer is c(d_p) + c'' delta^2 / 10 = (d_p - 30)^2 + delta^2 / 5 exactly.
Combined interference (WES multiple-port approach, from memory): ports whose layers overlap form a group of flow Q_g; each
member's layer is taken at Q_g; groups whose zones overlap join; release tracer = sum Q_i c_i / sum Q_i.
The grouping is decided here by hand-checkable inequalities (printed), and the values follow from the formulas above.
Run: /usr/bin/python3 interference_reference.py
"""
import json
import math

G = 9.80665


def n(dp):
    return math.sqrt(G * 0.05 / (1000 + 0.05 * dp))


def delta(dp, q):
    return (q / n(dp)) ** (1 / 3)


def port_tracer(dp, q):
    return (dp - 30) ** 2 + delta(dp, q) ** 2 / 5


def release(ports, groups):
    """ports: [(depth, flow)], groups: list of index lists."""
    total = sum(q for _, q in ports)
    s = 0.0
    for g in groups:
        qg = sum(ports[i][1] for i in g)
        for i in g:
            s += ports[i][1] * port_tracer(ports[i][0], qg)
    return s / total


out = {}
# A. two ports at one depth, 4 + 6 m3/s: one group
A = [(30, 4.0), (30, 6.0)]
out['coincident_combined'] = {'tracer': release(A, [[0, 1]]), 'top': 30 - delta(30, 10), 'bottom': 30 + delta(30, 10)}
out['coincident_independent'] = {'tracer': release(A, [[0], [1]])}
# C. ports at 26 and 34 m, 5 m3/s each: 26 + delta(26,5) > 34 - delta(34,5)
C = [(26, 5.0), (34, 5.0)]
print('C overlap:', 26 + delta(26, 5), '>', 34 - delta(34, 5))
out['near_pair'] = {'tracer': release(C, [[0, 1]]), 'top': 26 - delta(26, 10), 'bottom': 34 + delta(34, 10)}
# D. ports at 10 and 50 m, 3 m3/s each: no overlap
D = [(10, 3.0), (50, 3.0)]
print('D no overlap:', 10 + delta(10, 3), '<', 50 - delta(50, 3))
out['far_pair'] = {'tracer': release(D, [[0], [1]])}
# E. ports at 20 (6), 30 (6), 43 (4): 20/30 overlap alone; 30 at 12 m3/s then reaches 43's layer; all at 16 m3/s
E = [(20, 6.0), (30, 6.0), (43, 4.0)]
print('E 20/30 overlap:', 20 + delta(20, 6), '>', 30 - delta(30, 6))
print('E 30/43 apart alone:', 30 + delta(30, 6), '<', 43 - delta(43, 4))
print('E 30 at 12 reaches 43:', 30 + delta(30, 12), '>', 43 - delta(43, 4))
print('E inside 0..60 at 16:', 20 - delta(20, 16), 43 + delta(43, 16))
out['chain_of_three'] = {'tracer': release(E, [[0, 1, 2]]), 'top': 20 - delta(20, 16), 'bottom': 43 + delta(43, 16)}
print(json.dumps(out, indent=1))
