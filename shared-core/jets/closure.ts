import type { MethodInfo } from '../core/method';

/**
 * The entrainment closure of the round buoyant-jet model, in TOP-HAT variables (uniform velocity u,
 * density and concentration over a circle of radius b). Gaussian coefficients from the literature are
 * converted with α_top-hat = √2 α_Gauss (b_top-hat = √2 b_Gauss, same volume and momentum fluxes).
 */
export const ENTRAINMENT = {
  /** Gaussian jet coefficient 0.0535 ± 0.0025 (Fischer et al. 1979, Table 9.1 — see BUOYANT_JET.provenance) → top-hat */
  alphaJet: Math.SQRT2 * 0.0535,
  /** Gaussian plume coefficient 0.0833 ± 0.0042 (Fischer et al. 1979, Table 9.1 — see BUOYANT_JET.provenance) → top-hat */
  alphaPlume: Math.SQRT2 * 0.0833,
  /** top-hat crossflow ("forced") entrainment coefficient (Hoult, Fay & Forney 1969 — see BUOYANT_JET.provenance) */
  betaCrossflow: 0.6,
  /** concentration-to-velocity width ratio λ of Gaussian profiles (Fischer et al. 1979 §9.1 — see BUOYANT_JET.provenance) */
  lambda: 1.19,
} as const;

/** Top-hat local Richardson number of a pure plume, Ri_p = 8α_p/5 (MTT 1956 similarity solution). */
export const RICHARDSON_PLUME = (8 * ENTRAINMENT.alphaPlume) / 5;

/**
 * Entrainment of a plane (line) jet or plume per unit length, in TOP-HAT variables (half-width b, q = 2bu);
 * Gaussian coefficients converted with the same √2 (b_top-hat = √(π/2) b_Gauss, u_top-hat = u_max/√2).
 */
export const PLANE_ENTRAINMENT = {
  /** Gaussian plane-jet coefficient 0.052 (Fischer et al. 1979, Table 9.1 — see BUOYANT_JET.provenance) → top-hat */
  alphaJet: Math.SQRT2 * 0.052,
  /** Gaussian plane-plume coefficient 0.11 (consensus value of Richardson & Hunt 2022, J. Fluid Mech. 934, A11, 0.11 ± 15 %;
   *  taken as the Gaussian-profile value, which also follows from the plane-plume spreading rate of Fischer et al. 1979 — see BUOYANT_JET.provenance) → top-hat */
  alphaPlume: Math.SQRT2 * 0.11,
} as const;

/** Top-hat local Richardson number of a pure plane plume, Ri_p = α_p (similarity solution u³ = f/(2α)). */
export const RICHARDSON_PLANE_PLUME = PLANE_ENTRAINMENT.alphaPlume;

/** Jet geometry: a round jet from one port, or a plane (line) plume per unit length of a diffuser after its plumes merge. */
export type JetGeometry = 'round' | 'plane';

/** Centreline dilution = flux-average dilution × λ²/(1+λ²) for round Gaussian profiles of width ratio λ. */
export const CENTRELINE_TO_AVERAGE = ENTRAINMENT.lambda ** 2 / (1 + ENTRAINMENT.lambda ** 2);

/** concentration-to-velocity width ratio λ of a plane plume's Gaussian profiles (Fischer et al. 1979, Table 9.1 — see BUOYANT_JET.provenance) */
export const PLANE_LAMBDA = 1.24;

/**
 * Centreline dilution = flux-average dilution × λ/√(1+λ²) for plane Gaussian profiles (one transverse direction): the ratio
 * of a line plume, used once neighbouring round plumes have merged (Rouse, Yih & Humphreys 1952; Fischer et al. 1979 §9.3).
 */
export const PLANE_CENTRELINE_TO_AVERAGE = PLANE_LAMBDA / Math.sqrt(1 + PLANE_LAMBDA ** 2);

/** The centreline/average dilution ratio of a stretch of path by its geometry. */
export const centrelineToAverage = (geometry: JetGeometry): number =>
  geometry === 'plane' ? PLANE_CENTRELINE_TO_AVERAGE : CENTRELINE_TO_AVERAGE;

export const BUOYANT_JET: MethodInfo = {
  id: 'buoyant-jet',
  title: 'Round buoyant jet in a stratified flowing ambient (top-hat integral model)',
  source:
    'Integral model: Morton, B.R., Taylor, G.I., Turner, J.S. (1956). Turbulent gravitational convection from maintained and ' +
    'instantaneous sources. Proc. R. Soc. Lond. A 234, 1–23 (entrainment hypothesis); variable entrainment between jet and plume ' +
    'values after Priestley, C.H.B., Ball, F.K. (1955). Q. J. R. Meteorol. Soc. 81, 144–157, with coefficients α_jet = 0.0535, ' +
    'α_plume = 0.0833 (Gaussian) of Fischer, H.B. et al. (1979). Mixing in Inland and Coastal Waters, Table 9.1, converted to ' +
    'top-hat by √2; crossflow entrainment β = 0.6 of Hoult, D.P., Fay, J.A., Forney, L.J. (1969). A theory of plume rise compared ' +
    'with field observations. J. Air Pollut. Control Assoc. 19, 585–590; centreline/average dilution from Gaussian profiles with ' +
    'λ = 1.19 (Fischer et al. 1979 §9.1).',
  equation:
    'dQ/ds = E = 2πb[α(Ri)|u − u_a·e_s| + β|u_a × e_s|], d(Q u)/ds = E u_a + πb²g′ ẑ, d(Q Δρ_ref)/ds = E(ρ_a(z) − ρ_ref), ' +
    'α = α_j + (α_p − α_j)·clamp(Ri/Ri_p, 0, 1), Ri = g′ b e_z/(u − u_a·e_s)², Ri_p = 8α_p/5; S_avg = Q/Q₀, S_c = S_avg·λ²/(1+λ²)',
  validity: {
    froude: { min: 1, unit: '1', note: 'port densimetric Froude number; below 1 the port may not run full' },
    angle: { min: -90, max: 90, unit: 'deg' },
  },
  provenance:
    'The entrainment coefficients (Gaussian 0.0535 jet, 0.0833 plume, 0.052 plane jet; λ = 1.19 round, 1.24 plane; ' +
    'crossflow 0.6) are as commonly quoted from Fischer et al. (1979) Table 9.1 and Hoult, Fay & Forney (1969); ' +
    'they were not compared with the original publications.',
};

/** State vector of the model, in SI. */
export interface JetState {
  x: number;
  y: number;
  z: number;
  /** volume flux [m3/s] */
  Q: number;
  /** momentum flux vector Q·u [m4/s2] */
  Mx: number;
  My: number;
  Mz: number;
  /** Q(ρ_jet − ρ_ref) [kg/s] */
  R: number;
  /** Q(T_jet − T_ref) [m3 K/s] */
  Th: number;
}

/**
 * Allowed exit velocity of a port [m/s]: below 1 µm/s there is no discharge to follow (and the integral
 * model's fluxes underflow); above 100 m/s no outfall runs.
 */
export const EXIT_VELOCITY = { min: 1e-6, max: 100 } as const;

/**
 * Allowed port diameter [m]: below 0.1 mm no outfall or laboratory jet runs (and the fluxes and length scales
 * underflow to zero); above 20 m no port is built. Common practice, no source.
 */
export const PORT_DIAMETER = { min: 1e-4, max: 20 } as const;
