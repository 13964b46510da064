import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { caution, note, type Warning } from '../core/warning';
import { brentRoot } from '../numerics/roots';
import { checkedExchangeInputs } from './exchange-net-flow';

/**
 * Two-layer exchange over a sill with a net (barotropic) flow Q0 = Q1 − Q2, Boussinesq, rigid lid, frictionless,
 * constant width b. The bed rises from z_b = 0 in the dense (lower-layer source) basin, depth H, to the crest
 * z_b = H − D, depth D. With u_i = Q_i/(b h_i) and h1 + h2 + z_b = H the internal energy
 *   E = g′(h2 + z_b) + (u2² − u1²)/2   [m2/s2]
 * is conserved; ∂E/∂h2|z_b = g′(1 − G²) (G² = F1² + F2²) and ∂E/∂z_b|h2 = g′(1 − F1²). So dE/dx = 0 gives a control
 * (G² = 1) only where dz_b/dx = 0 (crest, or the flat basin floor at the foot of the sill) or where F1² = 1, F2 = 0.
 * At fixed fluxes E(h2) has two critical points per section: a minimum E_min (lower layer thin, "lower branch") and
 * a maximum E_max (upper layer thin); both rise with z_b because F1² < 1 there. A subcritical connection from the
 * dense basin to the crest therefore needs E_min(crest) = E ≤ E_max(basin floor): the crest is the lower-branch
 * control and, as the exchange grows, the bound is met when the flow at the foot of the sill becomes critical on
 * the upper branch. Maximal exchange (the largest exchange any dense-basin interface level allows) = both
 * controls on the same E: crest (G² = 1, lower branch) and foot (G² = 1 at depth H, upper branch), subcritical
 * between them. For H/D → ∞ the foot control becomes the F1 = 1, F2 → 0 virtual control of Farmer & Armi (1986)
 * and, at Q0 = 0, the result is maximalExchangeSillFarmerArmi1986; for H → D it tends to the flat-channel ¼√(g′D³).
 *
 * Dimensionless (g′ = D = 1, r = H/D, s = Q0/(b√(g′D³)), q_i = Q_i/(b√(g′D³)), q1 = s + q2), E measured from the lid:
 *   crest: q1²/h1³ + q2²/h2³ = 1, h1 + h2 = 1;   foot: the same with h1 + h2 = r (deep: h1 = q1^{2/3}, E = −(3/2)q1^{2/3}).
 * A crest control exists only for √q1 + √q2 ≤ 1, i.e. q2 ≤ ((1 − s)/2)². The exchange ends (one-way flow) at
 *   s = 1: the upper layer fills the crest depth and is critical over dense water arrested at crest level;
 *   s = −x^{3/2} with 3x/2 − 1 = x³/(2r²), x in (2/3, 1]: critical one-layer overflow of the dense water from the
 *   basin (the classic weir relation with approach-velocity head); (2/3)^{3/2} for a deep basin.
 */

export const FARMER_ARMI_1986_SILL_NET_FLOW: MethodInfo = {
  id: 'exchange-sill-net-flow-farmer-armi-1986',
  title: 'Maximal two-layer exchange over a sill with a net barotropic flow (Farmer & Armi 1986)',
  source:
    'Farmer, D.M., Armi, L. (1986). Maximal two-layer exchange over a sill and through the combination of a sill and contraction ' +
    'with barotropic flow. J. Fluid Mech. 164, 53–76 (sill: control at the crest and a second control on the dense side joined by a ' +
    'subcritical region); Armi, L. (1986) J. Fluid Mech. 163, 27–58 (internal energy, G² = F1² + F2²). Conditions derived here for a ' +
    'constant-width sill between basins of depth H: second control at the foot of the sill, where the bed levels off.',
  equation:
    'E = g′(h2 + z_b) + (u2² − u1²)/2 equal at crest (depth D) and foot (depth H); G² = Q1²/(b²g′h1³) + Q2²/(b²g′h2³) = 1 at both, ' +
    'lower layer thin at the crest, upper layer thin at the foot; Q1 − Q2 = Q0. Exchange ends at Q0 = b√(g′D³) and at ' +
    'Q0 = −x^{3/2} b√(g′D³), 3x/2 − 1 = x³D²/(2H²)',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: 'Boussinesq' } },
};

