import { qty } from '../core/quantity-text';
import { num } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { InputError } from '../core/errors';
import { caution, note } from '../core/warning';
import { DENSITY_METHODS, seawaterSalinityLimit } from '../water/density';
import { SHARQAWY_2010 } from '../water/brine';
import {
  n2Profile,
  mixedLayerDepth,
  thermoclineDepth,
  twoLayerFit,
  stabilityFlags,
  MIXED_LAYER_THRESHOLD,
  THERMOCLINE_MAX_GRADIENT,
  TWO_LAYER_FIT,
} from './stratification';
import { largestFinite, type Profile } from './profile';
import type { CalcOutput, Series } from '../calc/types';

/** Summary of a measured profile: mixed layer, thermocline, peak N² and the equivalent two layers. */
export function summariseProfile(p: Profile): CalcOutput {
  const mld = mixedLayerDepth(p);
  const th = thermoclineDepth(p);
  const fit = twoLayerFit(p);
  const n2 = n2Profile(p).n2;
  const warnings = [...p.warnings, ...fit.warnings];
  if (mld.mixedToBottom)
    warnings.push(
      note(
        'mixed-to-bottom',
        'The density never exceeds the surface value by 0.03 kg/m³: the column is mixed to the bottom.',
      ),
    );
  if (th.weak)
    warnings.push(
      note(
        'no-thermocline',
        `The largest density gradient is ${qty(th.gradient, 'kg/m3', 3)} per metre of depth, below ${qty(0.1, 'kg/m3')} per metre: there is no distinct thermocline.`,
      ),
    );
  const unstable = stabilityFlags(p).filter((f) => f.stability === 'unstable');
  for (const f of unstable)
    warnings.push(
      caution(
        'density-inversion',
        `Density inversion between ${f.top} m and ${f.bottom} m (N² = ${f.n2.toExponential(2)} 1/s²): unstable or a sensor error.`,
        'file',
      ),
    );
  return {
    results: {
      mixed_layer_depth: num(mld.value, 'm'),
      thermocline_depth: num(th.value, 'm'),
      n2_max: num(largestFinite(n2), '1/s2'),
      upper_thickness: num(fit.upperThickness, 'm'),
      rho_upper: num(fit.rhoUpper, 'kg/m3'),
      rho_lower: num(fit.rhoLower, 'kg/m3'),
      g_prime: num(fit.gPrime, 'm/s2'),
    },
    warnings,
    sources: [
      DENSITY_METHODS[p.eos].source,
      ...(p.eos !== 'fresh' && p.salinity.some((s) => s > seawaterSalinityLimit(p.eos as 'eos80' | 'teos10'))
        ? [SHARQAWY_2010.source]
        : []),
      MIXED_LAYER_THRESHOLD.source,
      THERMOCLINE_MAX_GRADIENT.source,
      TWO_LAYER_FIT.source,
    ],
    series: profileSeries(p),
  };
}

/** Profile charts: temperature, salinity and density against depth, and N² at the mid-depths. */
export function profileSeries(p: Profile): Series[] {
  const depth = { label: 'Depth', unit: 'm', values: [...p.depth] };
  const n2 = n2Profile(p);
  const out: Series[] = [
    {
      kind: 'profile-temperature',
      title: 'Temperature',
      x: depth,
      y: [{ label: 'Temperature', unit: 'degC', values: [...p.temperature] }],
      depthAxis: true,
      caption: 'Measured temperature against depth',
    },
    {
      kind: 'profile-density',
      title: 'Density',
      x: depth,
      y: [{ label: 'Density', unit: 'kg/m3', values: [...p.density] }],
      depthAxis: true,
      caption: `Potential density (${p.eos}) against depth`,
    },
    {
      kind: 'profile-n2',
      title: 'Buoyancy frequency squared',
      x: { label: 'Depth', unit: 'm', values: n2.depth },
      y: [{ label: 'N²', unit: '1/s2', values: n2.n2 }],
      depthAxis: true,
      caption: 'N² between samples, at mid-depths',
    },
  ];
  if (p.salinity.some((s) => s > 0))
    out.splice(1, 0, {
      kind: 'profile-salinity',
      title: 'Salinity',
      x: depth,
      y: [{ label: 'Salinity', unit: 'PSU', values: [...p.salinity] }],
      depthAxis: true,
      caption: 'Measured practical salinity against depth',
    });
  for (const c of p.extra)
    out.push({
      kind: 'profile-extra',
      title: c.name,
      x: depth,
      y: [{ label: c.name, unit: c.unit || '1', values: [...c.values] }],
      depthAxis: true,
      caption: `${c.name} against depth`,
    });
  return out;
}

export const profileCalcMethods: CalcMethod[] = [
  {
    id: 'profile-summary',
    title: 'Stratification summary of a measured profile',
    topic: 'profile',
    params: [
      {
        kind: 'profile',
        name: 'file',
        description:
          'path to a CSV profile (depth or elevation, temperature, optional salinity, sediment, extra columns)',
      },
    ],
    results: [
      { name: 'mixed_layer_depth', unit: 'm', description: 'density-threshold mixed-layer depth' },
      { name: 'thermocline_depth', unit: 'm', description: 'depth of the largest density gradient' },
      { name: 'n2_max', unit: '1/s2', description: 'largest squared buoyancy frequency' },
      { name: 'upper_thickness', unit: 'm', description: 'upper-layer thickness of the two-layer fit' },
      { name: 'rho_upper', unit: 'kg/m3', description: 'upper-layer density of the fit' },
      { name: 'rho_lower', unit: 'kg/m3', description: 'lower-layer density of the fit' },
      { name: 'g_prime', unit: 'm/s2', description: 'reduced gravity between the fitted layers' },
    ],
    run(a) {
      const p = arg.profile(a);
      if (!p) throw new InputError('file', '(missing)', '', 'a CSV profile', 'a profile file is required');
      return summariseProfile(p);
    },
  },
];
