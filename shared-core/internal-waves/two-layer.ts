import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { scalar, validityWarnings, type MethodInfo, type Scalar } from '../core/method';
import { qty } from '../core/quantity-text';
import { caution, outsideValidity, type Warning } from '../core/warning';

/**
 * Two-layer interfacial waves: layer 1 on top (ρ1, h1), layer 2 below (ρ2 > ρ1, h2), flat bottom.
 * Every relation here reduces to the long-wave forms as k → 0 (checked in the tests).
 */

const DENSITY = { min: 500, max: 3000 };
const THICKNESS = { min: 1e-3, max: 11000 };

export interface TwoLayer {
  rhoUpper: number;
  rhoLower: number;
  upperThickness: number;
  lowerThickness: number;
}

/** Validates a two-layer state: densities 500 … 3000 kg/m³, ρ2 > ρ1, thicknesses > 0. */
export function checkTwoLayer(s: TwoLayer): TwoLayer {
  const r1 = requireInRange('rho_upper', s.rhoUpper, 'kg/m3', DENSITY);
  const r2 = requireInRange('rho_lower', s.rhoLower, 'kg/m3', { min: r1, minExclusive: true, max: DENSITY.max });
  return {
    rhoUpper: r1,
    rhoLower: r2,
    upperThickness: requireInRange('upper_thickness', s.upperThickness, 'm', THICKNESS),
    lowerThickness: requireInRange('lower_thickness', s.lowerThickness, 'm', THICKNESS),
  };
}

/** Warning when Δρ/ρ2 is large enough that Boussinesq forms lose accuracy. */
function boussinesqWarnings(s: TwoLayer): Warning[] {
  const r = (s.rhoLower - s.rhoUpper) / s.rhoLower;
  return r > 0.1
    ? [
        outsideValidity(
          'non-boussinesq',
          `Δρ/ρ = ${r.toFixed(3)} exceeds 0.1: use the full density-ratio forms, not the Boussinesq one.`,
        ),
      ]
    : [];
}

export const INTERFACIAL_CELERITY_BOUSSINESQ: MethodInfo = {
  id: 'interfacial-celerity-boussinesq',
  title: 'Long interfacial wave speed, two layers, Boussinesq, rigid lid',
  source:
    'Gill, A.E. (1982). Atmosphere–Ocean Dynamics. Academic Press, §6.3 (two-layer long waves, c² = g′h1h2/(h1 + h2)); ' +
    'Turner, J.S. (1973). Buoyancy Effects in Fluids. Cambridge Univ. Press, §2.1.',
  equation: 'c0 = √(g′ h1 h2 / (h1 + h2)), g′ = g (ρ2 − ρ1)/ρ2',
  validity: {},
};

/**
 * Long-wave interfacial speed, Boussinesq with a rigid lid: c0 = √(g′h1h2/(h1+h2)).
 * @param gPrime [m/s2] reduced gravity; @param h1 [m] upper thickness; @param h2 [m] lower thickness
 * @returns c0 [m/s]
 * @source Gill (1982) §6.3; Turner (1973) §2.1
 * @validity Δρ/ρ ≪ 1, wavelength ≫ h1, h2, small amplitude
 */
export function interfacialCelerityBoussinesq(gPrime: number, h1: number, h2: number): Scalar {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: 20 });
  const a = requireInRange('upper_thickness', h1, 'm', THICKNESS);
  const b = requireInRange('lower_thickness', h2, 'm', THICKNESS);
  return scalar(INTERFACIAL_CELERITY_BOUSSINESQ, Math.sqrt((g * a * b) / (a + b)), 'm/s', {});
}

export const INTERFACIAL_DISPERSION_RIGID_LID: MethodInfo = {
  id: 'interfacial-dispersion-rigid-lid',
  title: 'Interfacial wave dispersion, two layers of any density ratio, rigid lid',
  source:
    'Lamb, H. (1932). Hydrodynamics, 6th ed. Cambridge Univ. Press, §231; Turner, J.S. (1973). Buoyancy Effects in Fluids, §2.1 ' +
    '(ω² = gk(ρ2 − ρ1)/(ρ1 coth kh1 + ρ2 coth kh2)).',
  equation: 'c² = (g/k)(ρ2 − ρ1)/(ρ1 coth kh1 + ρ2 coth kh2); k → 0: c² = g(ρ2 − ρ1)h1h2/(ρ1h2 + ρ2h1)',
  validity: {},
};

