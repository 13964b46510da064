import { GRAVITY } from '../quantities';
import { qty } from '../core/quantity-text';
import { InputError } from '../core/errors';
import { positive, requireInRange } from '../core/range';
import { scalar, validityWarnings, type MethodInfo, type Scalar } from '../core/method';
import { caution, outsideValidity, type Warning } from '../core/warning';
import { interpolateAt } from '../profile/profile';
import { twoLayerFreeSurfaceCelerities, type TwoLayer } from './two-layer';

const LENGTH = { ...positive, max: 1e6 };

export const INTERNAL_SEICHE_TWO_LAYER: MethodInfo = {
  id: 'internal-seiche-two-layer',
  title: 'First internal seiche period of a two-layer basin (Merian formula)',
  source:
    'Mortimer, C.H. (1974). Lake hydrodynamics. Mitt. Int. Ver. Theor. Angew. Limnol. 20, 124–197 (internal Merian formula ' +
    'T = 2L/c_i); interfacial long-wave speed from Lamb (1932) §231 / Gill (1982) §6.2 (free surface, full density ratio).',
  equation:
    'T = 2L / c_i, c_i the interfacial root of c⁴ − g(h1 + h2)c² + (1 − ρ1/ρ2)g²h1h2 = 0 (≈ √(g′h1h2/(h1 + h2)))',
  validity: {},
};

/**
 * Period of the fundamental internal seiche (first vertical, first horizontal mode) of a rectangular two-layer basin.
 * @param basinLength [m] length along the wind (thalweg) L
 * @returns T [s]
 * @source Mortimer (1974); Lamb (1932) §231
 * @validity rectangular basin of uniform depth; real basins with sloping sides have periods some 10–20 % longer
 */
export function internalSeichePeriodTwoLayer(basinLength: number, state: TwoLayer): Scalar {
  const L = requireInRange('basin_length', basinLength, 'm', LENGTH);
  const c = twoLayerFreeSurfaceCelerities(state).interfacial;
  const H = state.upperThickness + state.lowerThickness;
  const warnings =
    L < 10 * H
      ? [
          outsideValidity(
            'short-basin',
            `The basin is only ${(L / H).toFixed(1)} depths long: the long-wave seiche formula needs L ≫ H.`,
            'basin_length',
          ),
        ]
      : [];
  return scalar(INTERNAL_SEICHE_TWO_LAYER, (2 * L) / c, 's', {}, warnings);
}

export const INTERNAL_SEICHE_MODES: MethodInfo = {
  id: 'internal-seiche-modes',
  title: 'Internal seiche periods from vertical-mode speeds',
  source:
    'Münnich, M., Wüest, A., Imboden, D.M. (1992). Observations of the second vertical mode of the internal seiche in an alpine lake. ' +
    'Limnol. Oceanogr. 37, 1705–1719 (T_nm = 2L/(m c_n) for a rectangular basin); Gill (1982) §6.11 for c_n.',
  equation: 'T(n, m) = 2L / (m c_n), n vertical, m horizontal mode number',
  validity: {},
};

/**
 * Seiche period for vertical mode speed c_n and horizontal mode m: T = 2L/(m c_n).
 * @param basinLength [m]; @param celerity [m/s] c_n from `verticalModesFromN2`; @param horizontalMode m ≥ 1
 * @returns T [s]
 */
export function internalSeichePeriodFromMode(basinLength: number, celerity: number, horizontalMode = 1): Scalar {
  const L = requireInRange('basin_length', basinLength, 'm', LENGTH);
  const c = requireInRange('celerity', celerity, 'm/s', { ...positive, max: 300 });
  const m = requireInRange('horizontal_mode', horizontalMode, '1', { min: 1, max: 100 });
  return scalar(INTERNAL_SEICHE_MODES, (2 * L) / (m * c), 's', {});
}

