import { requireInRange } from '../core/range';
import { caution, note, type Warning } from '../core/warning';
import { scalar, validityWarnings, type MethodInfo, type Scalar } from '../core/method';
import { qty } from '../core/quantity-text';

/** Two-layer hydraulics, Boussinesq, rigid lid unless said otherwise. Layer 1 on top, layer 2 below. */

/** Lower bounds keep products such as g′y³ clear of underflow; smaller values are not physical here. */
const GP = { min: 1e-6, max: 20 };
const DEPTH = { min: 1e-3, max: 11000 };
const SPEED = { min: -100, max: 100 };

export const COMPOSITE_FROUDE: MethodInfo = {
  id: 'composite-froude',
  title: 'Composite Froude number of a two-layer flow',
  source:
    'Armi, L. (1986). The hydraulics of two flowing layers with different densities. J. Fluid Mech. 163, 27–58 ' +
    '(G² = F1² + F2², F_i² = u_i²/(g′h_i); G² = 1 at a hydraulic control); Armi, L., Farmer, D.M. (1986). J. Fluid Mech. 164, 27–51.',
  equation: 'G² = u1²/(g′h1) + u2²/(g′h2)',
  validity: {},
};

/** Composite Froude number and the flow state it implies. */
export interface CompositeFroude {
  /** G [1] */
  value: number;
  f1: number;
  f2: number;
  /** 'subcritical' (G < 1: interfacial waves travel both ways), 'critical' (|G − 1| ≤ 2 %), 'supercritical' */
  state: 'subcritical' | 'critical' | 'supercritical';
  method: string;
  warnings: Warning[];
}

/**
 * Composite Froude number G = √(F1² + F2²).
 * @param u1 [m/s] upper-layer velocity; @param u2 [m/s] lower-layer velocity; @param h1, h2 [m]; @param gPrime [m/s2]
 * @returns G [1] with the layer Froude numbers and the state
 * @source Armi (1986)
 * @validity Boussinesq (Δρ/ρ ≪ 1), hydrostatic, gradually varied, no mixing between the layers
 */
export function compositeFroudeArmi1986(
  u1: number,
  u2: number,
  h1: number,
  h2: number,
  gPrime: number,
): CompositeFroude {
  const a = requireInRange('upper_velocity', u1, 'm/s', SPEED),
    b = requireInRange('lower_velocity', u2, 'm/s', SPEED);
  const t1 = requireInRange('upper_thickness', h1, 'm', DEPTH),
    t2 = requireInRange('lower_thickness', h2, 'm', DEPTH);
  const g = requireInRange('g_prime', gPrime, 'm/s2', GP);
  const f1 = Math.abs(a) / Math.sqrt(g * t1),
    f2 = Math.abs(b) / Math.sqrt(g * t2);
  const G = Math.hypot(f1, f2);
  const state = Math.abs(G - 1) <= 0.02 ? 'critical' : G < 1 ? 'subcritical' : 'supercritical';
  return { value: G, f1, f2, state, method: COMPOSITE_FROUDE.id, warnings: [] };
}

export const SILL_OVERFLOW_CRITICAL: MethodInfo = {
  id: 'sill-overflow-critical',
  title: 'Critical (controlled) overflow of a dense layer over a sill under a deep quiescent upper layer',
  source:
    'Whitehead, J.A., Leetmaa, A., Knox, R.A. (1974). Rotating hydraulics of strait and sill flows. Geophys. Fluid Dyn. 6, 101–125 ' +
    '(non-rotating limit: q = (2/3)^{3/2} √g′ Y^{3/2}, Y the upstream interface height above the crest); ' +
    'critical depth h_c = (q²/g′)^{1/3}: Turner, J.S. (1973). Buoyancy Effects in Fluids, §3.2.',
  equation: 'q = (2/3)^{3/2} √(g′) Y^{3/2} per unit width; at the crest h_c = 2Y/3',
  validity: {},
};

/**
 * Discharge per unit width of the lower layer over a sill crest when the flow there is critical (hydraulic control).
 * @param gPrime [m/s2]; @param interfaceAboveCrest [m] Y, upstream interface height above the crest (upstream velocity small)
 * @returns q [m2/s]
 * @source Whitehead, Leetmaa & Knox (1974); Turner (1973) §3.2
 * @validity deep quiescent upper layer (reduced-gravity shallow-water), no rotation, no friction
 */