/** coth x, with the long-wave form 1/x + x/3 for tiny x to keep precision. */
function coth(x: number): number {
  return x < 1e-4 ? 1 / x + x / 3 : x > 20 ? 1 : 1 / Math.tanh(x);
}

/** k from a wavelength [m]; undefined (omitted) means the long-wave limit k → 0. */
function wavenumber(wavelength: number | undefined): number {
  if (wavelength === undefined) return 0;
  return (2 * Math.PI) / requireInRange('wavelength', wavelength, 'm', { ...positive, max: 1e8 });
}

/**
 * Interfacial phase speed with a rigid lid, full density ratio: c² = (g/k)(ρ2 − ρ1)/(ρ1 coth kh1 + ρ2 coth kh2).
 * @param wavelength [m]; omitted → long-wave limit c² = g(ρ2 − ρ1)h1h2/(ρ1h2 + ρ2h1)
 * @returns c [m/s]
 * @source Lamb (1932) §231; Turner (1973) §2.1
 * @validity linear (small amplitude), inviscid, no shear between the layers
 */
export function interfacialCelerityRigidLid(state: TwoLayer, wavelength?: number): Scalar {
  return scalar(
    INTERFACIAL_DISPERSION_RIGID_LID,
    rigidLidCelerity(checkTwoLayer(state), wavenumber(wavelength)),
    'm/s',
    {},
  );
}

/** The rigid-lid phase speed [m/s] of a checked two-layer state at wavenumber k [1/m] (0: long waves). */
function rigidLidCelerity(s: TwoLayer, k: number): number {
  const dr = s.rhoLower - s.rhoUpper;
  const c2 =
    k === 0
      ? (GRAVITY * dr * s.upperThickness * s.lowerThickness) /
        (s.rhoUpper * s.lowerThickness + s.rhoLower * s.upperThickness)
      : (GRAVITY * dr) / (k * (s.rhoUpper * coth(k * s.upperThickness) + s.rhoLower * coth(k * s.lowerThickness)));
  return Math.sqrt(c2);
}

export const INTERFACIAL_DISPERSION_FREE_SURFACE: MethodInfo = {
  id: 'interfacial-dispersion-free-surface',
  title: 'Two-layer dispersion with a free surface: surface and interfacial roots',
  source:
    'Lamb, H. (1932). Hydrodynamics, 6th ed. Cambridge Univ. Press, §231: ω⁴(ρ2 coth kh1 coth kh2 + ρ1) − ω²ρ2gk(coth kh1 + coth kh2) ' +
    '+ (ρ2 − ρ1)g²k² = 0; long-wave limit c⁴ − g(h1 + h2)c² + (1 − ρ1/ρ2)g²h1h2 = 0 (Gill 1982, §6.2).',
  equation:
    'ω² = [B ∓ √(B² − 4AC)]/(2A), A = ρ2 coth kh1 coth kh2 + ρ1, B = ρ2gk(coth kh1 + coth kh2), C = (ρ2 − ρ1)g²k²; c = ω/k',
  validity: {},
};

/** Both roots of the free-surface two-layer dispersion relation. */
export interface FreeSurfaceRoots {
  /** interfacial (internal, slow) root [m/s] */
  interfacial: number;
  /** surface (barotropic, fast) root [m/s] */
  surface: number;
  method: string;
  warnings: Warning[];
}

/**
 * Phase speeds of both free-surface modes from Lamb's quartic, written for c² (the quadratic in ω² divided by k²).
 * The slow root uses 2C/(B + √D) so that it keeps full precision when Δρ/ρ is tiny.
 * @param wavelength [m]; omitted → long-wave limit
 * @returns interfacial and surface phase speeds [m/s]
 * @source Lamb (1932) §231; Gill (1982) §6.2 (long waves)
 * @validity linear, inviscid, no shear
 */
