import { qty } from '../core/quantity-text';
import { GRAVITY } from '../quantities';
import { requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { caution, note, type Warning } from '../core/warning';
import { brentRoot } from '../numerics/roots';

/**
 * Two-layer exchange through a flat-bottomed contraction with a net (barotropic) flow Q0 = Q1 − Q2,
 * Boussinesq, rigid lid, frictionless. Along the channel the internal energy E = g′h2 + (u2² − u1²)/2
 * (u_i = Q_i/(b h_i)) is conserved; dE/dh2 at fixed width is g′(1 − G²), ∂E/∂b is (u1² − u2²)/b, so a
 * control (G² = 1) sits where db/dx = 0 (the narrows) or where |u1| = |u2| (the virtual control).
 * Maximal exchange: both controls on the same E, joined by a subcritical region.
 *
 * Dimensionless form used below (g′ = H = b_min = 1, s = |Q0|/(b_min√(g′H³))): the layer moving with the
 * net flow carries q_w = s + q_a, the opposing layer q_a; at the narrows that layer has thickness h and
 *   q_w²/h³ + q_a²/(1 − h)³ = 1,
 * at the virtual control h_v = q_w/(q_w + q_a), u = √(h_v(1 − h_v)), b_v = (q_w + q_a)/u and E_v = 1 − h_v
 * (measured from the side of the opposing layer). E_n = E_v fixes h.
 * As s → (2/3)^{3/2} the opposing flux q_a → 0 and b_v → ∞: at the narrows the outflowing layer is then
 * critical over a stagnant opposing layer (h = 2/3, E = 0), the analytic end of the maximal-exchange branch.
 * Beyond it the flow is returned as one-way (Armi & Farmer list one-layer baroclinic flow, an arrested layer under
 * the outflow, and, once |Q0| ≥ b√(g′H³), one-layer barotropic flow filling the narrows).
 */

export const ARMI_FARMER_1986_NET_FLOW: MethodInfo = {
  id: 'exchange-contraction-net-flow-armi-farmer-1986',
  title: 'Maximal two-layer exchange through a contraction with a net barotropic flow (Armi & Farmer 1986)',
  source:
    'Armi, L., Farmer, D.M. (1986). Maximal two-layer exchange through a contraction with barotropic net flow. J. Fluid Mech. 164, ' +
    '27–51 (maximal exchange needs two controls: G² = 1 at the narrowest section and at a virtual control to one side of it, joined ' +
    'by a subcritical region); Armi, L. (1986) J. Fluid Mech. 163, 27–58 (internal energy and composite Froude number G² = F1² + F2²).',
  equation:
    'E = g′h2 + (u2² − u1²)/2 equal at both controls; narrows: Q1²/(b²g′h1³) + Q2²/(b²g′h2³) = 1; virtual control: |u1| = |u2|, ' +
    'h1 = H|Q1|/(|Q1| + |Q2|), u² = g′h1h2/H; Q1 − Q2 = Q0. Maximal exchange ends at |Q0| = (2/3)^{3/2} b √(g′H³)',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: 'Boussinesq' } },
};

/** |Q0|/(b√(g′H³)) at which the opposing layer's flux in the maximal-exchange solution falls to zero. */
export const MAXIMAL_EXCHANGE_LIMIT = (2 / 3) ** 1.5;

/** Dimensionless maximal-exchange state for s = |Q0|/(b√(g′H³)) in [0, (2/3)^{3/2}). */
interface DimensionlessExchange {
  /** flux of the layer moving with the net flow, and of the opposing layer */
  withFlow: number;
  against: number;
  /** thickness of the with-flow layer at the narrows and at the virtual control */
  thicknessNarrows: number;
  thicknessVirtual: number;
  /** virtual-control width / narrowest width */
  virtualWidth: number;
  /** internal energy at the narrows and at the virtual control, measured from the opposing layer's side */
  energyNarrows: number;
  energyVirtual: number;
}

/** Opposing-layer flux that makes the narrows critical when the with-flow layer is h thick (stable root). */
function opposingFluxAtNarrows(h: number, s: number): number {
  const a = 1 / h ** 3 + 1 / (1 - h) ** 3,
    b = (2 * s) / h ** 3,
    c = (s * s) / h ** 3 - 1;
  return Math.max(0, (-2 * c) / (b + Math.sqrt(Math.max(0, b * b - 4 * a * c))));
}

