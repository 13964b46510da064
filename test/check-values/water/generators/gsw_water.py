#!/usr/bin/python3
"""Reference values for gprime's water properties from the TEOS-10 GSW library (Debian python3-gsw 3.6).

Run: /usr/bin/python3 gsw_water.py  (writes gsw_water.json beside this script)
- teos10: in-situ density gsw.rho(SA, CT_from_t(SA, t, p), p) with SA = 35.16504/35 * SP (reference composition)
- fresh:  pure-water density from the exact TEOS-10 Gibbs function (IAPWS-09 pure water part), gsw.rho_t_exact(0, t, 0)
- cp:     pure-water isobaric heat capacity gsw.cp_t_exact(0, t, 0)
"""
import json, os
import gsw

out = {"generator": "gsw " + gsw.__version__, "teos10": [], "fresh": [], "cp": []}
for sp in (0.0, 5.0, 20.0, 35.0, 40.0):
    for t in (0.0, 5.0, 10.0, 20.0, 30.0):
        for p in (0.0, 50.0, 150.0):
            sa = 35.16504 / 35.0 * sp
            ct = gsw.CT_from_t(sa, t, p)
            out["teos10"].append({"salinity": sp, "temperature": t, "pressure": p, "density": float(gsw.rho(sa, ct, p))})
for t in (0.5, 4.0, 10.0, 15.0, 20.0, 25.0, 30.0, 35.0, 40.0):
    out["fresh"].append({"temperature": t, "density": float(gsw.rho_t_exact(0.0, t, 0.0))})
    out["cp"].append({"temperature": t, "cp": float(gsw.cp_t_exact(0.0, t, 0.0))})
with open(os.path.join(os.path.dirname(os.path.abspath(__file__)), "gsw_water.json"), "w") as f:
    json.dump(out, f, indent=1)

# --- check-values files for the vitest suite (test/helpers/check-values.ts format) ---
here = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
def write(method, checks):
    with open(os.path.join(here, method + ".json"), "w") as f:
        json.dump({"method": method, "checks": checks}, f, indent=1, ensure_ascii=False)

GSW = "TEOS-10 GSW library (McDougall & Barker 2011), python3-gsw " + gsw.__version__
write("density-teos10-75term", [
    {"source": GSW + ": gsw.rho(SA, gsw.CT_from_t(SA, t, p), p) at p = 0 (exact θ = t)",
     "tolerance": {"abs": 1e-6},
     "cases": [{"inputs": {k: c[k] for k in ("salinity", "temperature", "pressure")}, "expected": c["density"]} for c in out["teos10"] if c["pressure"] == 0]},
    {"source": GSW + ": same, p = 50 and 150 dbar (θ by a midpoint lapse-rate step in gprime)",
     "tolerance": {"abs": 0.001},
     "cases": [{"inputs": {k: c[k] for k in ("salinity", "temperature", "pressure")}, "expected": c["density"]} for c in out["teos10"] if c["pressure"] > 0]},
])
fresh_gsw = {"source": GSW + ": gsw.rho_t_exact(0, t, 0), pure water of the TEOS-10 Gibbs function (IAPWS-09)",
             "tolerance": {"abs": 0.005},
             "cases": [{"inputs": {"temperature": c["temperature"]}, "expected": c["density"]} for c in out["fresh"]]}
# CRC Handbook of Chemistry and Physics, "Properties of water in the range 0–100 °C" (ITS-90), from memory.
crc = {"source": "CRC Handbook of Chemistry and Physics, table of water density 0–100 °C (ITS-90) — from memory",
       "tolerance": {"abs": 0.003},
       "cases": [{"inputs": {"temperature": t}, "expected": r} for t, r in
                 ((4, 999.9720), (10, 999.7026), (15, 999.1026), (20, 998.2071), (25, 997.0479), (30, 995.6502), (40, 992.2152))]}
write("density-fresh-tanaka2001", [fresh_gsw, crc])
crc_hot = dict(crc, cases=crc["cases"] + [{"inputs": {"temperature": t}, "expected": r} for t, r in ((60, 983.2), (80, 971.8), (100, 958.4))],
               tolerance={"abs": 0.1})
write("density-fresh-kell1975", [fresh_gsw, crc_hot])
write("specific-heat-millero1973", [
    {"source": GSW + ": gsw.cp_t_exact(0, t, 0), pure water (IAPWS-09)", "tolerance": {"rel": 0.0015},
     "cases": [{"inputs": {"temperature": c["temperature"]}, "expected": c["cp"]} for c in out["cp"]]},
    {"source": "Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44, p. 31: check value cp(S=0, t=0, p=0) — from memory",
     "tolerance": {"rel": 1e-4}, "cases": [{"inputs": {"temperature": 0}, "expected": 4217.4}]},
])
