import { GRAVITY } from '../quantities';
import { positive, requireInRange } from '../core/range';
import { scalar, type MethodInfo, type Scalar } from '../core/method';
import { caution, note, type Warning } from '../core/warning';

/**
 * Steady front speeds of gravity currents. g′ = g(ρ_current − ρ_ambient)/ρ_ambient for a dense current
 * (g(ρ_ambient − ρ_current)/ρ_ambient for a light one): the ambient density is the reference throughout.
 * Symbols: h current depth [m], H total depth [m], a = h/H, U front speed [m/s], Fr = U/√(g′h).
 */

/** A front speed with its Froude numbers. */
export interface FrontSpeed extends Scalar {
  /** U/√(g′h) [1] with h the current depth */
  froude: number;
  /** U/√(g′H) [1]; undefined for a deep ambient */
  froudeTotal?: number;
}

const BOUSSINESQ_NOTE = 'Boussinesq laboratory currents (Δρ/ρ ≲ 0.1)';

export const VON_KARMAN_1940: MethodInfo = {
  id: 'front-speed-von-karman-1940',
  title: 'Front speed of a gravity current in a deep ambient (von Kármán 1940)',
  source:
    'von Kármán, T. (1940). The engineer grapples with non-linear problems. Bull. Amer. Math. Soc. 46, 615–683 (§ on gravity currents); confirmed as the deep limit by Benjamin, T.B. (1968), J. Fluid Mech. 31, 209–248, §3.',
  equation:
    'U = √(2 g′ h), i.e. Fr = √2 (steady, inviscid, no mixing, infinitely deep ambient; g′ referred to the ambient density)',
  validity: {},
};

/**
 * von Kármán (1940) deep-ambient front speed U = √(2g′h). With g′ referred to the ambient density the
 * formula holds for any density ratio (Benjamin 1968, §3).
 * @param gPrime [m/s2] reduced gravity (ambient reference); @param currentDepth [m] current depth h behind the head
 * @returns U [m/s]
 * @source von Kármán (1940); Benjamin (1968) §3. @validity steady, inviscid, unmixed current, deep ambient.
 */
export function frontSpeedVonKarman1940(gPrime: number, currentDepth: number): FrontSpeed {
  const { g, h } = checkedCurrent(gPrime, currentDepth);
  const u = Math.sqrt(2 * g * h);
  const extra = [
    caution(
      'inviscid-limit-overestimates',
      'Deep-ambient inviscid limit: laboratory currents run slower (Fr ≈ 1.0–1.2 instead of √2; Huppert & Simpson 1980; Shin et al. 2004).',
    ),
  ];
  return { ...scalar(VON_KARMAN_1940, u, 'm/s', {}, extra), froude: Math.SQRT2 };
}

export const BENJAMIN_1968: MethodInfo = {
  id: 'front-speed-benjamin-1968',
  title: 'Front speed of a steady gravity current in a channel (Benjamin 1968)',
  source:
    'Benjamin, T.B. (1968). Gravity currents and related phenomena. J. Fluid Mech. 31, 209–248, eq. (2.17)/(3.6) (flow-force balance; energy conserved only at a = 1/2).',
  equation:
    'U²/(g′h) = (1 − a)(2 − a)/(1 + a), a = h/H; U/√(g′H) peaks at a ≈ 0.347 (≈ 0.527); a = 1/2 gives U = ½√(g′H)',
  validity: {
    depth_ratio: { min: 0, max: 0.5, unit: '1', note: 'a > 1/2 would need an energy gain and is not realised' },
  },
};

/** Benjamin's Froude number U/√(g′h) as a function of a = h/H (a = 0: deep ambient, √2). */
export function benjaminFroude(a: number): number {
  return Math.sqrt(((1 - a) * (2 - a)) / (1 + a));
}

/**
 * Benjamin (1968) steady current of depth h in a channel of depth H:
 * U = √(g′h (1 − a)(2 − a)/(1 + a)), a = h/H. Exact for any density ratio with g′ referred to the ambient.
 * @param gPrime [m/s2]; @param currentDepth [m] h; @param totalDepth [m] H (undefined: deep ambient, a = 0)
 * @returns U [m/s] @source Benjamin (1968) §2–3. @validity 0 ≤ a ≤ 1/2 (dissipative for a < 1/2, energy-conserving at 1/2).
 */