function stateAtNarrows(h: number, s: number) {
  const against = opposingFluxAtNarrows(h, s),
    withFlow = s + against;
  const energyNarrows = 1 - h + 0.5 * ((against / (1 - h)) ** 2 - (withFlow / h) ** 2);
  const energyVirtual = against / (withFlow + against);
  return { withFlow, against, energyNarrows, energyVirtual };
}

/**
 * Thickness h at the narrows where E_n = E_v. Besides the wanted root, E_n − E_v touches zero (a double root,
 * negative on both sides) where the virtual control would sit on the narrows itself, h = h_v, i.e.
 * √(h(1 − h))(2h − 1) = s (only for s ≤ ¼); the bracket stops halfway to it. For s < 10⁻³ the root's series
 * h = ½ + s/4 + s³/8 (checked against a 50-digit solve; remainder below 10⁻¹⁵) avoids differences of order s².
 */
function narrowsThickness(s: number): number {
  if (s < 1e-3) return 0.5 + s / 4 + s ** 3 / 8;
  const mismatch = (h: number) => {
    const st = stateAtNarrows(h, s);
    return st.energyNarrows - st.energyVirtual;
  };
  const lo = Math.max(0.5, s ** (2 / 3));
  let hi = 2 / 3;
  if (s <= 0.25) {
    const onNarrows = brentRoot((h) => Math.sqrt(h * (1 - h)) * (2 * h - 1) - s, 0.5, 0.5 + Math.sqrt(1 / 8), 1e-15)!;
    hi = Math.min(hi, (lo + onNarrows) / 2);
  }
  const h = brentRoot(mismatch, lo, hi, 1e-15); // mismatch > 0 at lo, < 0 at hi, one root between
  if (h === undefined) throw new Error('exchange with net flow: no control solution found');
  return h;
}

function solveDimensionless(s: number): DimensionlessExchange {
  const h = narrowsThickness(s);
  const st = stateAtNarrows(h, s);
  const total = st.withFlow + st.against,
    hv = st.withFlow / total;
  return {
    withFlow: st.withFlow,
    against: st.against,
    thicknessNarrows: h,
    thicknessVirtual: hv,
    virtualWidth: total / Math.sqrt(hv * (1 - hv)),
    energyNarrows: st.energyNarrows,
    energyVirtual: st.energyVirtual,
  };
}

export interface NetFlowExchange {
  /** discharge of the upper and of the lower layer, magnitudes [m3/s]; upper − lower = net discharge */
  upperDischarge: Scalar;
  lowerDischarge: Scalar;
  /** maximal (virtual control inside the channel), submaximal (it would lie beyond the channel ends), one-way */
  regime: 'maximal' | 'submaximal' | 'one-way';
  /** upper-layer thickness at the narrows, width of the virtual control and upper-layer thickness there [m]; undefined for one-way flow */
  upperThicknessAtNarrows?: number;
  virtualControlWidth?: number;
  upperThicknessAtVirtualControl?: number;
  /** internal energy E = g′h2 + (u2² − u1²)/2 at the narrows and at the virtual control [m2/s2] */
  energyAtNarrows?: number;
  energyAtVirtualControl?: number;
  /** |Q0| at which maximal exchange ends, (2/3)^{3/2} b √(g′H³) [m3/s] */
  flushingDischarge: number;
  warnings: Warning[];
}

/** The inputs shared by the net-flow exchange solutions, range-checked (InputError naming the field). */
export function checkedExchangeInputs(gPrime: number, depth: number, width: number, netDischarge: number) {
  // lower bounds keep g′H³ clear of underflow; smaller values are not physical here
  return {
    g: requireInRange('g_prime', gPrime, 'm/s2', { min: 1e-6, max: GRAVITY }),
    depth: requireInRange('depth', depth, 'm', { min: 1e-3, max: 1e4 }),
    width: requireInRange('width', width, 'm', { min: 1e-3, max: 1e6 }),
    netDischarge: requireInRange('net_discharge', netDischarge, 'm3/s', { min: -1e9, max: 1e9 }),
  };
}

/**
 * Layer discharges of maximal two-layer exchange through a contraction with net flow Q0.
 * @param gPrime [m/s2]; @param depth [m] H (flat bottom); @param narrowsWidth [m] b_min
 * @param netDischarge [m3/s] Q0, positive in the direction of the upper-layer flow, negative in that of the lower layer
 * @param endWidth [m] optional width at the channel ends (where it meets the reservoirs)
 * @returns layer discharges [m3/s], regime, control positions
 * @source Armi & Farmer (1986)
 * @validity Boussinesq, rigid lid, frictionless, no mixing, slowly varying width; |Q0| < (2/3)^{3/2} b√(g′H³)
 */
