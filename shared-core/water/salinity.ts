import { requireInRange, nonNegative } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { note, type Warning } from '../core/warning';
import { brentRoot } from '../numerics/roots';

/**
 * Conversions of CTD readings from UNESCO Tech. Pap. Mar. Sci. 44: practical salinity from conductivity
 * (PSS-78) and depth from pressure. Both take temperature on IPTS-68 (t68 = 1.00024 t90).
 */
export const PSS78: MethodInfo = {
  id: 'practical-salinity-pss78',
  title: 'Practical salinity from conductivity (PSS-78)',
  source:
    'Fofonoff, N.P., Millard, R.C. (1983). Algorithms for computation of fundamental properties of seawater. ' +
    'UNESCO Technical Papers in Marine Science 44, Practical Salinity Scale 1978 (Lewis 1980), algorithm SAL78; ' +
    'below S = 2: Hill, K.D., Dauphinee, T.M., Woods, D.J. (1986). The extension of the Practical Salinity ' +
    'Scale 1978 to low salinities. IEEE J. Oceanic Eng. OE-11(1), 109–112.',
  equation:
    'R = C/C(35,15,0), C(35,15,0) = 42.914 mS/cm; Rt = R/(Rp·rt); S = Σ aᵢ Rt^(i/2) + Δt/(1 + k Δt) Σ bᵢ Rt^(i/2), Δt = t68 − 15',
  validity: {
    salinity: { min: 0, max: 42, unit: 'PSU', note: 'PSS-78 from 2 to 42, Hill et al. 1986 below 2' },
    temperature: { min: -2, max: 35, unit: 'degC' },
    pressure: { min: 0, max: 10000, unit: 'dbar' },
  },
};

export const DEPTH_FROM_PRESSURE: MethodInfo = {
  id: 'depth-from-pressure-unesco1983',
  title: 'Depth from pressure (UNESCO 1983)',
  source:
    'Fofonoff, N.P., Millard, R.C. (1983). Algorithms for computation of fundamental properties of seawater. ' +
    'UNESCO Technical Papers in Marine Science 44, depth from pressure (after Saunders, P.M., Fofonoff, N.P. 1976, ' +
    'Deep-Sea Res. 23, 109–111; see also Saunders, P.M. 1981, J. Phys. Oceanogr. 11, 573–574).',
  equation:
    'd = (9.72659 p − 2.2512e-5 p² + 2.279e-10 p³ − 1.82e-15 p⁴) / (g(φ) + 1.092e-6 p), standard ocean S = 35, t = 0 °C',
  validity: {
    pressure: { min: 0, max: 10000, unit: 'dbar' },
  },
};

/** Conductivity of standard seawater at S = 35, t68 = 15 °C, p = 0 [mS/cm]. */
export const C35_15_0 = 42.914;

const A = [0.008, -0.1692, 25.3851, 14.0941, -7.0261, 2.7081];
const B = [0.0005, -0.0056, -0.0066, -0.0375, 0.0636, -0.0144];
const K = 0.0162;

/** Σ cᵢ x^(i/2) for coefficients c₀…c₅, with x^(1/2) given. */
function halfPowers(c: readonly number[], sqrtX: number): number {
  let sum = 0;
  for (let i = c.length - 1; i >= 0; i--) sum = sum * sqrtX + c[i];
  return sum;
}

/** PSS-78 salinity from the ratio Rt at temperature t68 (no low-salinity extension). */
function salinityFromRt(rt: number, t68: number): number {
  const dt = t68 - 15;
  const r = Math.sqrt(rt);
  return halfPowers(A, r) + (dt / (1 + K * dt)) * halfPowers(B, r);
}

/** Hill et al. (1986) raw low-salinity value from the PSS-78 value s at ratio Rt. */
function hillRaw(s: number, rt: number, t68: number): number {
  const dt = t68 - 15;
  const x = 400 * rt;
  const y = 10 * Math.sqrt(rt);
  return s - A[0] / (1 + x * (1.5 + x)) - (B[0] * dt) / (1 + K * dt) / (1 + y * (1 + y * (1 + y)));
}

