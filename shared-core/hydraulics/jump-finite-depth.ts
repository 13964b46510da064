import { requireInRange } from '../core/range';
import { caution, outsideValidity, type Warning } from '../core/warning';
import type { MethodInfo } from '../core/method';
import { brentRoot } from '../numerics/roots';

/**
 * Internal hydraulic jump of a dense bottom layer in a channel of finite total depth D under a rigid lid
 * (Boussinesq, hydrostatic, no entrainment). Lower layer: discharge q per width, thickness y; upper layer:
 * discharge q_u per width (signed, positive with the lower layer), thickness D − y. By default q_u = −q: the
 * return flow of a closed channel with no net flow. With a quiescent upper layer (q_u = 0) both closures below
 * give the deep-layer (Bélanger) result whatever D, so the finite depth acts through the upper-layer flow.
 *
 * Two conservation laws are exact: lower- and upper-layer mass. Total momentum (with the unknown lid pressure P)
 *   D·P/ρ + g′y²/2 + q²/y + q_u²/(D − y)
 * is conserved as well; one more condition is a closure:
 *  - energy conserved in the contracting (upper) layer, P/ρ + q_u²/(2(D − y)²) constant (Wood & Simpson 1984;
 *    Klemp, Rotunno & Skamarock 1997). Eliminating P: M(y) = g′y²/2 + q²/y + q_u²(D − 2y)/(2(D − y)²) is conserved,
 *    and dM/dy = g′y(1 − G²), so the conjugate lies between the two critical thicknesses (G² = 1).
 *  - layer momentum with the interfacial pressure force taken as the mean of its end values (pressure linear
 *    across the jump), the closure recalled (from memory) as that of Yih & Guha (1955): the comparison value.
 * The conjugate returned is the subcritical one, between the two critical thicknesses. In a finite depth a second
 * conjugate with a thin, supercritical upper layer (beyond the second critical thickness) can also satisfy both
 * laws; it is not returned. The largest jump has its downstream state at the second critical thickness.
 */

export const INTERNAL_JUMP_FINITE_DEPTH: MethodInfo = {
  id: 'internal-jump-finite-depth',
  title: 'Internal hydraulic jump of a dense layer in a channel of finite depth (rigid lid, upper-layer return flow)',
  source:
    'Wood, I.R., Simpson, J.E. (1984). Jumps in layered miscible fluids. J. Fluid Mech. 140, 329–342, and Klemp, J.B., Rotunno, R., ' +
    'Skamarock, W.C. (1997). On the propagation of internal bores. J. Fluid Mech. 331, 81–106 (total momentum with energy conserved in ' +
    'the contracting layer); comparison closure: Yih, C.-S., Guha, C.R. (1955). Hydraulic jump in a fluid system of two layers. Tellus 7, ' +
    '358–366 (layer momentum, interfacial pressure linear across the jump); long-wave stability (Δu)² < g′D: ' +
    'Long, R.R. (1956). Long waves in a two-fluid system. J. Meteorol. 13, 70–74.',
  equation:
    'g′y²/2 + q²/y + q_u²(D − 2y)/(2(D − y)²) equal on both sides (q_u = −q by default); head loss = drop of the lower-layer ' +
    'Bernoulli head P/(ρg′) + y + q²/(2g′y²); subcritical conjugate only; limit: it reaches the second critical thickness (G² = 1)',
  validity: {},
  provenance:
    'The attribution of the comparison closure (layer momentum) to Yih & Guha (1955) was not compared with the original paper.',
};

export interface FiniteDepthJump {
  /** conjugate (downstream) lower-layer thickness y2 [m], energy conserved in the upper layer */
  downstreamThickness: number;
  /** the same with the interfacial-pressure closure (comparison) [m] */
  downstreamThicknessInterfacialPressure: number;
  /** energy dissipated per unit lower-layer discharge, in reduced-gravity head [m] */
  headLoss: number;
  /** upstream lower-layer Froude number q/√(g′y1³) [1] */
  froude: number;
  /** composite Froude number G upstream and downstream [1] */
  compositeFroudeUpstream: number;
  compositeFroudeDownstream: number;
  /** true when no conjugate state exists and the results are the limiting (critical) state */
  limited: boolean;
  method: string;
  warnings: Warning[];
}

const GP = { min: 1e-6, max: 20 };

/**
 * Conjugate thickness and head loss of an internal jump in a channel of finite depth.
 * @param q [m2/s] lower-layer discharge per width; @param y1 [m] upstream lower-layer thickness; @param gPrime [m/s2]
 * @param totalDepth [m] D; @param upperDischarge [m2/s] upper-layer discharge per width, positive with the lower layer (default −q)
 * @returns y2 [m], head loss [m], Froude numbers [1]
 * @source Wood & Simpson (1984); Klemp, Rotunno & Skamarock (1997); Yih & Guha (1955) for the comparison closure
 * @validity hydrostatic, no entrainment across the jump, lower layer thickening (upstream G > 1 through the lower layer)
 */