export function exchangeWithNetFlowArmiFarmer1986(
  gPrime: number,
  depth: number,
  narrowsWidth: number,
  netDischarge: number,
  endWidth?: number,
): NetFlowExchange {
  const { g, depth: H, width: b, netDischarge: Q0 } = checkedExchangeInputs(gPrime, depth, narrowsWidth, netDischarge);
  const bEnd = endWidth === undefined ? undefined : requireInRange('end_width', endWidth, 'm', { min: b, max: 1e7 });
  const scale = b * Math.sqrt(g * H ** 3),
    s = Math.abs(Q0) / scale,
    upperWithFlow = Q0 >= 0;
  const flushingDischarge = MAXIMAL_EXCHANGE_LIMIT * scale;
  const warnings: Warning[] = [];
  const layers = (withFlow: number, against: number) => {
    const [up, low] = upperWithFlow ? [withFlow, against] : [against, withFlow];
    return {
      upperDischarge: scalar(ARMI_FARMER_1986_NET_FLOW, up, 'm3/s', { g_prime: g }),
      lowerDischarge: scalar(ARMI_FARMER_1986_NET_FLOW, low, 'm3/s', { g_prime: g }),
    };
  };
  if (s >= MAXIMAL_EXCHANGE_LIMIT) {
    warnings.push(
      caution(
        'one-way-flow',
        `|Q0| = ${Math.abs(Q0).toPrecision(3)} m3/s ≥ (2/3)^{3/2} b√(g′H³) = ${flushingDischarge.toPrecision(3)} m3/s: one-way flow, no exchange. ` +
          `The opposing layer cannot pass the narrows (an arrested wedge may still reach it while |Q0| < b√(g′H³) = ${scale.toPrecision(3)} m3/s).`,
        'net_discharge',
      ),
    );
    const r = layers(Math.abs(Q0), 0);
    return { ...r, regime: 'one-way', flushingDischarge, warnings: [...r.upperDischarge.warnings, ...warnings] };
  }
  const d = solveDimensionless(s);
  const bv = d.virtualWidth * b;
  let regime: NetFlowExchange['regime'] = 'maximal';
  if (bEnd !== undefined && bv > bEnd) {
    regime = 'submaximal';
    warnings.push(
      caution(
        'submaximal-exchange',
        `The virtual control needs a width of ${bv.toPrecision(3)} m, more than the ${bEnd.toPrecision(3)} m at the channel ends: it cannot form inside the channel, so the exchange is submaximal (less than shown, set by the reservoir conditions, not computed here).`,
        'end_width',
      ),
    );
  }
  if (s > 0)
    warnings.push(
      note(
        'virtual-control-position',
        `The virtual control lies on the side the net flow comes from, where the channel has widened to ${qty(bv, 'm', 3)}.`,
      ),
    );
  const r = layers(d.withFlow * scale, d.against * scale);
  const fromOpposing = (e: number) => (upperWithFlow ? e : 1 - e) * g * H; // E measured from the bed
  return {
    ...r,
    regime,
    upperThicknessAtNarrows: (upperWithFlow ? d.thicknessNarrows : 1 - d.thicknessNarrows) * H,
    virtualControlWidth: bv,
    upperThicknessAtVirtualControl: (upperWithFlow ? d.thicknessVirtual : 1 - d.thicknessVirtual) * H,
    energyAtNarrows: fromOpposing(d.energyNarrows),
    energyAtVirtualControl: fromOpposing(d.energyVirtual),
    flushingDischarge,
    warnings: [...r.upperDischarge.warnings, ...warnings],
  };
}

/** Upper and lower layer discharges [m3/s] over n net discharges from −(2/3)^{3/2}b√(g′H³) to +(2/3)^{3/2}b√(g′H³). */
export function exchangeNetFlowCurve(gPrime: number, depth: number, narrowsWidth: number, n = 41) {
  const limit = MAXIMAL_EXCHANGE_LIMIT * narrowsWidth * Math.sqrt(gPrime * depth ** 3);
  const net = Array.from({ length: n }, (_, k) => -limit + (2 * limit * k) / (n - 1));
  const states = net.map((q) => exchangeWithNetFlowArmiFarmer1986(gPrime, depth, narrowsWidth, q));
  return { net, upper: states.map((r) => r.upperDischarge.value), lower: states.map((r) => r.lowerDischarge.value) };
}