/** Thickness of a layer of flux qt, thin side of the minimum of G², where qt²/t³ + qo²/(d − t)³ = 1 (g′ = 1). */
function criticalThinLayer(qt: number, qo: number, d: number): number {
  if (qt <= 0) return 0;
  if (qo <= 0) return qt ** (2 / 3);
  const a = Math.sqrt(qt),
    tm = (d * a) / (a + Math.sqrt(qo));
  const excess = (t: number) => (qt * qt) / t ** 3 + (qo * qo) / (d - t) ** 3 - 1;
  if (excess(tm) >= 0) return tm; // the two critical states merge (largest flux a section of depth d can pass)
  return brentRoot(excess, 0.99 * qt ** (2 / 3), tm, 1e-15 * qt ** (2 / 3))!;
}

/** E − g′H (energy measured from the lid) for upper/lower thicknesses h1, h2 (g′ = 1). */
function energyFromLid(h1: number, h2: number, q1: number, q2: number): number {
  const kinetic = (q: number, h: number) => (q > 0 ? 0.5 * (q / h) ** 2 : 0);
  return -h1 + kinetic(q2, h2) - kinetic(q1, h1);
}

interface ControlStates {
  h2Crest: number;
  h1Foot: number;
  energyCrest: number;
  energyFoot: number;
}

function controls(q1: number, q2: number, r: number): ControlStates {
  const h2Crest = criticalThinLayer(q2, q1, 1);
  const energyCrest = energyFromLid(1 - h2Crest, h2Crest, q1, q2);
  if (r === Infinity) return { h2Crest, h1Foot: q1 ** (2 / 3), energyCrest, energyFoot: -1.5 * q1 ** (2 / 3) };
  const h1Foot = criticalThinLayer(q1, q2, r);
  return { h2Crest, h1Foot, energyCrest, energyFoot: energyFromLid(h1Foot, r - h1Foot, q1, q2) };
}

/** s at which the lower layer alone overflows critically from the dense basin (r = H/D; Infinity for a deep basin). */
export function sillFlushingWithLowerLayer(r: number): number {
  if (r === Infinity) return (2 / 3) ** 1.5;
  const x = brentRoot((x) => 1.5 * x - 1 - x ** 3 / (2 * r * r), 2 / 3, 1, 1e-15)!;
  return x ** 1.5;
}

/** Maximal-exchange lower-layer flux q2 for -flushing < s < 1: the largest q2 with E_crest ≤ E_foot. */
function solveLowerFlux(s: number, r: number): number {
  const lo = Math.max(0, -s),
    hi = ((1 - s) / 2) ** 2;
  const mismatch = (q2: number) => {
    const c = controls(s + q2, q2, r);
    return c.energyFoot - c.energyCrest;
  };
  if (mismatch(lo) <= 0) return lo; // s within rounding of a flushing limit
  if (mismatch(hi) >= 0) return hi; // H within rounding of D: the flat-channel limit √q1 + √q2 = 1
  const q2 = brentRoot(mismatch, lo, hi, 1e-15 * hi);
  if (q2 === undefined) throw new Error('sill exchange with net flow: no control solution found');
  return q2;
}

export interface SillNetFlowExchange {
  /** discharge of the upper and of the lower layer, magnitudes [m3/s]; upper − lower = net discharge */
  upperDischarge: Scalar;
  lowerDischarge: Scalar;
  regime: 'maximal' | 'one-way';
  /** upper-layer thickness at the crest and at the foot control (deep basin: far into it, where F1 = 1) [m] */
  upperThicknessAtCrest?: number;
  upperThicknessAtFoot?: number;
  /** E − g′H = −g′h1 + (u2² − u1²)/2 at the crest and at the foot control [m2/s2] */
  energyAtCrest?: number;
  energyAtFoot?: number;
  /** net discharges [m3/s] at which the exchange ends: with the upper layer (> 0) and with the lower layer (< 0) */
  flushingWithUpper: number;
  flushingWithLower: number;
  warnings: Warning[];
}

/**
 * Layer discharges of maximal two-layer exchange over a sill of constant width with net flow Q0.
 * @param gPrime [m/s2]; @param crestDepth [m] D; @param width [m] b
 * @param netDischarge [m3/s] Q0, positive in the direction of the upper-layer flow (a river outflow), negative with the lower layer
 * @param basinDepth [m] H, depth of the dense-side basin beyond the sill (> D); omitted: deep basin (H/D → ∞)
 * @returns layer discharges [m3/s], control states
 * @source Farmer & Armi (1986); control conditions derived as stated above
 * @validity Boussinesq, rigid lid, frictionless, no mixing, slowly varying bed, bed rising monotonically from the dense
 *   basin to the crest; −x^{3/2} < Q0/(b√(g′D³)) < 1; maximal exchange needs the dense basin to take the upper layer beyond the foot
 */
