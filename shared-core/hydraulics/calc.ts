import { num, text } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { STRATIFIED_OBSTACLE_FLOW, stratifiedObstacleFlow } from './obstacle';

/** The hydraulics methods of `gprime calc`. */
export const hydraulicsCalcMethods: CalcMethod[] = [
  {
    id: 'obstacle-flow',
    title: 'Stratified flow over an obstacle: Froude number, blocking and lee-wave length',
    topic: 'hydraulics',
    params: [
      { kind: 'number', name: 'velocity', unit: 'm/s', description: 'approach velocity U', range: { min: 1e-6, max: 100 } },
      { kind: 'number', name: 'buoyancy_frequency', unit: '1/s', description: 'buoyancy frequency N of the approach flow', range: { min: 1e-6, max: 1 } },
      { kind: 'number', name: 'obstacle_height', unit: 'm', description: 'obstacle (sill, ridge) height h above the bed', range: { min: 1e-3, max: 11000 } },
      { kind: 'number', name: 'depth', unit: 'm', description: 'total water depth H upstream', range: { min: 1e-3, max: 11000 } },
    ],
    results: [
      { name: 'froude', unit: '1', description: 'obstacle Froude number U/(N h)' },
      { name: 'lee_wavelength', unit: 'm', description: 'lee-wave length 2πU/N' },
      { name: 'blocked', unit: '', description: 'yes when Nh/U > 1: water below the dividing streamline is blocked upstream' },
    ],
    run(a) {
      const r = stratifiedObstacleFlow(arg.num(a, 'velocity'), arg.num(a, 'buoyancy_frequency'), arg.num(a, 'obstacle_height'), arg.num(a, 'depth'));
      const warnings = [...r.warnings];
      if (r.blocked) warnings.push(`Water below about ${r.dividingStreamlineHeight.toPrecision(3)} m above the base (the dividing streamline) cannot pass over the obstacle and is held upstream.`);
      return {
        results: { froude: num(r.froude, '1'), lee_wavelength: num(r.leeWavelength, 'm'), blocked: text(r.blocked ? 'yes' : 'no') },
        warnings, sources: [STRATIFIED_OBSTACLE_FLOW.source],
      };
    },
  },
];
