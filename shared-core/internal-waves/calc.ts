import { num, text } from '../calc/resolve';
import { qty } from '../core/quantity-text';
import { arg, type CalcArgs, type CalcMethod, type ResultSpec, type Series } from '../calc/types';
import { InputError } from '../core/errors';
import { positive } from '../core/range';
import { note } from '../core/warning';
import {
  INTERFACIAL_DISPERSION_FREE_SURFACE,
  SOLITARY_WAVE_KDV,
  dispersionCurve,
  polarityText,
  solitaryWaveKdv,
  twoLayerFreeSurfaceCelerities,
  type TwoLayer,
} from './two-layer';
import {
  VERTICAL_MODES,
  constantN2Column,
  verticalModesFromN2,
  verticalModesFromProfile,
  type VerticalModes,
} from './modes';
import {
  INTERNAL_SEICHE_TWO_LAYER,
  WEDDERBURN_NUMBER,
  WIND_STRESS_LARGE_POND_1981,
  internalSeichePeriodTwoLayer,
  upwellingRiskStatement,
  wedderburnNumber,
  windStressLargePond1981,
} from './basin';

const DENSITY = { min: 500, max: 3000 };
const THICKNESS = { ...positive, max: 11000 };
/** Most modes `gprime calc vertical-modes` reports. */
export const MAX_CLI_MODES = 10;

const twoLayerParams = [
  { kind: 'number', name: 'rho_upper', unit: 'kg/m3', description: 'upper-layer density ρ1', range: DENSITY },
  { kind: 'number', name: 'rho_lower', unit: 'kg/m3', description: 'lower-layer density ρ2 (> ρ1)', range: DENSITY },
  { kind: 'number', name: 'upper_thickness', unit: 'm', description: 'upper-layer thickness h1', range: THICKNESS },
  { kind: 'number', name: 'lower_thickness', unit: 'm', description: 'lower-layer thickness h2', range: THICKNESS },
] as const;

function twoLayerOf(a: CalcArgs): TwoLayer {
  return {
    rhoUpper: arg.num(a, 'rho_upper'),
    rhoLower: arg.num(a, 'rho_lower'),
    upperThickness: arg.num(a, 'upper_thickness'),
    lowerThickness: arg.num(a, 'lower_thickness'),
  };
}

const modeResults: ResultSpec[] = Array.from({ length: MAX_CLI_MODES }, (_, i) => ({
  name: `celerity_${i + 1}`,
  unit: 'm/s',
  description: `long-wave phase speed of internal mode ${i + 1} (present when modes ≥ ${i + 1})`,
}));

