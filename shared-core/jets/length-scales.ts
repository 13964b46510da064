import { qty } from '../core/quantity-text';
import { requireInRange, nonNegative } from '../core/range';
import { validityWarnings, type MethodInfo } from '../core/method';
import type { Warning } from '../core/warning';
import { EXIT_VELOCITY, PORT_DIAMETER } from './closure';

export const JET_LENGTH_SCALES: MethodInfo = {
  id: 'jet-length-scales',
  title: 'Buoyant-jet fluxes and length scales',
  source:
    'Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters. ' +
    'Academic Press, §9.1–9.3 (fluxes Q, M, B; l_Q = Q/M^1/2, l_M = M^3/4/B^1/2; l_m = M^1/2/u_a, l_b = B/u_a^3). ' +
    'Wright, S.J. (1977). Mean behavior of buoyant jets in a crossflow. J. Hydraul. Div. ASCE 103(HY5), 499–513 (crossflow scales). ' +
    'Morton, B.R., Taylor, G.I., Turner, J.S. (1956). Proc. R. Soc. Lond. A 234, 1–23; Turner, J.S. (1973). Buoyancy Effects in Fluids, §6.1 ' +
    '(stratification scales (M/N²)^1/4 and (B/N³)^1/4).',
  equation:
    'Q = πD²U/4, M = UQ, B = g′Q, Fr = U/√(|g′|D); l_Q = Q/√M, l_M = M^¾/|B|^½, l_m = √M/u_a, l_b = |B|/u_a³, ' +
    'l_MN = (M/N²)^¼, l_BN = (|B|/N³)^¼',
  validity: {
    froude: { min: 1, unit: '1', note: 'below Fr ≈ 1 ambient water may intrude into the port' },
  },
};

export interface JetDischarge {
  /** port diameter [m] */
  diameter: number;
  /** mean exit velocity [m/s] */
  velocity: number;
  /** signed reduced gravity g(ρ_a − ρ_e)/ρ_a [m/s2]: positive for a rising (lighter) effluent */
  gPrime: number;
  /** ambient current speed [m/s] */
  current?: number;
  /** ambient buoyancy frequency [1/s] */
  buoyancyFrequency?: number;
}

export interface JetLengthScales {
  /** port densimetric Froude number U/√(|g′|D) [1] (Infinity for a neutrally buoyant jet) */
  froude: number;
  /** volume flux [m3/s], kinematic momentum flux [m4/s2], signed buoyancy flux [m4/s3] */
  volumeFlux: number;
  momentumFlux: number;
  buoyancyFlux: number;
  /** l_Q: distance over which the port geometry matters [m] */
  lQ: number;
  /** l_M: jet-to-plume transition distance [m] (Infinity when B = 0) */
  lM: number;
  /** l_m: distance over which the jet holds its own against the current [m] (Infinity when u_a = 0) */
  lCrossflowMomentum: number;
  /** l_b: distance over which buoyancy holds its own against the current [m] (Infinity when u_a = 0) */
  lCrossflowBuoyancy: number;
  /** (M/N²)^1/4 [m] (Infinity when N = 0) */
  lStratMomentum: number;
  /** (B/N³)^1/4 [m] (Infinity when N = 0) */
  lStratBuoyancy: number;
  /** plain-language statements of which process dominates where */
  regime: string[];
  warnings: Warning[];
}

/** a length scale in a sentence, to two figures, shown in the reader's units */
const about = (x: number) => qty(x, 'm', 2);

/**
 * Fluxes and length scales of a round buoyant jet (Fischer et al. 1979 §9.1–9.3).
 * Q = πD²U/4 [m3/s], M = UQ [m4/s2], B = g′Q [m4/s3];
 * l_Q = Q/√M, l_M = M^¾/|B|^½, l_m = √M/u_a, l_b = |B|/u_a³, (M/N²)^¼, (|B|/N³)^¼ [m].
 * @param d.diameter [m] @param d.velocity [m/s] @param d.gPrime [m/s2] signed, positive when rising
 * @param d.current [m/s] @param d.buoyancyFrequency [1/s]
 * @returns the fluxes, the scales (Infinity where a process is absent) and the regime in words
 * @source Fischer et al. (1979) §9.1–9.3; Wright (1977); Morton, Taylor & Turner (1956)
 * @validity Fr ≥ 1 (fully turbulent, port running full)
 */