export function internalJumpFiniteDepth(
  q: number,
  y1: number,
  gPrime: number,
  totalDepth: number,
  upperDischarge?: number,
): FiniteDepthJump {
  const flux = requireInRange('discharge_per_width', q, 'm2/s', { min: 1e-9, max: 1e4 });
  const D = requireInRange('total_depth', totalDepth, 'm', { min: 2e-3, max: 1e7 });
  const y = requireInRange('upstream_thickness', y1, 'm', { min: 1e-3, max: D, maxExclusive: true });
  const g = requireInRange('g_prime', gPrime, 'm/s2', GP);
  const qu =
    upperDischarge === undefined
      ? -flux
      : requireInRange('upper_discharge', upperDischarge, 'm2/s', { min: -1e4, max: 1e4 });
  // dimensionless: thicknesses in y1, discharges in √(g′y1³)
  const unit = Math.sqrt(g * y ** 3),
    F = flux / unit,
    Fu = qu / unit,
    d = D / y;
  const G2 = (Y: number) => (F * F) / Y ** 3 + (Fu * Fu) / (d - Y) ** 3;
  const lowerHead = (Y: number) => -(Fu * Fu) / (2 * (d - Y) ** 2) + Y + (F * F) / (2 * Y * Y);
  const shear = (Y: number) => (F / Y - Fu / (d - Y)) ** 2 / d; // (Δu)²/(g′D)
  const warnings: Warning[] = [];
  const result = (Y2: number, Yip: number, limited: boolean): FiniteDepthJump => {
    if (Math.max(shear(1), shear(Y2)) > 1)
      warnings.push(
        outsideValidity(
          'interface-shear-unstable',
          'The shear across the interface exceeds the long-wave stability limit (Δu)² < g′D (Long 1956): the interface is unstable and mixing across the jump is likely; the conjugate states are a rough guide.',
        ),
      );
    const loss = (lowerHead(1) - lowerHead(Y2)) * y;
    if (loss < 0 && !limited)
      warnings.push(
        outsideValidity('energy-gain', 'The lower layer would gain energy across this jump: not a physical jump.'),
      );
    return {
      downstreamThickness: Y2 * y,
      downstreamThicknessInterfacialPressure: Yip * y,
      headLoss: loss,
      froude: F,
      compositeFroudeUpstream: Math.sqrt(G2(1)),
      compositeFroudeDownstream: Math.sqrt(G2(Y2)),
      limited,
      method: INTERNAL_JUMP_FINITE_DEPTH.id,
      warnings,
    };
  };
  const edge = d * (1 - 1e-12);
  const Ym = Fu === 0 ? edge : Math.min(edge, d / (1 + Math.sqrt(Math.abs(Fu) / F))); // thickness of least G²
  if (G2(1) <= 1 || Ym <= 1) {
    warnings.push(
      G2(1) <= 1
        ? caution(
            'subcritical-no-jump',
            `The upstream flow is subcritical (G = ${Math.sqrt(G2(1)).toPrecision(3)} ≤ 1): no jump forms; y2 = y1 is shown.`,
          )
        : outsideValidity(
            'upper-layer-supercritical',
            'The upstream flow is supercritical through its upper layer; this form treats a thickening lower layer only: y2 = y1 is shown.',
            'upper_discharge',
          ),
    );
    return result(1, 1, false);
  }
  if (G2(Ym) >= 1) {
    warnings.push(
      caution(
        'no-subcritical-state',
        'No subcritical state exists for these discharges in this depth: the flow cannot jump to a subcritical state; the thickness of least G is shown.',
      ),
    );
    return result(Ym, Ym, true);
  }
  const Yc1 = brentRoot((Y) => G2(Y) - 1, 1, Ym, 1e-14)!;
  const Yc2 = G2(edge) <= 1 ? edge : brentRoot((Y) => G2(Y) - 1, Ym, edge, 1e-14)!;
  // momentum balances divided by (Y − 1): energy-conserving upper layer, and interfacial-pressure closure
  const energyClosure = (Y: number) =>
    (Y + 1) / 2 - (F * F) / Y + (((Fu * Fu) / 2) * (2 * Y - d * (Y + 1))) / ((d - Y) ** 2 * (d - 1) ** 2);
  const pressureClosure = (Y: number) =>
    (2 * d - Y - 1) * ((F * F) / ((Y + 1) * Y) - 0.5) + (Fu * Fu) / ((d - Y) * (d - 1));
  const solve = (f: (Y: number) => number) =>
    Math.sign(f(Yc1)) !== Math.sign(f(Yc2)) ? brentRoot(f, Yc1, Yc2, 1e-14) : undefined;
  const Y2 = solve(energyClosure),
    Yip = solve(pressureClosure) ?? Yc2;
  if (Y2 === undefined) {
    warnings.push(
      caution(
        'jump-exceeds-depth',
        `The jump exceeds the largest one the depth allows: no conjugate state, the downstream flow would have to pass the second critical thickness ${(Yc2 * y).toPrecision(3)} m. The jump cannot stand and is swept downstream (or the flow chokes); that limiting state is shown.`,
      ),
    );
    return result(Yc2, Yip, true);
  }
  return result(Y2, Yip, false);
}
