import { create, erfDependencies } from 'mathjs';
import { brentRoot } from '../numerics/roots';

let erfMath: ReturnType<typeof create> | undefined;

/** The mathjs instance for erf, created on first use (a start that draws no sample does not pay for it). */
const math = () => (erfMath ??= create({ erfDependencies }));

/**
 * Seeded pseudo-random numbers in [0, 1): the 32-bit "mulberry32" generator (T. Ettinger, public domain).
 * Not for cryptography; chosen so that the same seed gives the same draws on every machine.
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal distribution function Φ(x) = ½(1 + erf(x/√2)) (Abramowitz & Stegun 1964, 26.2.29). */
export function normalCdf(x: number): number {
  return 0.5 * (1 + (math().erf(x / Math.SQRT2) as number));
}

/**
 * Standard normal quantile z(p), Φ(z) = p, by Brent's method on Φ (mathjs erf, W.J. Cody's rational
 * approximations). Accurate to ~1e-12 in z for 1e-12 < p < 1 − 1e-12.
 */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`normal quantile needs 0 < p < 1, got ${p}`);
  if (p === 0.5) return 0;
  const z = brentRoot((x) => normalCdf(x) - p, -9, 9, 1e-13);
  if (z === undefined) throw new RangeError(`normal quantile of ${p} is outside ±9`);
  return z;
}

/**
 * Latin hypercube sample of `dimensions` independent uniforms on (0, 1): each dimension's n draws fall one
 * in each of n equal strata, in a random order (McKay, Beckman & Conover 1979, Technometrics 21, 239–245).
 * Returns rows[sample][dimension].
 */
export function latinHypercube(n: number, dimensions: number, random: () => number): number[][] {
  const rows = Array.from({ length: n }, () => new Array<number>(dimensions).fill(0));
  for (let d = 0; d < dimensions; d++) {
    const order = Array.from({ length: n }, (_, i) => i);
    for (let i = n - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1));
      [order[i], order[j]] = [order[j], order[i]];
    }
    for (let i = 0; i < n; i++) rows[i][d] = (order[i] + random()) / n;
  }
  return rows;
}

/**
 * The p-quantile of a sample by linear interpolation between order statistics, "type 7" of Hyndman &
 * Fan (1996), Am. Statist. 50, 361–365 (the default of R and NumPy). `sorted` must be ascending.
 */
export function sampleQuantile(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) throw new RangeError('quantile of an empty sample');
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}
