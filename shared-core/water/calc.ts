import { num } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { positive, nonNegative } from '../core/range';
import { DENSITY_METHODS, EQUATIONS_OF_STATE, waterDensity, defaultEos, type EquationOfState } from './density';
import { SHARQAWY_2010 } from './brine';
import { SEDIMENT_MIXTURE } from './sediment';
import {
  reducedGravity,
  densimetricFroude,
  REDUCED_GRAVITY,
  DENSIMETRIC_FROUDE,
  type DensityReference,
} from './buoyancy';
import { kinematicViscosityWater, VISCOSITY_KESTIN_1978 } from './transport';
import { KELL_1975 } from './fresh-density';
import { practicalSalinityPss78, PSS78 } from './salinity';

export const waterCalcMethods: CalcMethod[] = [
  {
    id: 'water-density',
    title: 'Density of fresh, salt or sediment-laden water',
    topic: 'water',
    params: [
      {
        kind: 'number',
        name: 'temperature',
        unit: 'degC',
        description: 'temperature (ITS-90)',
        range: { min: -3, max: 60 },
      },
      {
        kind: 'number',
        name: 'salinity',
        unit: 'PSU',
        description: 'practical salinity',
        default: 0,
        range: { min: 0, max: 70 },
      },
      {
        kind: 'number',
        name: 'sediment',
        unit: 'kg/m3',
        description: 'suspended sediment concentration',
        default: 0,
        range: { ...nonNegative, max: 2650 },
      },
      {
        kind: 'number',
        name: 'pressure',
        unit: 'dbar',
        description: 'sea pressure',
        default: 0,
        range: { min: 0, max: 12000 },
      },
      {
        kind: 'choice',
        name: 'eos',
        description: 'equation of state (default: fresh when salinity is 0, else eos80)',
        choices: EQUATIONS_OF_STATE,
        optional: true,
      },
    ],
    results: [{ name: 'density', unit: 'kg/m3', description: 'in-situ density' }],
    run(a) {
      const salinity = arg.num(a, 'salinity');
      const eos = (arg.text<EquationOfState>(a, 'eos') as EquationOfState | undefined) ?? defaultEos(salinity);
      const r = waterDensity({
        temperature: arg.num(a, 'temperature'),
        salinity,
        sediment: arg.num(a, 'sediment'),
        pressure: arg.num(a, 'pressure'),
        eos,
      });
      const brine = r.method.startsWith(SHARQAWY_2010.id);
      const sources = [
        (brine ? SHARQAWY_2010 : DENSITY_METHODS[eos]).source,
        ...(arg.num(a, 'sediment') > 0 ? [SEDIMENT_MIXTURE.source] : []),
      ];
      return { results: { density: num(r.value, 'kg/m3') }, warnings: r.warnings, sources };
    },
  },
  {
    id: 'reduced-gravity',
    title: 'Reduced gravity g′ between two waters',
    topic: 'water',
    params: [
      {
        kind: 'number',
        name: 'rho_upper',
        unit: 'kg/m3',
        description: 'density of the lighter (upper) water',
        range: { min: 500, max: 3000 },
      },
      {
        kind: 'number',
        name: 'rho_lower',
        unit: 'kg/m3',
        description: 'density of the heavier (lower) water',
        range: { min: 500, max: 3000 },
      },
      {
        kind: 'choice',
        name: 'reference',
        description: 'density in the denominator',
        choices: ['lower', 'upper', 'mean'],
        default: 'lower',
      },
    ],
    results: [{ name: 'g_prime', unit: 'm/s2', description: 'g (ρ_lower − ρ_upper)/ρ_ref' }],
    run(a) {
      const r = reducedGravity(
        arg.num(a, 'rho_upper'),
        arg.num(a, 'rho_lower'),
        arg.text<DensityReference>(a, 'reference'),
      );
      return { results: { g_prime: num(r.value, 'm/s2') }, warnings: r.warnings, sources: [REDUCED_GRAVITY.source] };
    },
  },
  {
    id: 'densimetric-froude',
    title: 'Densimetric Froude number',
    topic: 'water',
    params: [
      { kind: 'number', name: 'velocity', unit: 'm/s', description: 'flow velocity', range: { min: -1000, max: 1000 } },
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity',
        range: { ...positive, max: 20 },
      },
      {
        kind: 'number',
        name: 'length',
        unit: 'm',
        description: 'length scale (depth, diameter …)',
        range: { ...positive, max: 1e6 },
      },
    ],
    results: [{ name: 'froude', unit: '1', description: 'U/√(g′L)' }],
    run(a) {
      const r = densimetricFroude(arg.num(a, 'velocity'), arg.num(a, 'g_prime'), arg.num(a, 'length'));
      return { results: { froude: num(r.value, '1') }, warnings: r.warnings, sources: [DENSIMETRIC_FROUDE.source] };
    },
  },
  {
    id: 'viscosity',
    title: 'Kinematic viscosity of water',
    topic: 'water',
    params: [
      { kind: 'number', name: 'temperature', unit: 'degC', description: 'temperature', range: { min: -8, max: 150 } },
    ],
    results: [{ name: 'kinematic_viscosity', unit: 'm2/s', description: 'ν = μ/ρ' }],
    run(a) {
      const r = kinematicViscosityWater(arg.num(a, 'temperature'));
      return {
        results: { kinematic_viscosity: num(r.value, 'm2/s') },
        warnings: r.warnings,
        sources: [VISCOSITY_KESTIN_1978.source, KELL_1975.source],
      };
    },
  },
  {
    id: 'salinity',
    title: 'Practical salinity from conductivity (PSS-78)',
    topic: 'water',
    params: [
      {
        kind: 'number',
        name: 'conductivity',
        unit: 'mS/cm',
        description: 'in-situ conductivity (mS/cm; S/m or µS/cm by unit; for specific conductance give temperature=25)',
        range: { ...nonNegative, max: 100 },
      },
      {
        kind: 'number',
        name: 'temperature',
        unit: 'degC',
        description: 'in-situ temperature (ITS-90)',
        range: { min: -3, max: 60 },
      },
      {
        kind: 'number',
        name: 'pressure',
        unit: 'dbar',
        description: 'sea pressure',
        default: 0,
        range: { min: 0, max: 12000 },
      },
    ],
    results: [{ name: 'salinity', unit: 'PSU', description: 'practical salinity (PSS-78)' }],
    everyday: { conductivity: [0.05, 60], temperature: [0, 30], pressure: [0, 200] },
    run(a) {
      const r = practicalSalinityPss78(arg.num(a, 'conductivity'), arg.num(a, 'temperature'), arg.num(a, 'pressure'));
      return { results: { salinity: num(r.value, 'PSU') }, warnings: r.warnings, sources: [PSS78.source] };
    },
  },
];