export function exchangeSillWithNetFlowFarmerArmi1986(
  gPrime: number,
  crestDepth: number,
  width: number,
  netDischarge: number,
  basinDepth?: number,
): SillNetFlowExchange {
  const { g, depth: D, width: b, netDischarge: Q0 } = checkedExchangeInputs(gPrime, crestDepth, width, netDischarge);
  const H =
    basinDepth === undefined
      ? Infinity
      : requireInRange('reservoir_depth', basinDepth, 'm', { min: D, minExclusive: true, max: 1e5 });
  const r = H / D,
    scale = b * Math.sqrt(g * D ** 3),
    s = Q0 / scale;
  const flushingWithUpper = scale,
    flushingWithLower = -sillFlushingWithLowerLayer(r) * scale;
  const warnings: Warning[] = [];
  const layers = (up: number, low: number) => ({
    upperDischarge: scalar(FARMER_ARMI_1986_SILL_NET_FLOW, up, 'm3/s', { g_prime: g }),
    lowerDischarge: scalar(FARMER_ARMI_1986_SILL_NET_FLOW, low, 'm3/s', { g_prime: g }),
  });
  const common = { flushingWithUpper, flushingWithLower };
  if (Q0 >= flushingWithUpper || Q0 <= flushingWithLower) {
    const upward = Q0 > 0;
    warnings.push(
      caution(
        'one-way-flow',
        upward
          ? `Q0 = ${Q0.toPrecision(3)} m3/s ≥ b√(g′D³) = ${scale.toPrecision(3)} m3/s: one-way flow, no exchange; the upper layer fills the crest section and the dense water is held below crest level.`
          : `Q0 = ${Q0.toPrecision(3)} m3/s ≤ ${flushingWithLower.toPrecision(3)} m3/s, the critical overflow of the dense water alone: one-way flow, no exchange.`,
        'net_discharge',
      ),
    );
    const rl = upward ? layers(Q0, 0) : layers(0, -Q0);
    return { ...rl, regime: 'one-way', ...common, warnings: [...rl.upperDischarge.warnings, ...warnings] };
  }
  const q2 = solveLowerFlux(s, r),
    q1 = s + q2;
  const c = controls(q1, q2, r);
  if (H === Infinity)
    warnings.push(
      note(
        'deep-basin-assumed',
        'Deep dense basin assumed (H ≫ D): the second control is the virtual control where the lower layer becomes deep and the upper layer critical.',
        'reservoir_depth',
      ),
    );
  else
    warnings.push(
      note(
        'foot-control',
        `The second control sits at the foot of the sill on the dense side, where the bed levels off at ${H.toPrecision(3)} m.`,
      ),
    );
  warnings.push(
    note(
      'maximal-exchange-assumed',
      'Maximal exchange: a dense-side interface higher than the foot control allows (e.g. a shallow or ponded basin) gives less exchange (submaximal, not computed).',
    ),
  );
  const rl = layers(q1 * scale, q2 * scale);
  return {
    ...rl,
    regime: 'maximal',
    ...common,
    upperThicknessAtCrest: (1 - c.h2Crest) * D,
    upperThicknessAtFoot: c.h1Foot * D,
    energyAtCrest: c.energyCrest * g * D,
    energyAtFoot: c.energyFoot * g * D,
    warnings: [...rl.upperDischarge.warnings, ...warnings],
  };
}

/** Upper and lower layer discharges [m3/s] over n net discharges spanning the maximal-exchange range of the sill. */
export function exchangeSillNetFlowCurve(
  gPrime: number,
  crestDepth: number,
  width: number,
  basinDepth?: number,
  n = 41,
) {
  const { flushingWithUpper: top, flushingWithLower: bottom } = exchangeSillWithNetFlowFarmerArmi1986(
    gPrime,
    crestDepth,
    width,
    0,
    basinDepth,
  );
  const net = Array.from({ length: n }, (_, k) => bottom + ((top - bottom) * k) / (n - 1));
  const states = net.map((q) => exchangeSillWithNetFlowFarmerArmi1986(gPrime, crestDepth, width, q, basinDepth));
  return { net, upper: states.map((x) => x.upperDischarge.value), lower: states.map((x) => x.lowerDischarge.value) };
}
