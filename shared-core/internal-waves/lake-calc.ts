import { num, text } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { InputError } from '../core/errors';
import { positive } from '../core/range';
import { caution, note } from '../core/warning';
import { qty } from '../core/quantity-text';
import { profileBottom } from '../profile/profile';
import { thermoclineDepth } from '../profile/stratification';
import {
  LAKE_NUMBER,
  WIND_STRESS_LARGE_POND_1981,
  lakeNumberImbergerPatterson1990,
  windStressLargePond1981,
  type Hypsography,
} from './basin';

const NUMBER = '[-+]?\\d*\\.?\\d+(?:[eE][-+]?\\d+)?';
const PAIR = new RegExp(`^(${NUMBER})\\s*:\\s*(${NUMBER})$`);
/** Most depth–area pairs of one hypsographic curve. */
const MAX_PAIRS = 1000;

/** Parses `hypsography=0:2e6,10:1.2e6,30:0` (depth below the surface in m : horizontal area in m², one pair per depth). */
export function parseHypsography(textValue: string): Hypsography {
  const pairs = textValue
    .split(/[,;]/)
    .map((s) => s.trim())
    .filter((s) => s !== '');
  const expect = 'depth:area pairs from the surface down, e.g. 0:2e6,10:1.2e6,30:0';
  if (pairs.length < 2 || pairs.length > MAX_PAIRS)
    throw new InputError('hypsography', textValue, '', expect, `give 2 to ${MAX_PAIRS} depth:area pairs (m : m²)`);
  const depth: number[] = [],
    area: number[] = [];
  for (const pair of pairs) {
    const m = PAIR.exec(pair);
    if (!m) throw new InputError('hypsography', pair, '', expect, `"${pair}" is not a depth:area pair (m : m²)`);
    depth.push(Number(m[1]));
    area.push(Number(m[2]));
  }
  return { depth, area };
}

/** The basin-stability methods of `gprime calc` that need a measured profile and the basin's shape. */
export const lakeCalcMethods: CalcMethod[] = [
  {
    id: 'lake-number',
    title: 'Lake number and Schmidt stability of a stratified basin under wind',
    topic: 'internal-waves',
    params: [
      { kind: 'profile', name: 'file', description: 'path to a CSV profile of the basin (depth, temperature, …)' },
      {
        kind: 'text',
        name: 'hypsography',
        description:
          'horizontal area against depth, depth:area pairs [m : m²] from the surface (depth 0) to the deepest point',
      },
      {
        kind: 'number',
        name: 'wind_speed',
        unit: 'm/s',
        description: 'wind speed at 10 m (water-side friction velocity from Large & Pond 1981)',
        range: { ...positive, max: 60 },
      },
      {
        kind: 'number',
        name: 'thermocline_depth',
        unit: 'm',
        description: 'centre of the metalimnion below the surface (default: the largest density gradient)',
        optional: true,
        range: { ...positive, max: 11000 },
      },
    ],
    results: [
      {
        name: 'lake_number',
        unit: '1',
        description: 'L_N (Imberger & Patterson 1990); below 1 the wind tilts the thermocline to the surface',
      },
      {
        name: 'schmidt_stability',
        unit: 'J/m2',
        description: 'Schmidt stability: work per unit surface area to mix the column (Idso 1973)',
      },
      {
        name: 'centre_of_volume_height',
        unit: 'm',
        description: 'height of the centre of volume above the deepest point',
      },
      { name: 'shear_velocity', unit: 'm/s', description: 'water-side friction velocity u*' },
      { name: 'stability_statement', unit: '', description: 'plain-language reading of the Lake number' },
    ],
    everyday: { wind_speed: [1, 20] },
    run(a) {
      const p = arg.profile(a);
      if (!p) throw new InputError('file', '(missing)', '', 'a CSV profile', 'a profile file is required');
      const hyps = parseHypsography(arg.text(a, 'hypsography'));
      const deepest = hyps.depth[hyps.depth.length - 1];
      const warnings = [...p.warnings];
      const bottom = profileBottom(p);
      if (bottom < 0.9 * deepest)
        warnings.push(
          caution(
            'profile-short-of-bottom',
            `The profile ends at ${qty(bottom, 'm')}, above the deepest point ${qty(deepest, 'm')}: the density below is taken as the last sample's.`,
            'file',
          ),
        );
      const given = arg.optNum(a, 'thermocline_depth');
      const zT = given ?? thermoclineDepth(p).value;
      if (given === undefined)
        warnings.push(
          note(
            'thermocline-from-profile',
            `Thermocline depth ${qty(zT, 'm')}: the largest density gradient of the profile.`,
          ),
        );
      const ws = windStressLargePond1981(arg.num(a, 'wind_speed'));
      const r = lakeNumberImbergerPatterson1990(p, hyps, ws.shearVelocity, zT);
      warnings.push(...ws.warnings, ...r.warnings);
      const statement =
        r.value < 1
          ? 'L_N < 1: the wind can tilt the thermocline to the surface; upwelling of deep water and mixing of the metalimnion are likely.'
          : r.value < 10
            ? 'L_N between 1 and 10: the thermocline tilts noticeably under this wind; internal seiches, little upwelling.'
            : 'L_N ≥ 10: the stratification resists this wind; the thermocline stays nearly level.';
      if (r.value < 1) warnings.push(caution('upwelling-likely', statement));
      return {
        results: {
          lake_number: num(r.value, '1'),
          schmidt_stability: num(r.schmidtStability, 'J/m2'),
          centre_of_volume_height: num(r.centreOfVolumeHeight, 'm'),
          shear_velocity: num(ws.shearVelocity, 'm/s'),
          stability_statement: text(statement),
        },
        warnings,
        sources: [LAKE_NUMBER.source, WIND_STRESS_LARGE_POND_1981.source],
      };
    },
  },
];