export const internalWaveCalcMethods: CalcMethod[] = [
  {
    id: 'two-layer-wave',
    title: 'Two-layer interfacial wave speed (linear dispersion, first-order solitary-wave correction)',
    topic: 'internal-waves',
    params: [
      ...twoLayerParams,
      {
        kind: 'number',
        name: 'wavelength',
        unit: 'm',
        description: 'wavelength (omit for long waves)',
        optional: true,
        range: { ...positive, max: 1e8 },
      },
      {
        kind: 'number',
        name: 'amplitude',
        unit: 'm',
        description: 'magnitude of the interface displacement (polarity follows from the thicknesses)',
        default: 0,
        range: { min: 0, max: 22000 },
      },
    ],
    results: [
      {
        name: 'celerity',
        unit: 'm/s',
        description: 'interfacial phase speed at the wavelength, plus the first-order amplitude correction',
      },
      {
        name: 'long_wave_celerity',
        unit: 'm/s',
        description: 'linear long-wave interfacial speed (free surface, full density ratio)',
      },
      {
        name: 'polarity',
        unit: '',
        description: 'solitary-wave polarity (depression when the upper layer is thinner)',
      },
    ],
    run(a) {
      const s = twoLayerOf(a);
      const wavelength = arg.optNum(a, 'wavelength');
      const amplitude = arg.num(a, 'amplitude');
      const longWave = twoLayerFreeSurfaceCelerities(s).interfacial;
      const linear = twoLayerFreeSurfaceCelerities(s, wavelength).interfacial;
      const sw = solitaryWaveKdv(s, amplitude);
      const warnings = [...sw.warnings];
      if (wavelength !== undefined && amplitude > 0)
        warnings.push(
          note(
            'amplitude-correction-indicative',
            'The amplitude correction is that of a long solitary wave; added to a finite-wavelength speed it is indicative only.',
            'wavelength',
          ),
        );
      const sources = [INTERFACIAL_DISPERSION_FREE_SURFACE.source, SOLITARY_WAVE_KDV.source];
      return {
        results: {
          celerity: num(linear + (sw.celerity - sw.linearCelerity), 'm/s'),
          long_wave_celerity: num(longWave, 'm/s'),
          polarity: text(polarityText(sw.polarity)),
        },
        warnings,
        sources,
        series: [dispersionSeries(s)],
      };
    },
  },
  {
    id: 'vertical-modes',
    title: 'Internal-wave vertical modes: phase speeds of the first modes (rigid lid)',
    topic: 'internal-waves',
    params: [
      {
        kind: 'profile',
        name: 'file',
        description: 'CSV profile (depth, temperature, optional salinity …); or give buoyancy_frequency and depth',
        optional: true,
      },
      {
        kind: 'number',
        name: 'buoyancy_frequency',
        unit: '1/s',
        description: 'constant buoyancy frequency N (instead of a profile)',
        optional: true,
        range: { ...positive, max: 1 },
      },
      {
        kind: 'number',
        name: 'depth',
        unit: 'm',
        description: 'water depth H for constant N',
        optional: true,
        range: THICKNESS,
      },
      {
        kind: 'number',
        name: 'modes',
        unit: '1',
        description: `number of modes (1 … ${MAX_CLI_MODES})`,
        default: 3,
        range: { min: 1, max: MAX_CLI_MODES },
      },
    ],
    results: modeResults,
    run(a) {
      const modes = Math.round(arg.num(a, 'modes'));
      const p = arg.profile(a);
      const N = arg.optNum(a, 'buoyancy_frequency'),
        H = arg.optNum(a, 'depth');
      if (p && (N !== undefined || H !== undefined))
        throw new InputError(
          'file',
          '(profile)',
          '',
          'either file or buoyancy_frequency + depth',
          'give either a profile file or buoyancy_frequency and depth, not both',
        );
      if (!p && (N === undefined || H === undefined))
        throw new InputError(
          N === undefined ? 'buoyancy_frequency' : 'depth',
          '(missing)',
          N === undefined ? '1/s' : 'm',
          'a profile file, or both buoyancy_frequency and depth',
          'give a profile file, or both buoyancy_frequency and depth',
        );
      const r = p
        ? verticalModesFromProfile(p, { modes })
        : verticalModesFromN2(constantN2Column(N!, H!), H!, { modes });
      const results = Object.fromEntries(r.modes.map((m) => [`celerity_${m.n}`, num(m.celerity, 'm/s')]));
      return { results, warnings: r.warnings, sources: [VERTICAL_MODES.source], series: [modeShapeSeries(r)] };
    },
  },
  {
    id: 'internal-seiche',
    title: 'First-mode internal seiche period of a two-layer basin',
    topic: 'internal-waves',
    params: [
      {
        kind: 'number',
        name: 'basin_length',
        unit: 'm',
        description: 'basin length along the thalweg',
        range: { ...positive, max: 1e6 },
      },
      ...twoLayerParams,
    ],
    results: [
      { name: 'period', unit: 's', description: 'period of the first vertical, first horizontal internal seiche' },
    ],
    run(a) {
      const r = internalSeichePeriodTwoLayer(arg.num(a, 'basin_length'), twoLayerOf(a));
      return {
        results: { period: num(r.value, 's') },
        warnings: r.warnings,
        sources: [INTERNAL_SEICHE_TWO_LAYER.source],
      };
    },
  },
  {
    id: 'wedderburn',
    title: 'Wedderburn number and wind-driven upwelling risk',
    topic: 'internal-waves',
    params: [
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity across the thermocline',
        range: { ...positive, max: 20 },
      },
      {
        kind: 'number',
        name: 'upper_thickness',
        unit: 'm',
        description: 'upper mixed-layer thickness h1',
        range: THICKNESS,
      },
      {
        kind: 'number',
        name: 'wind_speed',
        unit: 'm/s',
        description: 'wind speed at 10 m',
        range: { ...positive, max: 60 },
      },
      {
        kind: 'number',
        name: 'basin_length',
        unit: 'm',
        description: 'fetch (basin length along the wind)',
        range: { ...positive, max: 1e6 },
      },
    ],
    results: [
      { name: 'wedderburn', unit: '1', description: 'W = g′h1²/(u*²L)' },
      { name: 'shear_velocity', unit: 'm/s', description: 'water-side friction velocity u*' },
      { name: 'upwelling_risk', unit: '', description: 'plain-language upwelling-risk statement' },
    ],
    run(a) {
      const h = arg.num(a, 'upper_thickness');
      const ws = windStressLargePond1981(arg.num(a, 'wind_speed'));
      const w = wedderburnNumber(arg.num(a, 'g_prime'), h, ws.shearVelocity, arg.num(a, 'basin_length'));
      const warnings = [
        ...ws.warnings,
        ...w.warnings,
        note(
          'drag-coefficient',
          `Drag coefficient C_D = ${ws.dragCoefficient.toExponential(2)} (Large & Pond 1981), air density ${qty(1.225, 'kg/m3')}, water density ${qty(1000, 'kg/m3')}.`,
        ),
      ];
      return {
        results: {
          wedderburn: num(w.value, '1'),
          shear_velocity: num(ws.shearVelocity, 'm/s'),
          upwelling_risk: text(upwellingRiskStatement(w.value, h)),
        },
        warnings,
        sources: [WEDDERBURN_NUMBER.source, WIND_STRESS_LARGE_POND_1981.source],
      };
    },
  },
];

/** Chart curve: interfacial phase speed against wavelength, rigid lid and free surface. */
export function dispersionSeries(s: TwoLayer): Series {
  const pts = dispersionCurve(s);
  return {
    kind: 'dispersion-curve',
    title: 'Interfacial wave dispersion',
    x: { label: 'Wavelength', unit: 'm', values: pts.map((p) => p.wavelength) },
    y: [
      { label: 'Phase speed, rigid lid', unit: 'm/s', values: pts.map((p) => p.rigidLid) },
      { label: 'Phase speed, free surface', unit: 'm/s', values: pts.map((p) => p.interfacial) },
    ],
    caption: 'Two-layer interfacial phase speed against wavelength (long waves on the right)',
  };
}

/** Chart curve: vertical-displacement shapes of the modes against depth. */
export function modeShapeSeries(r: VerticalModes): Series {
  return {
    kind: 'mode-shape',
    title: 'Vertical mode shapes',
    x: { label: 'Depth', unit: 'm', values: [...r.depth] },
    y: r.modes.map((m) => ({
      label: `Mode ${m.n} displacement (c = ${m.celerity.toFixed(3)} m/s)`,
      unit: '1',
      values: [...m.displacement],
    })),
    depthAxis: true,
    caption: 'Vertical-displacement structure of each mode, scaled to a maximum of 1',
  };
}