export function frontSpeedBenjamin1968(gPrime: number, currentDepth: number, totalDepth?: number): FrontSpeed {
  const { g, h, a } = checkedCurrent(gPrime, currentDepth, totalDepth);
  const extra =
    a === 0.5
      ? []
      : [
          note(
            'energy-not-conserved',
            'Benjamin’s current conserves energy only at a = h/H = 1/2; elsewhere the flow-force balance implies dissipation (or, for a > 1/2, an impossible energy gain).',
          ),
        ];
  return fromFroude(BENJAMIN_1968, benjaminFroude(a), g, h, totalDepth, { depth_ratio: a }, extra);
}

export const HUPPERT_SIMPSON_1980_FRONT: MethodInfo = {
  id: 'front-speed-huppert-simpson-1980',
  title: 'Empirical front condition of Huppert & Simpson (1980)',
  source:
    'Huppert, H.E., Simpson, J.E. (1980). The slumping of gravity currents. J. Fluid Mech. 99, 785–799, eq. (2.3), fitted to the lock-release experiments of Keulegan (1957) and Simpson & Britter (1979).',
  equation: 'Fr = U/√(g′h) = 1.19 for a = h/H ≤ 0.075; Fr = ½ a^(−1/3) for 0.075 ≤ a ≤ 1',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: BOUSSINESQ_NOTE } },
};

/** The Huppert & Simpson (1980) Froude number as a function of a = h/H. */
export function huppertSimpsonFroude(a: number): number {
  return a <= 0.075 ? 1.19 : 0.5 * a ** (-1 / 3);
}

/**
 * Huppert & Simpson (1980) empirical front speed U = Fr(a)√(g′h).
 * @param gPrime [m/s2]; @param currentDepth [m] mean current depth h; @param totalDepth [m] H (undefined: deep)
 * @returns U [m/s] @source Huppert & Simpson (1980) eq. (2.3). @validity Boussinesq lock releases, 0 < a ≤ 1.
 */
export function frontSpeedHuppertSimpson1980(gPrime: number, currentDepth: number, totalDepth?: number): FrontSpeed {
  const { g, h, a } = checkedCurrent(gPrime, currentDepth, totalDepth);
  return fromFroude(HUPPERT_SIMPSON_1980_FRONT, huppertSimpsonFroude(a), g, h, totalDepth, { g_prime: g });
}

export const SHIN_2004: MethodInfo = {
  id: 'front-speed-shin-2004',
  title: 'Front speed of a partial-depth lock release (Shin, Dalziel & Linden 2004)',
  source:
    'Shin, J.O., Dalziel, S.B., Linden, P.F. (2004). Gravity currents produced by lock exchange. J. Fluid Mech. 521, 1–34 (energy-conserving theory: current depth D/2, front speed eq. for partial depth).',
  equation:
    'h = D/2, U = ½ √(g′ D (2 − D/H)); Fr = U/√(g′h) = √(1 − h/H), → 1 for a deep ambient, U = ½√(g′H) for a full-depth lock',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: BOUSSINESQ_NOTE } },
};

/**
 * Shin, Dalziel & Linden (2004) slumping-phase front speed of a lock of depth D in a channel of depth H:
 * U = ½√(g′D(2 − D/H)). The current depth is D/2.
 * @param gPrime [m/s2]; @param lockDepth [m] D; @param totalDepth [m] H ≥ D (undefined: deep ambient)
 * @returns U [m/s] @source Shin et al. (2004). @validity Boussinesq, high Reynolds number, slumping phase.
 */
export function frontSpeedShinDalzielLinden2004(gPrime: number, lockDepth: number, totalDepth?: number): FrontSpeed {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const d = requireInRange('lock_depth', lockDepth, 'm', { ...positive, max: 1e4 });
  const r = depthRatio(d, totalDepth, 'lock_depth');
  const u = 0.5 * Math.sqrt(g * d * (2 - r));
  return {
    ...scalar(SHIN_2004, u, 'm/s', { g_prime: g }),
    froude: u / Math.sqrt((g * d) / 2),
    froudeTotal: totalDepth === undefined ? undefined : u / Math.sqrt(g * totalDepth),
  };
}

