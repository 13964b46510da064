#!/usr/bin/python3
"""Reference densities of concentrated seawater for gprime's brine correlation (Sharqawy et al. 2010, eq. 8).

Run: /usr/bin/python3 brine_gibbs.py (Debian python3-gsw 3.6; writes ../density-brine-sharqawy2010.json)
Reference: the exact TEOS-10 Gibbs function at atmospheric pressure, gsw.rho_t_exact(SA, t, 0). Feistel et al. (2010),
Ocean Sci. 6, 633-677, section 2.3: for salinities up to 120 g/kg and temperatures up to 80 degC the Gibbs function of
seawater applies at atmospheric pressure.
"""
import json, os
import gsw

here = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
SCATTER = 0.001  # the correlation's stated accuracy, +-0.1 %


def case(sa, t):
    return {"inputs": {"absolute_salinity": sa, "temperature": t}, "expected": float(gsw.rho_t_exact(sa, t, 0.0))}


def sharqawy(sa, t):
    s = sa / 1000
    return (999.9 + 2.034e-2 * t - 6.162e-3 * t**2 + 2.261e-5 * t**3 - 4.657e-8 * t**4) + s * (
        802.0 - 2.001 * t + 1.677e-2 * t**2 - 3.060e-5 * t**3 - 1.613e-5 * s * t**2
    )


cool = [case(sa, t) for sa in (0.0, 35.16504, 50.0, 70.0, 100.0, 120.0) for t in (1.0, 10.0, 25.0, 40.0)]
checks = [
    {
        "kind": "validation",
        "source": "TEOS-10 Gibbs function of seawater (IAPWS-08; Feistel 2008), python3-gsw 3.6.16: gsw.rho_t_exact(SA, t, 0), valid at atmospheric pressure to 120 g/kg and 80 °C (Feistel et al. 2010, Ocean Sci. 6, 633–677, §2.3); generators/brine_gibbs.py. Tolerance: the correlation's stated accuracy ±0.1 % (Sharqawy et al. 2010)",
        "tolerance": {"rel": SCATTER},
        "scatter": {"rel": SCATTER, "basis": "stated accuracy of the correlation, ±0.1 %"},
        "cases": cool,
    }
]
for sa in (70.0, 100.0):
    c = case(sa, 60.0)
    bias = round(sharqawy(sa, 60.0) / c["expected"] - 1, 4)
    checks.append(
        {
            "kind": "known-bias",
            "source": f"Same Gibbs-function reference at 60 °C and {sa:g} g/kg (hot concentrates, region C of Feistel et al. 2010 Fig. 3). Known-bias record: the correlation lies {100 * bias:.2f} % above the Gibbs function, beyond its stated ±0.1 %",
            "tolerance": {"rel": 0.0005},
            "bias": {"rel": bias},
            "cases": [c],
        }
    )
checks.append(
    {
        "kind": "consistency",
        "source": "Sharqawy et al. (2010) eq. (8) evaluated by hand at S = 0.07 kg/kg, t = 20 °C: ρ_w = 999.9 + 0.4068 − 2.4648 + 0.18088 − 0.0074512 = 998.0154288; 802.0 − 40.02 + 6.708 − 0.2448 − 1.613e-5 × 0.07 × 400 = 768.4427484, × 0.07 = 53.7909924; ρ = 1051.8064212 kg/m³ (coefficients as in several independent public implementations)",
        "tolerance": {"rel": 1e-9},
        "cases": [{"inputs": {"absolute_salinity": 70.0, "temperature": 20.0}, "expected": round(sharqawy(70.0, 20.0), 9)}],
    }
)
with open(os.path.join(here, "density-brine-sharqawy2010.json"), "w") as f:
    json.dump({"method": "density-brine-sharqawy2010", "checks": checks}, f, ensure_ascii=False)
