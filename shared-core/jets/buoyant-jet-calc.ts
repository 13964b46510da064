import { num, text } from '../calc/resolve';
import { arg, type CalcArgs, type CalcMethod, type CalcOutput, type ResultValue } from '../calc/types';
import { buoyantJetTrajectory, type JetTrajectory } from './buoyant-jet';
import { buoyantJetInputFromArgs, jetPathSeries, jetPortParams } from './calc-inputs';
import { BUOYANT_JET } from './closure';
import { DENSE_JET_DILUTION_CHOICES, DENSE_JET_LAB, type DenseJetDilutionChoice } from './dense-jet-lab';

/** `incomplete` for a CalcOutput when a path integration stopped early (step limit or failed step). */
export function incompleteOf(...paths: JetTrajectory[]): { incomplete?: string } {
  const stopped = paths.find((t) => t.status === 'max-steps' || t.status === 'step-failed');
  return stopped ? { incomplete: stopped.message } : {};
}

/** The centreline dilution where the computed near field ends (surface, bed, trapping, return, or the path's end). */
const nearFieldDilution = (t: JetTrajectory) => t.path.dilutionCentreline[t.path.dilutionCentreline.length - 1];

/** Runs the buoyant-jet model for the CLI and reports the headline results. */
function runBuoyantJet(a: CalcArgs): CalcOutput {
  const t = buoyantJetTrajectory({
    ...buoyantJetInputFromArgs(a),
    horizontalAngle: arg.num(a, 'current_angle'),
    denseJetDilution: arg.text<DenseJetDilutionChoice>(a, 'dense_jet_dilution'),
  });
  const results: Record<string, ResultValue> = { max_rise: num(t.maxRise, 'm') };
  const ev = (k: string) => t.events.find((e) => e.kind === k);
  const ret = ev('return to port level');
  if (ret) {
    results.return_distance = num(ret.horizontalDistance, 'm');
    results.return_dilution = num(ret.dilutionCentreline, '1');
  }
  const lab = t.denseJet?.lab;
  if (lab) {
    results.return_dilution_lab = num(lab.returnDilution, '1');
    if (lab.returnDistance !== undefined) results.return_distance_lab = num(lab.returnDistance, 'm');
    if (lab.maxRise !== undefined) results.max_rise_lab = num(lab.maxRise, 'm');
  }
  if (t.denseJet) results.return_dilution_chosen = num(t.denseJet.returnDilution, '1');
  const neutral = ev('neutral buoyancy');
  if (t.outcome === 'trapped' && neutral) results.trap_height = num(neutral.z, 'm');
  const surf = ev('surface contact');
  if (t.outcome === 'surfaces' && surf) results.surface_dilution = num(surf.dilutionCentreline, '1');
  results.near_field_dilution = num(nearFieldDilution(t), '1');
  results.outcome = text(t.outcomeText);
  return {
    results,
    warnings: t.warnings,
    sources: lab ? [BUOYANT_JET.source, DENSE_JET_LAB.source] : [BUOYANT_JET.source],
    series: jetPathSeries(t),
    model: { kind: 'jet', trajectory: t },
    ...incompleteOf(t),
  };
}

export const buoyantJetCalcMethod: CalcMethod = {
  id: 'buoyant-jet',
  title: BUOYANT_JET.title,
  topic: 'jets',
  params: [
    ...jetPortParams,
    {
      kind: 'number',
      name: 'current_angle',
      unit: 'deg',
      description:
        'horizontal angle between the jet and the current (0: with the current, the cautious case; 90: across it; 180: against it)',
      default: 0,
      range: { min: -180, max: 180 },
    },
    {
      kind: 'choice',
      name: 'dense_jet_dilution',
      description:
        'return-point dilution of a dense jet that compliance uses: cautious (the smaller of model and laboratory, the model where the correlations do not apply), model or lab',
      choices: DENSE_JET_DILUTION_CHOICES,
      default: 'cautious',
    },
  ],
  results: [
    { name: 'max_rise', unit: 'm', description: 'highest centreline point above the port' },
    {
      name: 'return_distance',
      unit: 'm',
      description: 'horizontal distance where the centreline falls back to port level (dense jets)',
    },
    { name: 'return_dilution', unit: '1', description: 'centreline dilution at the return point (integral model)' },
    {
      name: 'return_dilution_lab',
      unit: '1',
      description: 'return-point dilution of the laboratory correlations for inclined dense jets (30°–70°)',
    },
    {
      name: 'return_distance_lab',
      unit: 'm',
      description: 'return-point distance of the laboratory correlations (60° jets)',
    },
    {
      name: 'max_rise_lab',
      unit: 'm',
      description: 'terminal rise of the jet top above the port from the laboratory correlations (60° jets)',
    },
    {
      name: 'return_dilution_chosen',
      unit: '1',
      description: 'return-point dilution compliance uses, as dense_jet_dilution chooses',
    },
    { name: 'trap_height', unit: 'm', description: 'height above the port of neutral buoyancy, when trapped' },
    { name: 'surface_dilution', unit: '1', description: 'centreline dilution where the plume reaches the surface' },
    {
      name: 'near_field_dilution',
      unit: '1',
      description:
        'centreline dilution where the computed near field ends (a lower bound when the path followed ends first)',
    },
    { name: 'outcome', unit: '', description: 'how the near field ends, in words' },
  ],
  everyday: { max_path_length: [50, 20000] },
  run: (a) => runBuoyantJet(a),
};