export function twoLayerFreeSurfaceCelerities(state: TwoLayer, wavelength?: number): FreeSurfaceRoots {
  return {
    ...freeSurfaceRoots(checkTwoLayer(state), wavenumber(wavelength)),
    method: INTERFACIAL_DISPERSION_FREE_SURFACE.id,
    warnings: [],
  };
}

/** Both free-surface phase speeds [m/s] of a checked two-layer state at wavenumber k [1/m] (0: long waves). */
function freeSurfaceRoots(s: TwoLayer, k: number): { interfacial: number; surface: number } {
  const { rhoUpper: r1, rhoLower: r2, upperThickness: h1, lowerThickness: h2 } = s;
  // In c² = ω²/k²: A c⁴ − (B/k) c² + C/k² = 0 with coth kh ≈ 1/(kh) folded in for k → 0 (all terms × k²).
  let A: number, B: number, C: number;
  if (k === 0 || k * Math.max(h1, h2) < 1e-6) {
    A = r2 / (h1 * h2);
    B = (r2 * GRAVITY * (h1 + h2)) / (h1 * h2);
    C = (r2 - r1) * GRAVITY * GRAVITY;
  } else {
    const c1 = coth(k * h1),
      c2 = coth(k * h2);
    A = k * k * (r2 * c1 * c2 + r1);
    B = r2 * GRAVITY * k * (c1 + c2);
    C = (r2 - r1) * GRAVITY * GRAVITY;
  }
  const root = Math.sqrt(Math.max(0, B * B - 4 * A * C));
  return { interfacial: Math.sqrt((2 * C) / (B + root)), surface: Math.sqrt((B + root) / (2 * A)) };
}

/** One point of a dispersion curve. */
export interface DispersionPoint {
  /** wavenumber k [1/m] */
  k: number;
  /** wavelength 2π/k [m] */
  wavelength: number;
  /** interfacial phase speed, rigid lid [m/s] */
  rigidLid: number;
  /** interfacial root with a free surface [m/s] */
  interfacial: number;
  /** surface root with a free surface [m/s] */
  surface: number;
}

/**
 * Dispersion curve c(k) for charts: `points` wavenumbers spaced logarithmically from kMin to kMax [1/m]
 * (default 0.01/H … 10/H, H = h1 + h2), each with the rigid-lid and both free-surface phase speeds [m/s].
 */
export function dispersionCurve(state: TwoLayer, points = 60, kMin?: number, kMax?: number): DispersionPoint[] {
  const s = checkTwoLayer(state);
  const H = s.upperThickness + s.lowerThickness;
  const lo = requireInRange('k_min', kMin ?? 0.01 / H, '1/m', { ...positive, max: 1e6 });
  const hi = requireInRange('k_max', kMax ?? 10 / H, '1/m', { min: lo, minExclusive: true, max: 1e7 });
  const n = Math.round(requireInRange('points', points, '1', { min: 2, max: 10000 }));
  const curve: DispersionPoint[] = [];
  for (let i = 0; i < n; i++) {
    const k = lo * Math.pow(hi / lo, i / (n - 1));
    const wavelength = (2 * Math.PI) / k;
    // the state is checked once; each point takes k as the single methods do (2π over the wavelength)
    const kw = (2 * Math.PI) / wavelength;
    curve.push({ k, wavelength, rigidLid: rigidLidCelerity(s, kw), ...freeSurfaceRoots(s, kw) });
  }
  return curve;
}

export const SOLITARY_WAVE_KDV: MethodInfo = {
  id: 'solitary-wave-kdv',
  title: 'Interfacial solitary wave: first-order (KdV) speed, polarity and limiting amplitude',
  source:
    'Helfrich, K.R., Melville, W.K. (2006). Long nonlinear internal waves. Annu. Rev. Fluid Mech. 38, 395–425, §2 ' +
    '(KdV, two-layer α = 3c0(h1 − h2)/(2h1h2), c = c0 + αa/3; polarity of a follows the sign of α); limiting amplitude: ' +
    'the conjugate state with the interface at mid-depth, |a| ≤ |h2 − h1|/2 (Boussinesq; Amick, C.J., Turner, R.E.L. (1986). ' +
    'Trans. Amer. Math. Soc. 298, 431–484; Lamb, K.G., Wan, B. (1998). Phys. Fluids 10, 2061–2079).',
  equation:
    'c = c0 (1 + |a| |h2 − h1| / (2 h1 h2)); depression when h1 < h2, elevation when h1 > h2; |a| ≤ |h2 − h1|/2',
  validity: {
    relative_amplitude: {
      max: 0.5,
      unit: '1',
      note: '|a|/a_max; first-order KdV overestimates the speed of large waves',
    },
  },
};

