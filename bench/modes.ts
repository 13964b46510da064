import * as math from 'mathjs';
import { constantN2Column, verticalModesFromN2 } from '../shared-core/internal-waves/modes';
import { bench, ms, report, type Measured } from './harness';

const H = 40,
  N = 0.02,
  MODES = 3;
const column = constantN2Column(N, H);
const ours = (cells: number) => () => verticalModesFromN2(column, H, { modes: MODES, cells });

/** The same rigid-lid, constant-N problem as a dense (cells−1)² matrix, every eigenpair by mathjs eigs. */
function denseModes(cells: number) {
  const h = H / cells,
    k = 1 / (h * h * N * N);
  const a = Array.from({ length: cells - 1 }, (_, i) =>
    Array.from({ length: cells - 1 }, (_, j) => (i === j ? 2 * k : Math.abs(i - j) === 1 ? -k : 0)),
  );
  return () => (math.eigs(math.matrix(a)).values as math.Matrix).toArray() as number[];
}

/** Least-squares slope of log y against log x. */
export function logLogSlope(x: readonly number[], y: readonly number[]): number {
  const lx = x.map(Math.log),
    ly = y.map(Math.log);
  const mx = lx.reduce((s, v) => s + v, 0) / lx.length,
    my = ly.reduce((s, v) => s + v, 0) / ly.length;
  let sxy = 0,
    sxx = 0;
  lx.forEach((v, i) => {
    sxy += (v - mx) * (ly[i] - my);
    sxx += (v - mx) ** 2;
  });
  return sxy / sxx;
}

/**
 * Vertical modes (3 modes): ours against mathjs eigs on the dense matrix at 200 cells (one call: it takes seconds),
 * and how our time grows with the grid from 200 to 20 000 cells (exponent 1 is linear).
 */
export function benchModes(): Measured {
  const cells = 200;
  const dense = denseModes(cells);
  const t0 = performance.now();
  const lambdas = dense();
  const denseMs = performance.now() - t0;
  const c1Dense = 1 / Math.sqrt(Math.min(...lambdas));
  const c1Ours = ours(cells)().modes[0].celerity;
  const o = bench('verticalModesFromN2', ours(cells));
  const base = { name: 'mathjs eigs (dense, 1 call)', microseconds: denseMs * 1000, calls: 1 };

  const grid = [200, 632, 2000, 6325, 20000];
  const times = grid.map((n) => bench(`cells ${n}`, ours(n), 400).microseconds);
  const exponent = logLogSlope(grid, times);
  return {
    values: { modes_speedup_vs_dense: base.microseconds / o.microseconds, modes_time_exponent: exponent },
    lines: [
      report(
        `Vertical modes, ${cells} cells, ${MODES} modes`,
        o,
        base,
        `(c1 ${c1Ours.toFixed(5)} vs dense ${c1Dense.toFixed(5)} m/s)`,
      ),
      `${'Vertical modes, time against cells'.padEnd(44)} ${grid.map((n, i) => `${n}: ${ms(times[i] / 1000)}`).join(', ')}   exponent ${exponent.toFixed(2)}`,
    ],
  };
}
