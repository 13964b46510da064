import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { note } from '../core/warning';
import { brentRoot } from '../numerics/roots';
import { compositeFroudeArmi1986 } from '../hydraulics/two-layer';

/**
 * Two-layer exchange flow between two reservoirs of different density through a channel, with no net
 * (barotropic) flow. Layer Froude numbers F_i² = u_i²/(g′h_i); the composite Froude number G² = F1² + F2²
 * equals 1 at a hydraulic control. Boussinesq, rigid lid, no friction, no mixing.
 */

/** Composite Froude number squared G² = u1²/(g′h1) + u2²/(g′h2) [1] (Armi 1986; see hydraulics). */
function compositeFroudeSquared(u1: number, h1: number, u2: number, h2: number, gPrime: number): number {
  return compositeFroudeArmi1986(u1, u2, h1, h2, gPrime).value ** 2;
}

export const ARMI_FARMER_1986: MethodInfo = {
  id: 'exchange-contraction-armi-farmer-1986',
  title: 'Maximal two-layer exchange through a contraction (Armi & Farmer 1986)',
  source:
    'Armi, L., Farmer, D.M. (1986). Maximal two-layer exchange through a contraction with barotropic net flow. J. Fluid Mech. 164, 27–51 (zero net flow: interface at mid-depth and G² = 1 at the narrowest section); Armi, L. (1986) J. Fluid Mech. 163, 27–58 (composite Froude number).',
  equation: 'q = ¼ √(g′H³) per unit width of the narrowest section each way; Q = ¼ b √(g′H³)',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: 'Boussinesq' } },
};

export const FARMER_ARMI_1986: MethodInfo = {
  id: 'exchange-sill-farmer-armi-1986',
  title: 'Maximal two-layer exchange over a sill (Farmer & Armi 1986)',
  source:
    'Farmer, D.M., Armi, L. (1986). Maximal two-layer exchange over a sill and through the combination of a sill and contraction with barotropic flow. J. Fluid Mech. 164, 53–76 (sill alone: control at the crest, virtual control where the lower layer becomes deep; q ≈ 0.208 √(g′H³)).',
  equation:
    'at the crest (depth H): q²/h1³ + q²/h2³ = g′, h1 + h2 = H; Bernoulli difference ½q²/h2² − ½q²/h1² − g′h1 = −(3/2)(g′q)^(2/3) from the virtual control',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: 'Boussinesq' } },
};

export interface ExchangeFlow {
  /** discharge of each layer [m3/s] (equal and opposite) */
  discharge: Scalar;
  /** upper-layer thickness at the control [m] */
  upperThicknessAtControl: number;
  /** composite Froude number squared at the control [1] (1 by construction) */
  compositeFroudeSquared: number;
}

function inputs(gPrime: number, depth: number, width: number) {
  return {
    g: requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: GRAVITY }),
    h: requireInRange('depth', depth, 'm', { ...positive, max: 1e4 }),
    b: requireInRange('width', width, 'm', { ...positive, max: 1e6 }),
  };
}

const NO_NET_FLOW = note(
  'no-net-flow',
  'No net (barotropic) flow is included; a river or tidal net flow changes the exchange.',
);

/**
 * Maximal exchange through a contraction of width b [m] and constant depth H [m]: Q = ¼b√(g′H³) [m3/s] each way.
 * @source Armi & Farmer (1986). @validity Boussinesq, frictionless, no net flow.
 */
export function maximalExchangeContractionArmiFarmer1986(gPrime: number, depth: number, width: number): ExchangeFlow {
  const { g, h, b } = inputs(gPrime, depth, width);
  const q = 0.25 * Math.sqrt(g * h ** 3);
  const u = q / (h / 2);
  return {
    discharge: scalar(ARMI_FARMER_1986, q * b, 'm3/s', { g_prime: g }, [NO_NET_FLOW]),
    upperThicknessAtControl: h / 2,
    compositeFroudeSquared: compositeFroudeSquared(u, h / 2, -u, h / 2, g),
  };
}

/**
 * Maximal exchange over a sill with crest depth H [m] and width b [m] (no contraction), solved from the
 * crest control and the virtual control in the dense reservoir. Q ≈ 0.208 b √(g′H³) [m3/s] each way.
 * @source Farmer & Armi (1986). @validity Boussinesq, frictionless, no net flow, deep reservoirs.
 */
export function maximalExchangeSillFarmerArmi1986(gPrime: number, depth: number, width: number): ExchangeFlow {
  const { g, h, b } = inputs(gPrime, depth, width);
  // dimensionless (g′ = H = 1): upper thickness y at the crest; q² from criticality
  const q2 = (y: number) => 1 / (1 / y ** 3 + 1 / (1 - y) ** 3);
  const bernoulli = (y: number) => {
    const s = q2(y);
    return (0.5 * s) / (1 - y) ** 2 - (0.5 * s) / (y * y) - y + 1.5 * s ** (1 / 3);
  };
  const y = brentRoot(bernoulli, 0.5 + 1e-9, 1 - 1e-6, 1e-14);
  if (y === undefined) throw new Error('sill exchange: no control solution found');
  const qDim = Math.sqrt(q2(y)) * Math.sqrt(g * h ** 3);
  const u1 = qDim / (y * h),
    u2 = qDim / ((1 - y) * h);
  return {
    discharge: scalar(FARMER_ARMI_1986, qDim * b, 'm3/s', { g_prime: g }, [NO_NET_FLOW]),
    upperThicknessAtControl: y * h,
    compositeFroudeSquared: compositeFroudeSquared(u1, y * h, -u2, (1 - y) * h, g),
  };
}
