import { positive, nonNegative, requireInRange } from '../core/range';
import type { MethodInfo } from '../core/method';
import { note, type Warning } from '../core/warning';
import { LOCK_EXCHANGE_FROUDE, lockExchangeSpeed } from '../gravity-currents/front-speed';

export const NAVIGATION_LOCK_EXCHANGE: MethodInfo = {
  id: 'navigation-lock-exchange',
  title: 'Water and salt exchanged through an open lock gate vs the time it is open',
  source:
    'Front speed and half-depth layers of the full-depth lock exchange: Yih (1965) Dynamics of Nonhomogeneous Fluids §3; Benjamin (1968) J. Fluid Mech. 31, 209–248; experimental range as in Simpson (1997) Gravity Currents, Ch. 12. Exponential approach to full exchange after the currents reflect from the closed far gate: common practice, no source.',
  equation:
    'U = k√(g′H); V = ½ B H U t for t ≤ L/U; V = V_lock (1 − ½ e^(−(t − L/U)/(L/U))) after; salt mass = ρ ΔS V / 1000',
  validity: {},
};

/** Exchanged volume and salt vs gate-open time; arrays have the length of `time`. */
export interface LockExchangeSeries {
  /** [s] gate-open times */ time: number[];
  /** [m3] volume exchanged each way */ volume: number[];
  /** [kg] salt carried into the fresh side */ saltMass: number[];
  /** [m/s] front speed used */ frontSpeed: number;
  /** [s] time for the fronts to reach the ends of the chamber, L/U */ traverseTime: number;
  /** [m3] chamber volume L B H */ chamberVolume: number;
  warnings: Warning[];
}

export interface LockExchangeInput {
  /** [m/s2] */ gPrime: number;
  /** [m] chamber length L, width B, water depth H */ length: number;
  width: number;
  depth: number;
  /** [g/kg] salinity difference across the open gate (practical salinity is close enough) */ salinityDifference: number;
  /** [kg/m3] density of the salt water; default 1025 */ seaDensity?: number;
  /** front-speed coefficient: ideal ½ or the typical laboratory value 0.46 (default) */ speed?: 'ideal' | 'typical';
}

/**
 * Exchanged volume [m3] and salt mass [kg] through an open lock gate for each gate-open time [s].
 * @source see NAVIGATION_LOCK_EXCHANGE. @validity empty chamber, gate opened fully and at once, no ships, no flushing.
 */
export function navigationLockExchange(input: LockExchangeInput, times: readonly number[]): LockExchangeSeries {
  const L = requireInRange('length', input.length, 'm', { ...positive, max: 1e4 });
  const B = requireInRange('width', input.width, 'm', { ...positive, max: 1e3 });
  const ds = requireInRange('salinity_difference', input.salinityDifference, 'g/kg', { min: 0, max: 70 });
  const rho = requireInRange('sea_density', input.seaDensity ?? 1025, 'kg/m3', { min: 990, max: 1100 });
  const s = lockExchangeSpeed(input.gPrime, input.depth);
  const H = input.depth;
  const U = input.speed === 'ideal' ? s.ideal.value : s.typical;
  const T = L / U,
    V = L * B * H;
  const volume = times.map((t) => {
    requireInRange('time', t, 's', nonNegative);
    return t <= T ? 0.5 * B * H * U * t : V * (1 - 0.5 * Math.exp(-(t - T) / T));
  });
  const warnings = [
    note(
      'exchange-approach-rule-of-thumb',
      `Front speed ${input.speed === 'ideal' ? LOCK_EXCHANGE_FROUDE.ideal : LOCK_EXCHANGE_FROUDE.typical}√(g′H); after the currents reflect (t > L/U) the approach to full exchange is a simple exponential (common practice, no source).`,
    ),
  ];
  return {
    time: [...times],
    volume,
    saltMass: volume.map((v) => (rho * ds * v) / 1000),
    frontSpeed: U,
    traverseTime: T,
    chamberVolume: V,
    warnings,
  };
}
