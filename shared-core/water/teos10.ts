import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';

export const TEOS10_75: MethodInfo = {
  id: 'density-teos10-75term',
  title: 'TEOS-10 density, 75-term polynomial',
  source:
    'Roquet, F., Madec, G., McDougall, T.J., Barker, P.M. (2015). Accurate polynomial expressions for the density and ' +
    'specific volume of seawater using the TEOS-10 standard. Ocean Modelling 90, 29–43 (75-term specific volume); ' +
    'IOC, SCOR, IAPSO (2010). TEOS-10 Manual, Manuals and Guides 56, §2.5 (SA = 35.16504/35 · SP) and §3.3 (CT from θ).',
  equation: 'ρ = 1 / v(SA, CT, p), v a 75-term polynomial in √(SA·s_fac + offset), CT/40 and p/10⁴ dbar',
  validity: {
    salinity: { min: 0, max: 42, unit: 'PSU', note: 'oceanographic funnel of the fit' },
    temperature: { min: -2, max: 40, unit: 'degC' },
    pressure: { min: 0, max: 1000, unit: 'dbar', note: 'θ from t by one midpoint step of the adiabatic lapse rate' },
  },
};

/** Reference-composition Absolute Salinity [g/kg] from practical salinity (TEOS-10 Manual Eq. 2.5.1, no anomaly δSA). */
export function absoluteSalinityReference(practicalSalinity: number): number {
  return (35.16504 / 35) * practicalSalinity;
}

const SFAC = 0.0248826675584615; // 1/(40 · 35.16504/35)
const CP0 = 3991.86795711963; // J/(kg K), TEOS-10 Manual Eq. 3.3.3

/**
 * Conservative Temperature from potential temperature: CT = h0(SA, θ)/c_p0, with the
 * potential-enthalpy polynomial of the TEOS-10 Manual §3.3 (exact to machine precision w.r.t. the Gibbs function).
 * @param absoluteSalinity [g/kg]; @param potentialTemperature [degC]; @returns CT [degC]
 */
export function conservativeTemperatureFromPt(absoluteSalinity: number, potentialTemperature: number): number {
  const x2 = SFAC * Math.max(absoluteSalinity, 0);
  const x = Math.sqrt(x2);
  const y = potentialTemperature * 0.025;
  const h =
    61.01362420681071 +
    y *
      (168776.46138048015 +
        y *
          (-2735.2785605119625 +
            y *
              (2574.2164453821433 +
                y *
                  (-1536.6644434977543 +
                    y * (545.7340497931629 + (-50.91091728474331 - 18.30489878927802 * y) * y))))) +
    x2 *
      (268.5520265845071 +
        y *
          (-12019.028203559312 +
            y *
              (3734.858026725145 +
                y *
                  (-2046.7671145057618 +
                    y * (465.28655623826234 + (-0.6370820302376359 - 10.650848542359153 * y) * y)))) +
        x *
          (937.2099110620707 +
            y * (588.1802812170108 + y * (248.39476522971285 + (-3.871557904936333 - 2.6268019854268356 * y) * y)) +
            x *
              (-1687.914374187449 +
                x * (246.9598888781377 + x * (123.59576582457964 - 48.5891069025409 * x)) +
                y *
                  (936.3206544460336 +
                    y *
                      (-942.7827304544439 +
                        y * (369.4389437509002 + (-33.83664947895248 - 9.987880382780322 * y) * y))))));
  return h / CP0;
}