export function sillOverflowCritical(gPrime: number, interfaceAboveCrest: number): Scalar {
  const g = requireInRange('g_prime', gPrime, 'm/s2', GP),
    Y = requireInRange('interface_above_crest', interfaceAboveCrest, 'm', DEPTH);
  return scalar(SILL_OVERFLOW_CRITICAL, (2 / 3) ** 1.5 * Math.sqrt(g * Y ** 3), 'm2/s', {});
}

export const INTERNAL_HYDRAULIC_JUMP: MethodInfo = {
  id: 'internal-hydraulic-jump',
  title: 'Internal hydraulic jump of a dense layer under a deep quiescent upper layer',
  source:
    'Yih, C.-S., Guha, C.R. (1955). Hydraulic jump in a fluid system of two layers. Tellus 7, 358–366 (limit of a deep upper layer: ' +
    'y2/y1 = ½(√(1 + 8F1²) − 1), F1² = q²/(g′y1³)); Wilkinson, D.L., Wood, I.R. (1971). A rapidly varied flow phenomenon in a ' +
    'two-layer flow. J. Fluid Mech. 47, 241–256; head loss ΔE = (y2 − y1)³/(4y1y2) in reduced-gravity head.',
  equation: 'y2/y1 = ½(√(1 + 8F1²) − 1); ΔE = (y2 − y1)³/(4 y1 y2)',
  validity: {
    depth_ratio: {
      max: 0.3,
      unit: '1',
      note: 'y2/D; the deep-upper-layer form needs the jump small against the total depth',
    },
  },
};

export interface InternalJump {
  /** conjugate (downstream) layer thickness y2 [m] */
  downstreamThickness: number;
  /** loss of reduced-gravity head, (y2 − y1)³/(4y1y2) [m] */
  headLoss: number;
  /** upstream layer Froude number F1 [1] */
  froude: number;
  method: string;
  warnings: Warning[];
}

/**
 * Conjugate thickness and head loss of an internal jump in a dense bottom layer.
 * @param q [m2/s] discharge per unit width of the layer; @param y1 [m] upstream (supercritical) thickness; @param gPrime [m/s2]
 * @param totalDepth [m] optional total depth D, for the validity warning
 * @returns y2 [m], ΔE [m]
 * @source Yih & Guha (1955); Wilkinson & Wood (1971)
 * @validity F1 > 1, deep quiescent upper layer (y2 ≪ D), no entrainment across the jump
 */
export function internalHydraulicJump(q: number, y1: number, gPrime: number, totalDepth?: number): InternalJump {
  const flux = requireInRange('discharge_per_width', q, 'm2/s', { min: 1e-9, max: 1e4 });
  const y = requireInRange('upstream_thickness', y1, 'm', DEPTH);
  const g = requireInRange('g_prime', gPrime, 'm/s2', GP);
  const F = flux / Math.sqrt(g * y ** 3);
  const warnings: Warning[] = [];
  if (F <= 1)
    warnings.push(
      caution(
        'subcritical-no-jump',
        `F1 = ${F.toPrecision(3)} ≤ 1: the upstream flow is subcritical and no jump forms; the conjugate thickness is shown for reference only.`,
      ),
    );
  const y2 = 0.5 * y * (Math.sqrt(1 + 8 * F * F) - 1);
  if (totalDepth !== undefined) {
    const D = requireInRange('total_depth', totalDepth, 'm', { min: y2, max: 11000 });
    warnings.push(...validityWarnings(INTERNAL_HYDRAULIC_JUMP, { depth_ratio: y2 / D }));
  }
  return {
    downstreamThickness: y2,
    headLoss: (y2 - y) ** 3 / (4 * y * y2),
    froude: F,
    method: INTERNAL_HYDRAULIC_JUMP.id,
    warnings,
  };
}