export const WIND_STRESS_LARGE_POND_1981: MethodInfo = {
  id: 'wind-stress-large-pond-1981',
  title: 'Wind stress and water-side friction velocity from the 10 m wind',
  source:
    'Large, W.G., Pond, S. (1981). Open ocean momentum flux measurements in moderate to strong winds. J. Phys. Oceanogr. 11, ' +
    '324–336 (neutral drag: 10³C_D = 1.2 for 4 ≤ U10 < 11 m/s, 0.49 + 0.065 U10 for 11 ≤ U10 ≤ 25 m/s); air density 1.225 kg/m³ ' +
    '(ISO 2533:1975 standard atmosphere, sea level).',
  equation: 'τ = ρ_air C_D U10², u* = √(τ / ρ_water)',
  validity: { wind_speed: { min: 4, max: 25, unit: 'm/s', note: 'range of the Large & Pond (1981) fit' } },
};

/** Air density of the ISO 2533 standard atmosphere at sea level [kg/m3]. */
export const AIR_DENSITY = 1.225;

/** Neutral 10 m drag coefficient of Large & Pond (1981) [1]; below 4 m/s the 1.2e-3 plateau is extended. */
export function dragCoefficientLargePond1981(windSpeed: number): number {
  return windSpeed < 11 ? 1.2e-3 : (0.49 + 0.065 * windSpeed) * 1e-3;
}

export interface WindStress {
  /** wind stress τ [N/m2 = Pa] */
  stress: number;
  /** water-side friction velocity u* [m/s] */
  shearVelocity: number;
  /** drag coefficient used [1] */
  dragCoefficient: number;
  method: string;
  warnings: Warning[];
}

/**
 * Wind stress and water-side friction velocity.
 * @param windSpeed [m/s] at 10 m; @param rhoWater [kg/m3] (default 1000)
 * @param dragCoefficient [1] optional fixed C_D instead of Large & Pond (1981)
 * @returns τ [Pa], u* [m/s]
 * @source Large & Pond (1981); ISO 2533 air density
 * @validity 4 ≤ U10 ≤ 25 m/s, neutral atmosphere; light winds over small lakes have larger C_D (Wüest & Lorke 2003)
 */
export function windStressLargePond1981(windSpeed: number, rhoWater = 1000, dragCoefficient?: number): WindStress {
  const U = requireInRange('wind_speed', windSpeed, 'm/s', { min: 0, max: 60 });
  const rw = requireInRange('rho_water', rhoWater, 'kg/m3', { min: 900, max: 1300 });
  const cd =
    dragCoefficient === undefined
      ? dragCoefficientLargePond1981(U)
      : requireInRange('drag_coefficient', dragCoefficient, '1', { ...positive, max: 0.01 });
  const stress = AIR_DENSITY * cd * U * U;
  const warnings =
    dragCoefficient === undefined ? validityWarnings(WIND_STRESS_LARGE_POND_1981, { wind_speed: U }) : [];
  return {
    stress,
    shearVelocity: Math.sqrt(stress / rw),
    dragCoefficient: cd,
    method: WIND_STRESS_LARGE_POND_1981.id,
    warnings,
  };
}

export const WEDDERBURN_NUMBER: MethodInfo = {
  id: 'wedderburn',
  title: 'Wedderburn number',
  source:
    'Thompson, R.O.R.Y., Imberger, J. (1980). Response of a numerical model of a stratified lake to wind stress. Proc. 2nd Int. ' +
    'Symp. Stratified Flows, Trondheim, 562–570 (W = g′h²/(u*²L); W < 1: the interface reaches the surface at the upwind end); ' +
    'Imberger, J., Patterson, J.C. (1990). Physical limnology. Adv. Appl. Mech. 27, 303–475.',
  equation: 'W = g′ h1² / (u*² L)',
  validity: {},
};

/**
 * Wedderburn number W = g′h1²/(u*²L): the ratio of the baroclinic restoring force to the wind stress over the basin.
 * @param gPrime [m/s2]; @param upperThickness [m] h1; @param shearVelocity [m/s] u*; @param basinLength [m] fetch L
 * @returns W [1]
 * @source Thompson & Imberger (1980); Imberger & Patterson (1990)
 * @validity two-layer idealisation, steady wind over a time of order a quarter seiche period
 */
