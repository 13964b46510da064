#!/usr/bin/python3
"""Check values for gprime's CTD conversions (practical salinity from conductivity, depth from pressure).

Run: /usr/bin/python3 gsw_ctd.py  (writes practical-salinity-pss78.json and depth-from-pressure-unesco1983.json
in the folder above). Reference library: TEOS-10 GSW (Debian python3-gsw 3.6):
- gsw.SP_from_C(C [mS/cm], t [ITS-90], p [dbar]): PSS-78 with the Hill et al. (1986) extension below SP = 2
- -gsw.z_from_p(p, lat): depth in a TEOS-10 standard ocean (SA = 35.16504 g/kg, CT = 0 °C)
The printed check values of UNESCO Tech. Pap. Mar. Sci. 44 are written here as recalled (from memory).
"""
import json, os
import gsw

HERE = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
GSW = "TEOS-10 GSW library (McDougall & Barker 2011), python3-gsw " + gsw.__version__
C3515 = 42.914  # mS/cm, conductivity of standard seawater at S = 35, t68 = 15 °C, p = 0


def write(method, checks):
    with open(os.path.join(HERE, method + ".json"), "w") as f:
        json.dump({"method": method, "checks": checks}, f, indent=1, ensure_ascii=False)


def t90(t68):
    return t68 / 1.00024


unesco_sal = {
    "source": "Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44, SAL78 check values "
              "(R = C/42.914 mS/cm; t on IPTS-68, here as ITS-90 = t68/1.00024), printed to 6 decimals — from memory",
    "tolerance": {"abs": 1e-6},
    "cases": [{"inputs": {"conductivity": r * C3515, "temperature": t90(t), "pressure": p}, "expected": s,
               "note": f"R = {r}, t68 = {t}, p = {p}"}
              for r, t, p, s in ((1.0, 15.0, 0.0, 35.000000), (1.2, 20.0, 2000.0, 37.245628), (0.65, 5.0, 1500.0, 27.995347))],
}
cases = []
for c in (0.01, 0.05, 0.2, 0.5, 1.0, 2.0, 3.0, 5.0, 10.0, 20.0, 35.0, 45.0, 55.0, 65.0):
    for t in (0.0, 4.0, 10.0, 20.0, 30.0):
        for p in (0.0, 50.0, 1000.0):
            cases.append({"inputs": {"conductivity": c, "temperature": t, "pressure": p},
                          "expected": float(gsw.SP_from_C(c, t, p))})
write("practical-salinity-pss78", [
    unesco_sal,
    {"source": GSW + ": gsw.SP_from_C(C, t, p), the same PSS-78 and Hill et al. (1986) equations",
     "tolerance": {"abs": 1e-9}, "cases": cases},
])

depth_cases = [{"inputs": {"pressure": p, "latitude": lat}, "expected": float(-gsw.z_from_p(p, lat))}
               for p in (1.0, 10.0, 50.0, 200.0, 1000.0, 2000.0) for lat in (0.0, 30.0, 45.0, 60.0, 90.0)]
write("depth-from-pressure-unesco1983", [
    {"source": "Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44: depth check value p = 10 000 dbar, "
               "latitude 30° → 9712.653 m — from memory",
     "tolerance": {"abs": 0.001},
     "cases": [{"inputs": {"pressure": 10000.0, "latitude": 30.0}, "expected": 9712.653}]},
    {"source": GSW + ": -gsw.z_from_p(p, lat), a TEOS-10 standard ocean (SA = 35.16504 g/kg, CT = 0 °C); both formulas "
               "describe a standard ocean and differ by under 2 cm to 2000 dbar (the tolerance)",
     "tolerance": {"abs": 0.02}, "cases": depth_cases},
])