export const CURTAIN_WALL_WITHDRAWAL: MethodInfo = {
  id: 'curtain-wall-withdrawal',
  title: 'Largest lower-layer discharge under a curtain (skimmer) wall before upper-layer water is drawn',
  source:
    'Reduced-gravity energy (Bernoulli) equation for the withdrawn layer with the interface at the wall lip, deep quiescent upper ' +
    'layer: Craya, A. (1949). Recherches théoriques sur l’écoulement de couches superposées de fluides de densités différentes. ' +
    'La Houille Blanche 4, 44–55; at a = 2Y/3 it equals critical flow q = √(g′a³) (Turner 1973, §3.2). Approach velocity head ' +
    'and contraction under the lip as for a sluice gate: q = C_c a √(2g′Y/(1 + C_c a/Y)), C_c = 0.598–0.611 for a sharp-edged ' +
    'vertical gate, 0.61 recommended (Henderson, F.M. 1966. Open Channel Flow, Macmillan).',
  equation:
    'q_max = C_c a √(2g′(Y − C_c a)) without the approach velocity head, C_c a √(2g′Y/(1 + C_c a/Y)) with it; a the lip height above the bed, Y the upstream interface height (Y > a)',
  validity: {
    contraction: {
      min: 0.59,
      max: 1,
      unit: '1',
      note: 'from 0.598–0.611 for a sharp-edged lip (Henderson 1966) to 1 for a well-rounded one',
    },
  },
  provenance:
    'The contraction range 0.598–0.611 and the recommended 0.61 are as quoted from Henderson (1966) in Ponce, Online Channel ' +
    'calculator notes (San Diego State University); not compared with the printed page.',
};

/** How the skimming limits treat the flow approaching the structure and the contraction under a lip. */
export interface SkimmingOptions {
  /** contraction coefficient C_c of the flow under a curtain-wall lip [1]; default 1 (no contraction) */
  contraction?: number;
  /** include the velocity head q²/(2g′Y²) of the withdrawn layer approaching the structure; default false */
  approachVelocity?: boolean;
}

/** A skimming limit with the discharge the other treatment of the approach flow would give. */
export interface SkimmingLimit extends Scalar {
  /** q_max with the approach velocity head included over q_max without it [1] */
  approachHeadRatio: number;
}

/** The change of the discharge by the approach velocity head above which a neglected head gets a caution. */
export const APPROACH_HEAD_CAUTION = 0.05;

/**
 * Lower-layer discharge per unit width under a curtain wall when the interface has just been drawn down to the lip.
 * Without the approach velocity head, q = C_c a √(2g′(Y − C_c a)); with it (the withdrawn layer Y thick approaching at
 * q/Y), the sluice-gate form q = C_c a √(2g′Y/(1 + C_c a/Y)).
 * @param gPrime [m/s2]; @param lipHeight [m] a, opening below the wall; @param interfaceHeight [m] Y, upstream interface above the bed
 * @param options contraction C_c [1] (default 1) and whether the approach velocity head is included (default not)
 * @returns q_max [m2/s]
 * @source Craya (1949); Turner (1973) §3.2; Henderson (1966) sluice-gate form
 * @validity C_c 0.59–1; deep upper layer; no losses at the lip; laboratory checks of the stratified case: none in this program
 */
export function curtainWallWithdrawalMax(
  gPrime: number,
  lipHeight: number,
  interfaceHeight: number,
  options: SkimmingOptions = {},
): SkimmingLimit {
  const g = requireInRange('g_prime', gPrime, 'm/s2', GP);
  const Y = requireInRange('interface_height', interfaceHeight, 'm', DEPTH);
  const a = requireInRange('lip_height', lipHeight, 'm', { min: 1e-3, max: Y, maxExclusive: true });
  const cc = requireInRange('contraction', options.contraction ?? 1, '1', { min: 0.5, max: 1 });
  const warnings: Warning[] =
    a > (2 * Y) / 3
      ? [
          note(
            'subcritical-lip',
            'The lip is above the critical depth 2Y/3: the flow under the wall is subcritical and draws the interface down gently.',
            'opening',
          ),
        ]
      : [];
  const ca = cc * a;
  const without = ca * Math.sqrt(2 * g * (Y - ca)),
    withHead = ca * Math.sqrt((2 * g * Y) / (1 + ca / Y));
  const ratio = withHead / without;
  if (!options.approachVelocity && ratio - 1 > APPROACH_HEAD_CAUTION)
    warnings.push(approachHeadCaution(ratio, Y, 'interface_distance'));
  const q = options.approachVelocity ? withHead : without;
  return { ...scalar(CURTAIN_WALL_WITHDRAWAL, q, 'm2/s', { contraction: cc }, warnings), approachHeadRatio: ratio };
}

/** The caution when a neglected approach velocity head changes the limit by more than APPROACH_HEAD_CAUTION. */
export function approachHeadCaution(ratio: number, interfaceDistance: number, input: string): Warning {
  return caution(
    'approach-head-neglected',
    `With the interface only ${qty(interfaceDistance, 'm')} from the surface or bed, the withdrawn layer approaches fast: its velocity head raises the limit to ${ratio.toPrecision(3)} times this value. Include it unless the approach flow is much wider or deeper than the opening.`,
    input,
  );
}