export function wedderburnNumber(
  gPrime: number,
  upperThickness: number,
  shearVelocity: number,
  basinLength: number,
): Scalar {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 20 });
  const h = requireInRange('upper_thickness', upperThickness, 'm', { ...positive, max: 11000 });
  const u = requireInRange('shear_velocity', shearVelocity, 'm/s', { ...positive, max: 1 });
  const L = requireInRange('basin_length', basinLength, 'm', LENGTH);
  return scalar(WEDDERBURN_NUMBER, (g * h * h) / (u * u * L), '1', {});
}

/**
 * Plain-language upwelling risk from the Wedderburn number. W < 1 is the published threshold (Thompson & Imberger 1980):
 * the interface reaches the surface at the upwind shore. The steady tilt lifts the interface at the upwind end by
 * about h/(2W), up to h/W while the tilt overshoots after a sudden wind (Heaps, N.S., Ramsbottom, A.E. (1966).
 * Phil. Trans. R. Soc. A 259, 391–430). The bound W = 10 between "moderate" and "low" is common practice, no source.
 */
export function upwellingRiskStatement(wedderburn: number, upperThickness: number): string {
  const W = requireInRange('wedderburn', wedderburn, '1', positive);
  const lift = Math.min(upperThickness, upperThickness / W);
  const liftText = qty(lift, 'm', 2);
  if (W < 1)
    return `High upwelling risk (W = ${W.toPrecision(2)} < 1): a steady wind of this strength can tilt the thermocline up to the surface at the upwind shore, bringing cold, possibly low-oxygen lower-layer water to shallow intakes there; the downwind end deepens.`;
  if (W < 10)
    return `Moderate risk (W = ${W.toPrecision(2)}): the thermocline tilts strongly; near the upwind shore it may rise by up to about ${liftText}, so lower-layer water can reach intakes close above the thermocline, but it is not expected at the surface.`;
  return `Low risk (W = ${W.toPrecision(2)} ≥ 10): the thermocline tilts only slightly (about ${liftText} or less at the upwind shore); wind mixing stays in the upper layer.`;
}

export const LAKE_NUMBER: MethodInfo = {
  id: 'lake-number',
  title: 'Lake number',
  source:
    'Imberger, J., Patterson, J.C. (1990). Physical limnology. Adv. Appl. Mech. 27, 303–475 (L_N = g S_t (1 − z_T/z_m) / ' +
    '(ρ0 u*² A0^{3/2} (1 − z_g/z_m)), heights above the bottom); Schmidt stability after Idso, S.B. (1973). On the concept of lake ' +
    'stability. Limnol. Oceanogr. 18, 681–683.',
  equation: 'L_N = g S_t (1 − z_T/z_m) / (ρ0 u*² A0^{3/2} (1 − z_g/z_m)), S_t = ∫ (z_g − z) A(z) ρ(z) dz',
  validity: {},
};

/** Area of horizontal sections (hypsographic curve): area [m2] at depth [m], depth increasing from 0. */
export interface Hypsography {
  depth: readonly number[];
  area: readonly number[];
}

export interface LakeNumberResult {
  value: number;
  /** Schmidt stability S_t·g/A0 [J/m2] (Idso 1973) */
  schmidtStability: number;
  /** height of the centre of volume above the bottom z_g [m] */
  centreOfVolumeHeight: number;
  method: string;
  warnings: Warning[];
}

