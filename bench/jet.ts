import * as math from 'mathjs';
import { buoyantJetTrajectory } from '../shared-core/jets/buoyant-jet';
import { buoyantJetRhs, scaledState } from '../shared-core/jets/equations';
import { jetEquationsOf, prepareJetRun } from '../shared-core/jets/trace';
import { demoJetInput } from './demo';
import { bench, report, type Measured } from './harness';

// mathjs types omit solveODE although the library exports it
type SolveOde = (
  f: (t: number, y: number[]) => number[],
  span: number[],
  y0: number[],
  options: object,
) => { t: number[]; y: number[][] };
export const mathjsSolveOde = (math as unknown as { solveODE: SolveOde }).solveODE;

/**
 * The demo's buoyant jet (plume-summer): our trajectory (Dormand–Prince 5(4) with events, rtol 1e-8) against the
 * same scaled equations (buoyantJetRhs) integrated by mathjs solveODE (RK45, tol 1e-8, no events) over the same
 * path length. Both end states are compared so that the two solve the same problem.
 */
export function benchJet(): Measured {
  const input = demoJetInput();
  const ours = buoyantJetTrajectory(input);
  const run = prepareJetRun(input);
  const eq = jetEquationsOf(run, 'round');
  const sEnd = ours.path.s[ours.path.s.length - 1] / run.D;
  const y0 = scaledState(run.start, eq);
  const baselineRun = () =>
    mathjsSolveOde((_t, y) => buoyantJetRhs(y, eq), [0, sEnd], y0, { tol: 1e-8, firstStep: 0.01, maxIter: 1e6 });
  const reference = baselineRun();
  const dilutionOurs = ours.path.dilutionAverage[ours.path.dilutionAverage.length - 1];
  const dilutionBaseline = reference.y[reference.y.length - 1][3]; // Q / Q0: the volume flux is scaled by Q0
  const o = bench('buoyantJetTrajectory', () => buoyantJetTrajectory(input));
  const b = bench('mathjs solveODE', baselineRun, 1500);
  const agree = Math.abs(dilutionBaseline / dilutionOurs - 1);
  return {
    values: { jet_speedup_vs_mathjs: b.microseconds / o.microseconds },
    lines: [
      report(
        `Buoyant jet, demo plume-summer, ${ours.path.s[ours.path.s.length - 1].toFixed(1)} m`,
        o,
        b,
        `(${ours.evaluations} evaluations, ${reference.t.length} mathjs steps; end dilution agrees to ${agree.toExponential(1)})`,
      ),
    ],
  };
}
