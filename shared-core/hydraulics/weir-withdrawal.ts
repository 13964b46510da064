import { GRAVITY } from '../quantities';
import { caution, note, type Warning } from '../core/warning';
import { requireInRange } from '../core/range';
import { scalar, type MethodInfo } from '../core/method';
import { qty } from '../core/quantity-text';
import { APPROACH_HEAD_CAUTION, approachHeadCaution, type SkimmingLimit, type SkimmingOptions } from './two-layer';

export const WEIR_SKIMMING_WITHDRAWAL: MethodInfo = {
  id: 'weir-skimming-withdrawal',
  title: 'Largest upper-layer discharge over a submerged weir before lower-layer water is drawn over the crest',
  source:
    'One-dimensional hydrostatic energy balance of the skimmed upper layer over a stagnant lower layer, with the interface lifted ' +
    'to the crest: the inverted form of the curtain-wall (skimmer) withdrawal of Craya, A. (1949). Recherches théoriques sur ' +
    'l’écoulement de couches superposées de fluides de densités différentes. La Houille Blanche 4, 44–55; the interface rises by ' +
    'u²/(2g′) where the surface falls by u²/(2g). Limits: critical flow q = √(g′h³) at h = 2Y/3 (Turner, J.S. 1973. Buoyancy ' +
    'Effects in Fluids, §3.2) and, for a deep interface, critical free-surface flow over the crest, q = (2/3)^{3/2}√(g h³).',
  equation:
    'q_max = √(2g′(Y − h)) · t, t = h − (g′/g)(Y − h) the flow thickness over the crest, h the crest depth and Y the interface depth below the upstream water surface (Y > h); with the approach velocity head of the upper layer (q/Y), q_max = t√(2g′(Y − h))/√(1 − t²/Y²); at most (2/3)^{3/2}√(g h³)',
  validity: {},
};

const GP = { min: 1e-6, max: 20 };
const DEPTH = { min: 1e-3, max: 11000 };

/**
 * Upper-layer discharge per unit width over a weir crest when the lower layer has just been lifted to the crest.
 * Upper layer (density ρ1) flows over a stagnant lower layer; Bernoulli along the surface lowers it by u²/(2g),
 * hydrostatics of the stagnant layer lifts the interface by (ρ1/Δρ)·u²/(2g) = u²/(2g′). With the interface at the
 * crest, u = √(2g′(Y − h)) and the flow over the crest is h − u²/(2g) thick.
 * @param gPrime [m/s2] g′ = gΔρ/ρ1 (upper-layer density as reference); @param crestDepth [m] h, crest below the upstream water surface
 * @param interfaceDepth [m] Y, upstream interface below the water surface
 * @param options approachVelocity: include the velocity head of the upper layer approaching at q/Y (default not); the
 * interface rise and the surface fall are then (u² − V²)/(2g′) and (u² − V²)/(2g), so t is unchanged and q = t u with
 * u² = 2g′(Y − h) + q²/Y²
 * @returns q_max [m2/s]
 * @source Craya (1949), inverted curtain-wall case; Turner (1973) §3.2
 * @validity deep, quiescent lower layer upstream; no contraction, curvature or losses at the crest; laboratory checks: none in this program
 */
export function weirSkimmingWithdrawalMax(
  gPrime: number,
  crestDepth: number,
  interfaceDepth: number,
  options: Pick<SkimmingOptions, 'approachVelocity'> = {},
): SkimmingLimit {
  const g = requireInRange('g_prime', gPrime, 'm/s2', GP);
  const Y = requireInRange('interface_depth', interfaceDepth, 'm', DEPTH);
  const h = requireInRange('crest_depth', crestDepth, 'm', { min: 1e-3, max: Y, maxExclusive: true });
  const criticalFreeSurface = (2 / 3) ** 1.5 * Math.sqrt(GRAVITY * h ** 3);
  if (g * (Y - h) >= (GRAVITY * h) / 3) {
    return {
      ...scalar(WEIR_SKIMMING_WITHDRAWAL, criticalFreeSurface, 'm2/s', {}, [
        note(
          'crest-controls-overflow',
          'The interface lies so deep that the overflow reaches free-surface critical flow over the crest before the lower layer is lifted to it: lower-layer water is not drawn; the value is the critical discharge (2/3)^{3/2}√(g h³) of the crest.',
        ),
      ]),
      approachHeadRatio: 1,
    };
  }
  const u0 = Math.sqrt(2 * g * (Y - h)),
    t = h - (u0 * u0) / (2 * GRAVITY);
  const ratio = 1 / Math.sqrt(1 - (t / Y) ** 2);
  const q = u0 * t * (options.approachVelocity ? ratio : 1);
  if (q >= criticalFreeSurface)
    return {
      ...scalar(WEIR_SKIMMING_WITHDRAWAL, criticalFreeSurface, 'm2/s', {}, [
        note(
          'crest-controls-overflow',
          'With the approach velocity head the overflow reaches free-surface critical flow over the crest before the lower layer is lifted to it: the value is the critical discharge (2/3)^{3/2}√(g h³) of the crest.',
        ),
      ]),
      approachHeadRatio: ratio,
    };
  const warnings: Warning[] =
    h > (2 * Y) / 3
      ? [
          note(
            'subcritical-crest',
            'The crest is deeper than the critical depth 2Y/3: the skimmed layer stays subcritical up to the crest and lifts the interface gently.',
            'opening',
          ),
        ]
      : [];
  if (criticalFreeSurface > q)
    warnings.push(
      caution(
        'free-overflow-draws-lower-layer',
        `A freely overflowing crest passes about ${qty(criticalFreeSurface, 'm2/s', 3)} at this head, ${(criticalFreeSurface / q).toPrecision(3)} times the limit: without throttling (gate, submerged outlet) lower-layer water is drawn.`,
      ),
    );
  if (!options.approachVelocity && ratio - 1 > APPROACH_HEAD_CAUTION)
    warnings.push(approachHeadCaution(ratio, Y, 'interface_distance'));
  return { ...scalar(WEIR_SKIMMING_WITHDRAWAL, q, 'm2/s', {}, warnings), approachHeadRatio: ratio };
}