/**
 * Lake number from a density profile, the hypsographic curve and the wind friction velocity. A measured `Profile`
 * fits `densityColumn` directly (its depth and potential density); `thermoclineDepth(profile).value` gives z_T.
 * Integrals by the trapezoidal rule on `cells` uniform cells; density and area linear between samples.
 * @param densityColumn depths [m] and densities [kg/m3]; @param hypsography areas [m2] at depths [m] (first at 0 m)
 * @param shearVelocity [m/s] u*; @param thermoclineDepth [m] centre of the metalimnion below the surface
 * @param rho0 [kg/m3] reference (hypolimnion) density; default the mean density below the thermocline
 * @returns L_N [1] (and the Schmidt stability)
 * @source Imberger & Patterson (1990); Idso (1973)
 * @validity L_N < 1: strong wind-driven tilting and upwelling of hypolimnetic water; L_N ≫ 1: stable
 */
export function lakeNumberImbergerPatterson1990(
  densityColumn: { depth: readonly number[]; density: readonly number[] },
  hypsography: Hypsography,
  shearVelocity: number,
  thermoclineDepth: number,
  rho0?: number,
  cells = 2000,
): LakeNumberResult {
  const u = requireInRange('shear_velocity', shearVelocity, 'm/s', { ...positive, max: 1 });
  const { depth: hd, area } = hypsography;
  if (hd.length < 2 || hd.length !== area.length)
    throw new InputError(
      'hypsography',
      hd.length,
      '',
      '≥ 2 depth–area pairs',
      'the hypsographic curve needs at least two depth–area pairs of equal length',
    );
  hd.forEach((d, i) => {
    requireInRange(`hypsography depth[${i}]`, d, 'm', {
      min: i === 0 ? 0 : hd[i - 1],
      minExclusive: i > 0,
      max: i === 0 ? 0 : 11000,
    });
    requireInRange(`hypsography area[${i}]`, area[i], 'm2', { min: 0, max: 1e12 });
  });
  if (!(area[0] > 0))
    throw new InputError('hypsography area[0]', area[0], 'm2', '> 0', 'the surface area must be positive');
  const zm = hd[hd.length - 1];
  const zT =
    zm -
    requireInRange('thermocline_depth', thermoclineDepth, 'm', {
      min: 0,
      max: zm,
      minExclusive: true,
      maxExclusive: true,
    });
  if (densityColumn.depth.length < 2 || densityColumn.depth.length !== densityColumn.density.length)
    throw new InputError('density', densityColumn.density.length, '', 'one density per depth');
  densityColumn.density.forEach((r, i) => requireInRange(`density[${i}]`, r, 'kg/m3', { min: 500, max: 3000 }));
  const dz = zm / cells;
  let vol = 0,
    mom = 0;
  const zs: number[] = [],
    as: number[] = [],
    rs: number[] = [];
  for (let j = 0; j <= cells; j++) {
    const z = j * dz; // height above the bottom
    zs.push(z);
    as.push(interpolateAt(hd, area, zm - z));
    rs.push(interpolateAt(densityColumn.depth, densityColumn.density, zm - z));
    const w = j === 0 || j === cells ? dz / 2 : dz;
    vol += w * as[j];
    mom += w * as[j] * z;
  }
  const zg = mom / vol;
  let st = 0,
    hypo = 0,
    hypoVol = 0;
  for (let j = 0; j <= cells; j++) {
    const w = j === 0 || j === cells ? dz / 2 : dz;
    st += w * (zg - zs[j]) * as[j] * rs[j];
    if (zs[j] <= zT) {
      hypo += w * as[j] * rs[j];
      hypoVol += w * as[j];
    }
  }
  const r0 = rho0 === undefined ? hypo / hypoVol : requireInRange('rho0', rho0, 'kg/m3', { min: 500, max: 3000 });
  const A0 = area[0];
  const value = (GRAVITY * st * (1 - zT / zm)) / (r0 * u * u * Math.pow(A0, 1.5) * (1 - zg / zm));
  const warnings =
    st <= 0
      ? [
          caution(
            'no-schmidt-stability',
            'The Schmidt stability is not positive: the column is mixed or unstable, and the Lake number has no meaning.',
          ),
        ]
      : [];
  return { value, schmidtStability: (GRAVITY * st) / A0, centreOfVolumeHeight: zg, method: LAKE_NUMBER.id, warnings };
}