export function jetLengthScales(d: JetDischarge): JetLengthScales {
  const D = requireInRange('diameter', d.diameter, 'm', PORT_DIAMETER);
  const U = requireInRange('velocity', d.velocity, 'm/s', EXIT_VELOCITY);
  const g = requireInRange('g_prime', d.gPrime, 'm/s2', { min: -5, max: 5 });
  const ua = requireInRange('current', d.current ?? 0, 'm/s', { ...nonNegative, max: 10 });
  const N = requireInRange('buoyancy_frequency', d.buoyancyFrequency ?? 0, '1/s', { ...nonNegative, max: 2 });
  const Q = (Math.PI * D * D * U) / 4,
    M = U * Q,
    B = g * Q,
    absB = Math.abs(B);
  const froude = g === 0 ? Infinity : U / Math.sqrt(Math.abs(g) * D);
  const lQ = Q / Math.sqrt(M);
  const lM = absB > 0 ? M ** 0.75 / Math.sqrt(absB) : Infinity;
  const lm = ua > 0 ? Math.sqrt(M) / ua : Infinity;
  const lb = ua > 0 ? absB / ua ** 3 : Infinity;
  const lMN = N > 0 ? (M / (N * N)) ** 0.25 : Infinity;
  const lBN = N > 0 ? (absB / N ** 3) ** 0.25 : Infinity;
  const warnings = Number.isFinite(froude) ? validityWarnings(JET_LENGTH_SCALES, { froude }) : [];
  return {
    froude,
    volumeFlux: Q,
    momentumFlux: M,
    buoyancyFlux: B,
    lQ,
    lM,
    lCrossflowMomentum: lm,
    lCrossflowBuoyancy: lb,
    lStratMomentum: lMN,
    lStratBuoyancy: lBN,
    regime: describeRegime(g, lQ, lM, lm, lb, lMN),
    warnings,
  };
}

/**
 * Which process dominates where, in plain words (no class codes). A scale that is not finite (the process is
 * absent, or so weak that the scale overflows) is never printed: the sentence says the process does not act.
 */
function describeRegime(g: number, lQ: number, lM: number, lm: number, lb: number, lMN: number): string[] {
  // a scale beyond any water body (1000 km) means the process never acts there: common practice, no source
  const has = (x: number) => Number.isFinite(x) && x < 1e6;
  const out = [
    has(lQ) && lQ > 0
      ? `Within about ${about(lQ)} of the port the flow still remembers the port's shape.`
      : "The port is so small that the flow forgets the port's shape at once.",
  ];
  const buoyant = g !== 0 && has(lM);
  if (!buoyant)
    out.push(
      g === 0
        ? 'The effluent has the ambient density: it behaves as a pure momentum jet.'
        : 'The density difference is too small to matter: the effluent behaves as a pure momentum jet.',
    );
  else if (g > 0) {
    out.push(
      lM <= 5 * lQ
        ? `Buoyancy takes over almost at once (within about ${about(lM)}): the discharge rises as a plume.`
        : `The discharge mixes as a momentum jet for about ${about(lM)}, then rises as a buoyant plume.`,
    );
  } else {
    out.push(
      `The effluent is denser than the water around it: its momentum carries it about ${about(lM)} before its weight turns it back towards the bed.`,
    );
  }
  if (has(lm) && lm > 0) {
    out.push(
      buoyant && lm < lM
        ? `The current bends the jet over after about ${about(lm)}, before buoyancy takes over.`
        : `The current bends the jet over after about ${about(lm)}.`,
    );
    if (buoyant && has(lb) && lb > 0) {
      out.push(
        lb < lM
          ? `The current is strong: beyond about ${about(lb)} it carries the plume along faster than buoyancy can lift or sink it.`
          : `Buoyancy keeps control of the vertical motion for about ${about(lb)}; further on the current carries the plume along.`,
      );
    }
  } else out.push('There is no current to speak of: the jet is not deflected sideways.');
  if (has(lMN)) {
    out.push(
      lMN < Math.min(lM, lm) || !buoyant
        ? `The density layering stops the rise early, after a few times ${about(lMN)}, while the jet still has momentum.`
        : 'The density layering limits the rise after the jet has turned into a plume (scale (B/N³)^¼).',
    );
  } else out.push('The ambient is unstratified: nothing stops the plume below the surface.');
  return out;
}