export const LOCK_EXCHANGE: MethodInfo = {
  id: 'lock-exchange-speed',
  title: 'Full-depth lock exchange front speed: ideal value and experimental range',
  source:
    'Ideal: Yih, C.-S. (1965). Dynamics of Nonhomogeneous Fluids, §3; Benjamin (1968) J. Fluid Mech. 31, 209–248, §4 (a = 1/2). Experiments: Keulegan (1957) NBS Rep. 5168; Barr (1967); Shin, Dalziel & Linden (2004) J. Fluid Mech. 521, 1–34; range as summarised in Simpson (1997) Gravity Currents, 2nd ed., Ch. 12.',
  equation: 'U = k √(g′H); ideal k = 1/2, experiments k ≈ 0.44–0.48',
  validity: { g_prime: { max: 1, unit: 'm/s2', note: BOUSSINESQ_NOTE } },
};

/** Lock-exchange front speeds [m/s]: the energy-conserving ideal and the experimental band. */
export interface LockExchangeSpeed {
  ideal: Scalar;
  /** lower and upper ends of the laboratory range, and its middle */
  low: number;
  high: number;
  typical: number;
}

/** Froude numbers U/√(g′H) of the full-depth lock exchange. */
export const LOCK_EXCHANGE_FROUDE = { ideal: 0.5, low: 0.44, high: 0.48, typical: 0.46 } as const;

/**
 * Front speed of a full-depth lock exchange, U = k√(g′H) with k = ½ (ideal) and 0.44–0.48 (experiments).
 * @param gPrime [m/s2]; @param depth [m] H @returns speeds [m/s] @source see LOCK_EXCHANGE.source
 */
export function lockExchangeSpeed(gPrime: number, depth: number): LockExchangeSpeed {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const h = requireInRange('depth', depth, 'm', { ...positive, max: 1e4 });
  const c = Math.sqrt(g * h);
  const extra = [
    note(
      'laboratory-slower',
      'Laboratory lock exchanges run 4–12 % slower than the ideal value because of mixing and friction.',
    ),
  ];
  return {
    ideal: scalar(LOCK_EXCHANGE, 0.5 * c, 'm/s', { g_prime: g }, extra),
    low: LOCK_EXCHANGE_FROUDE.low * c,
    high: LOCK_EXCHANGE_FROUDE.high * c,
    typical: LOCK_EXCHANGE_FROUDE.typical * c,
  };
}

/** U = Fr √(g′h) as a FrontSpeed with both Froude numbers. */
function fromFroude(
  info: MethodInfo,
  fr: number,
  g: number,
  h: number,
  totalDepth: number | undefined,
  inputs: Record<string, number>,
  extra: Warning[] = [],
): FrontSpeed {
  const u = fr * Math.sqrt(g * h);
  return {
    ...scalar(info, u, 'm/s', inputs, extra),
    froude: fr,
    froudeTotal: totalDepth === undefined ? undefined : u / Math.sqrt(g * totalDepth),
  };
}

/** a = h/H, 0 for a deep ambient; throws when h > H. */
/** Range-checked g′ [m/s2] and current depth h [m], and the depth ratio a = h/H (0 for a deep ambient). */
function checkedCurrent(gPrime: number, currentDepth: number, totalDepth?: number) {
  const g = requireInRange('g_prime', gPrime, 'm/s2', { ...positive, max: GRAVITY });
  const h = requireInRange('current_depth', currentDepth, 'm', { ...positive, max: 1e4 });
  return { g, h, a: depthRatio(h, totalDepth) };
}

function depthRatio(h: number, totalDepth: number | undefined, field = 'current_depth'): number {
  if (totalDepth === undefined) return 0;
  const H = requireInRange('total_depth', totalDepth, 'm', { ...positive, max: 1e4 });
  requireInRange(field, h, 'm', { min: 0, minExclusive: true, max: H });
  return h / H;
}