/** Coefficients v_ijk of xs^i · ys^j · z^k (Roquet et al. 2015, Table, 75 terms) [m3/kg]. */
const V: Record<string, number> = {
  '000': 1.0769995862e-3,
  '001': -6.0799143809e-5,
  '002': 9.9856169219e-6,
  '003': -1.1309361437e-6,
  '004': 1.053115308e-7,
  '005': -1.2647261286e-8,
  '006': 1.961350393e-9,
  '010': -1.5649734675e-5,
  '011': 1.8505765429e-5,
  '012': -1.1736386731e-6,
  '013': -3.6527006553e-7,
  '014': 3.1454099902e-7,
  '020': 2.7762106484e-5,
  '021': -1.1716606853e-5,
  '022': 2.130502874e-6,
  '023': 2.8695905159e-7,
  '030': -1.6521159259e-5,
  '031': 7.9279656173e-6,
  '032': -4.6132540037e-7,
  '040': 6.9111322702e-6,
  '041': -3.4102187482e-6,
  '042': -6.3352916514e-8,
  '050': -8.053961554e-7,
  '051': 5.0736766814e-7,
  '060': 2.0543094268e-7,
  '100': -3.1038981976e-4,
  '101': 2.4262468747e-5,
  '102': -5.8484432984e-7,
  '103': 3.6310188515e-7,
  '104': -1.1147125423e-7,
  '110': 3.5009599764e-5,
  '111': -9.5677088156e-6,
  '112': -5.5699154557e-6,
  '113': -2.7295696237e-7,
  '120': -3.7435842344e-5,
  '121': -2.3678308361e-7,
  '122': 3.913738708e-7,
  '130': 2.4141479483e-5,
  '131': -3.4558773655e-6,
  '132': 7.7618888092e-9,
  '140': -8.7595873154e-6,
  '141': 1.2956717783e-6,
  '150': -3.30527589e-7,
  '200': 6.6928067038e-4,
  '201': -3.4792460974e-5,
  '202': -4.8122251597e-6,
  '203': 1.674630378e-8,
  '210': -4.3592678561e-5,
  '211': 1.1100834765e-5,
  '212': 5.4620748834e-6,
  '220': 3.590782276e-5,
  '221': 2.9283346295e-6,
  '222': -6.5731104067e-7,
  '230': -1.4353633048e-5,
  '231': 3.1655306078e-7,
  '240': 4.3703680598e-6,
  '300': -8.5047933937e-4,
  '301': 3.7470777305e-5,
  '302': 4.9263106998e-6,
  '310': 3.4532461828e-5,
  '311': -9.8447117844e-6,
  '312': -1.3544185627e-6,
  '320': -1.8698584187e-5,
  '321': -4.88261392e-7,
  '330': 2.2863324556e-6,
  '400': 5.8086069943e-4,
  '401': -1.7322218612e-5,
  '402': -1.7811974727e-6,
  '410': -1.1959409788e-5,
  '411': 2.590922526e-6,
  '420': 3.8595339244e-6,
  '500': -2.1092370507e-4,
  '501': 3.0927427253e-6,
  '510': 1.3864594581e-6,
  '600': 3.1932457305e-5,
};
const TERMS = Object.entries(V).map(([k, c]) => ({ i: +k[0], j: +k[1], k: +k[2], c }));

/**
 * Specific volume from the 75-term polynomial, v(SA, CT, p) [m3/kg].
 * @param absoluteSalinity [g/kg]; @param conservativeTemperature [degC]; @param pressure sea pressure [dbar]
 */
export function specificVolume75(absoluteSalinity: number, conservativeTemperature: number, pressure: number): number {
  const xs = Math.sqrt(SFAC * Math.max(absoluteSalinity, 0) + 0.5971840214030754);
  const ys = conservativeTemperature * 0.025;
  const z = pressure * 1e-4;
  let v = 0;
  for (const { i, j, k, c } of TERMS) v += c * xs ** i * ys ** j * z ** k;
  return v;
}

/**
 * Potential temperature referenced to 0 dbar by one midpoint step of the adiabatic lapse rate
 * Γ = (T α)/(ρ c_p) (Fofonoff 1977, Deep-Sea Res. 24, 489–491; TEOS-10 Manual Eq. 2.22.1), with the thermal
 * expansion α from the 75-term polynomial and c_p ≈ c_p0. Error below 0.002 °C above 1000 dbar.
 */
export function potentialTemperatureApprox(absoluteSalinity: number, temperature: number, pressure: number): number {
  const lapse = (t: number, p: number) => {
    const ct = conservativeTemperatureFromPt(absoluteSalinity, t);
    const dv =
      (specificVolume75(absoluteSalinity, ct + 0.01, p) - specificVolume75(absoluteSalinity, ct - 0.01, p)) / 0.02;
    return ((t + 273.15) * dv) / CP0; // K per Pa: Γ = T (∂v/∂T) / c_p
  };
  const pa = pressure * 1e4;
  const mid = temperature - 0.5 * pa * lapse(temperature, pressure);
  return temperature - pa * lapse(mid, pressure / 2);
}

/**
 * Seawater in-situ density with TEOS-10 (75-term polynomial of Roquet et al. 2015).
 * SA = (35.16504/35)·SP (reference composition, no δSA); θ from potentialTemperatureApprox();
 * CT = h0(SA, θ)/c_p0; ρ = 1/v(SA, CT, p).
 * @param salinity practical salinity [PSU]; @param temperature in-situ temperature [degC, ITS-90]; @param pressure [dbar]
 * @returns density [kg/m3]
 * @source Roquet et al. (2015), Ocean Modelling 90, 29–43; TEOS-10 Manual (IOC et al. 2010) §2.5, §3.3.
 * @validity S 0–42, t −2–40 °C, p ≤ 1000 dbar (gprime's surface-water range; GSW's exact θ would extend it).
 */
export function densitySeawaterTeos10(salinity: number, temperature: number, pressure = 0): Scalar {
  const sp = requireInRange('salinity', salinity, 'PSU', { min: 0, max: 70 });
  const t = requireInRange('temperature', temperature, 'degC', { min: -3, max: 60 });
  const p = requireInRange('pressure', pressure, 'dbar', { min: 0, max: 12000 });
  const sa = absoluteSalinityReference(sp);
  const ct = conservativeTemperatureFromPt(sa, p === 0 ? t : potentialTemperatureApprox(sa, t, p));
  return scalar(TEOS10_75, 1 / specificVolume75(sa, ct, p), 'kg/m3', { salinity: sp, temperature: t, pressure: p });
}