export type Polarity = 'depression' | 'elevation' | 'none';

export interface SolitaryWave {
  /** speed including the first-order amplitude correction [m/s] */
  celerity: number;
  /** linear long-wave speed c0 used (Boussinesq, rigid lid) [m/s] */
  linearCelerity: number;
  polarity: Polarity;
  /** largest amplitude of a solitary wave of this polarity [m] */
  limitingAmplitude: number;
  /** KdV half-width λ = √(12β/(α a)), β = c0 h1 h2/6 [m]; Infinity for a = 0 */
  halfWidth: number;
  method: string;
  warnings: Warning[];
}

/**
 * First-order KdV interfacial solitary wave (Boussinesq, rigid lid). The amplitude is a magnitude; its sign
 * follows the polarity rule (a wave of depression when the upper layer is thinner).
 * @param amplitude [m] magnitude of the largest interface displacement
 * @returns speed [m/s], polarity, limiting amplitude [m] and half-width [m]
 * @source Helfrich & Melville (2006) §2; Amick & Turner (1986); Lamb & Wan (1998)
 * @validity |a| small against |h2 − h1|/2; Δρ/ρ ≪ 1
 */
export function solitaryWaveKdv(state: TwoLayer, amplitude: number): SolitaryWave {
  const s = checkTwoLayer(state);
  const a = requireInRange('amplitude', amplitude, 'm', { min: 0, max: s.upperThickness + s.lowerThickness });
  const { upperThickness: h1, lowerThickness: h2 } = s;
  const gPrime = (GRAVITY * (s.rhoLower - s.rhoUpper)) / s.rhoLower;
  const c0 = Math.sqrt((gPrime * h1 * h2) / (h1 + h2));
  const alpha = (1.5 * c0 * (h1 - h2)) / (h1 * h2);
  const limit = Math.abs(h2 - h1) / 2;
  const equal = Math.abs(h1 - h2) <= 1e-9 * (h1 + h2);
  const polarity: Polarity = equal ? 'none' : h1 < h2 ? 'depression' : 'elevation';
  const warnings = boussinesqWarnings(s);
  if (equal && a > 0)
    warnings.push(
      caution(
        'equal-layers',
        'The layers are equally thick: the quadratic nonlinearity vanishes and the first-order correction is zero; a higher-order (Gardner) theory is needed.',
      ),
    );
  else if (a > limit)
    warnings.push(
      outsideValidity(
        'amplitude-over-limit',
        `The amplitude ${qty(a, 'm', 3)} exceeds the limiting amplitude |h2 − h1|/2 = ${qty(limit, 'm', 3)}: no solitary wave of this size exists; expect a broad, flat-crested wave or a bore.`,
        'amplitude',
      ),
    );
  else if (limit > 0) warnings.push(...validityWarnings(SOLITARY_WAVE_KDV, { relative_amplitude: a / limit }));
  const celerity = c0 + (Math.abs(alpha) * a) / 3;
  const beta = (c0 * h1 * h2) / 6;
  const halfWidth = a > 0 && !equal ? Math.sqrt((12 * beta) / (Math.abs(alpha) * a)) : Infinity;
  return {
    celerity,
    linearCelerity: c0,
    polarity,
    limitingAmplitude: limit,
    halfWidth,
    method: SOLITARY_WAVE_KDV.id,
    warnings,
  };
}

/** Plain-language polarity statement for reports and the CLI. */
export function polarityText(p: Polarity): string {
  if (p === 'depression') return 'depression (the interface dips: upper layer thinner than lower)';
  if (p === 'elevation') return 'elevation (the interface bulges up: lower layer thinner than upper)';
  return 'none (equal layers: no first-order solitary wave)';
}