/**
 * Practical salinity from in-situ conductivity, PSS-78 (Fofonoff & Millard 1983, SAL78), with the low-salinity
 * extension of Hill et al. (1986) below S = 2 (scaled so that it joins PSS-78 at S = 2), never negative.
 * @param conductivity in-situ electrical conductivity [mS/cm] (1 S/m = 10 mS/cm)
 * @param temperature in-situ temperature [degC, ITS-90]
 * @param pressure sea pressure [dbar]
 * @returns practical salinity [PSU]
 * @source Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44 (SAL78); Hill et al. (1986).
 * @validity S 2–42 (0–2 by Hill et al.), t −2–35 °C, p 0–10 000 dbar.
 */
export function practicalSalinityPss78(conductivity: number, temperature: number, pressure = 0): Scalar {
  const c = requireInRange('conductivity', conductivity, 'mS/cm', { ...nonNegative, max: 100 });
  const t90 = requireInRange('temperature', temperature, 'degC', { min: -3, max: 60 });
  const p = requireInRange('pressure', pressure, 'dbar', { min: 0, max: 12000 });
  const t = 1.00024 * t90;
  const r = c / C35_15_0;
  const rtT = 0.6766097 + t * (2.00564e-2 + t * (1.104259e-4 + t * (-6.9698e-7 + t * 1.0031e-9)));
  const rp =
    1 +
    (p * (2.07e-5 + p * (-6.37e-10 + p * 3.989e-15))) /
      (1 + t * (3.426e-2 + t * 4.464e-4) + r * (0.4215 - 0.003107 * t));
  const rt = r / (rp * rtT);
  let s = salinityFromRt(rt, t);
  if (s < 2) s = lowSalinityRatio(t) * hillRaw(s, rt, t);
  const value = Math.max(0, s);
  return scalar(PSS78, value, 'PSU', { salinity: value, temperature: t90, pressure: p });
}

/** The factor that joins the Hill et al. (1986) extension to PSS-78 at S = 2 at temperature t68. */
function lowSalinityRatio(t68: number): number {
  const rtAt2 = brentRoot((rt) => salinityFromRt(rt, t68) - 2, 1e-6, 1, 1e-15) ?? 2 / 35;
  return 2 / hillRaw(2, rtAt2, t68);
}

/**
 * Practical salinity from specific conductance (conductivity referred to 25 °C by the instrument): PSS-78 at
 * t = 25 °C and p = 0, since specific conductance is the conductivity the water would have at 25 °C.
 * @param specificConductance conductivity at 25 °C [mS/cm]
 * @returns practical salinity [PSU], with a note that it comes from specific conductance
 */
export function practicalSalinityFromSpecificConductance(specificConductance: number): Scalar {
  const r = practicalSalinityPss78(specificConductance, 25, 0);
  const labelled: Warning = note(
    'salinity-from-specific-conductance',
    'Salinity from specific conductance (conductivity at 25 °C) by PSS-78 at 25 °C; the instrument’s own temperature compensation is assumed.',
    'conductivity',
  );
  return { ...r, warnings: [...r.warnings, labelled] };
}

/** Gravity at latitude φ and the surface, the UNESCO 1983 form of the international formula [m/s2]. */
function surfaceGravity(latitude: number): number {
  const x = Math.sin((latitude * Math.PI) / 180) ** 2;
  return 9.780318 * (1 + (5.2788e-3 + 2.36e-5 * x) * x);
}

/**
 * Depth from sea pressure in a standard ocean (S = 35, t = 0 °C), Saunders & Fofonoff (1976) as printed in
 * UNESCO Tech. Pap. Mar. Sci. 44: d = (9.72659 p − 2.2512e-5 p² + 2.279e-10 p³ − 1.82e-15 p⁴)/(g(φ) + 1.092e-6 p).
 * In fresh water the true depth is about 3 % greater (1 dbar ≈ 1.02 m of fresh water).
 * @param pressure sea pressure [dbar]
 * @param latitude [deg], default 45
 * @returns depth below the surface [m]
 * @source Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44 (depth from pressure).
 * @validity p 0–10 000 dbar.
 */
export function depthFromPressureUnesco1983(pressure: number, latitude = 45): Scalar {
  const p = requireInRange('pressure', pressure, 'dbar', { min: 0, max: 12000 });
  const lat = requireInRange('latitude', latitude, 'deg', { min: -90, max: 90 });
  const d = ((((-1.82e-15 * p + 2.279e-10) * p - 2.2512e-5) * p + 9.72659) * p) / (surfaceGravity(lat) + 1.092e-6 * p);
  return scalar(DEPTH_FROM_PRESSURE, d, 'm', { pressure: p });
}
