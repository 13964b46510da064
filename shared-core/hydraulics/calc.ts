import { num, text } from '../calc/resolve';
import { note } from '../core/warning';
import { arg, type CalcMethod } from '../calc/types';
import { InputError } from '../core/errors';
import { qty } from '../core/quantity-text';
import { positive } from '../core/range';
import { STRATIFIED_OBSTACLE_FLOW, stratifiedObstacleFlow } from './obstacle';
import {
  CURTAIN_WALL_WITHDRAWAL,
  INTERNAL_HYDRAULIC_JUMP,
  curtainWallWithdrawalMax,
  internalHydraulicJump,
} from './two-layer';
import { INTERNAL_JUMP_FINITE_DEPTH, internalJumpFiniteDepth } from './jump-finite-depth';
import { WEIR_SKIMMING_WITHDRAWAL, weirSkimmingWithdrawalMax } from './weir-withdrawal';

const G_PRIME = {
  kind: 'number',
  name: 'g_prime',
  unit: 'm/s2',
  description: 'reduced gravity between the layers',
  range: { min: 1e-6, max: 20 },
} as const;

/** The hydraulics methods of `gprime calc`. */
export const hydraulicsCalcMethods: CalcMethod[] = [
  {
    id: 'obstacle-flow',
    title: 'Stratified flow over an obstacle: Froude number, blocking and lee-wave length',
    topic: 'hydraulics',
    params: [
      {
        kind: 'number',
        name: 'velocity',
        unit: 'm/s',
        description: 'approach velocity U',
        range: { min: 1e-6, max: 100 },
      },
      {
        kind: 'number',
        name: 'buoyancy_frequency',
        unit: '1/s',
        description: 'buoyancy frequency N of the approach flow',
        range: { min: 1e-6, max: 1 },
      },
      {
        kind: 'number',
        name: 'obstacle_height',
        unit: 'm',
        description: 'obstacle (sill, ridge) height h above the bed',
        range: { min: 1e-3, max: 11000 },
      },
      {
        kind: 'number',
        name: 'depth',
        unit: 'm',
        description: 'total water depth H upstream',
        range: { min: 1e-3, max: 11000 },
      },
    ],
    results: [
      { name: 'froude', unit: '1', description: 'obstacle Froude number U/(N h)' },
      { name: 'lee_wavelength', unit: 'm', description: 'lee-wave length 2πU/N' },
      {
        name: 'blocked',
        unit: '',
        description: 'yes when Nh/U > 1: water below the dividing streamline is blocked upstream',
      },
    ],
    run(a) {
      const r = stratifiedObstacleFlow(
        arg.num(a, 'velocity'),
        arg.num(a, 'buoyancy_frequency'),
        arg.num(a, 'obstacle_height'),
        arg.num(a, 'depth'),
      );
      const warnings = [...r.warnings];
      if (r.blocked)
        warnings.push(
          note(
            'blocked-below-dividing-streamline',
            `Water below about ${r.dividingStreamlineHeight.toPrecision(3)} m above the base (the dividing streamline) cannot pass over the obstacle and is held upstream.`,
          ),
        );
      return {
        results: {
          froude: num(r.froude, '1'),
          lee_wavelength: num(r.leeWavelength, 'm'),
          blocked: text(r.blocked ? 'yes' : 'no'),
        },
        warnings,
        sources: [STRATIFIED_OBSTACLE_FLOW.source],
      };
    },
  },
  {
    id: 'internal-jump',
    title: 'Internal hydraulic jump of a dense bottom layer (deep upper layer, or a channel of finite depth)',
    topic: 'hydraulics',
    params: [
      {
        kind: 'number',
        name: 'discharge_per_width',
        unit: 'm2/s',
        description: 'discharge per unit width q of the dense layer',
        range: { min: 1e-9, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'upstream_thickness',
        unit: 'm',
        description: 'thickness y1 of the fast (supercritical) dense layer before the jump',
        range: { min: 1e-3, max: 11000 },
      },
      G_PRIME,
      {
        kind: 'number',
        name: 'total_depth',
        unit: 'm',
        description: 'total depth D of the channel; if given, the finite-depth jump with a rigid lid is used',
        optional: true,
        range: { min: 2e-3, max: 1e7 },
      },
      {
        kind: 'number',
        name: 'upper_discharge',
        unit: 'm2/s',
        description:
          'upper-layer discharge per width, positive with the dense layer (finite depth only; default −q: return flow of a closed channel, no net flow)',
        optional: true,
        range: { min: -1e4, max: 1e4 },
      },
    ],
    results: [
      {
        name: 'downstream_thickness',
        unit: 'm',
        description: 'conjugate thickness y2 (energy conserved in the upper layer when D is given)',
      },
      {
        name: 'downstream_thickness_alt',
        unit: 'm',
        description: 'y2 with the interfacial-pressure closure (equal to y2 for a deep upper layer)',
      },
      {
        name: 'head_loss',
        unit: 'm',
        description: 'energy lost per unit dense-layer discharge, in reduced-gravity head',
      },
      { name: 'froude', unit: '1', description: 'upstream layer Froude number q/√(g′y1³)' },
    ],
    run(a) {
      const [q, y1, g, D, qu] = [
        arg.num(a, 'discharge_per_width'),
        arg.num(a, 'upstream_thickness'),
        arg.num(a, 'g_prime'),
        arg.optNum(a, 'total_depth'),
        arg.optNum(a, 'upper_discharge'),
      ];
      if (D === undefined && qu !== undefined)
        throw new InputError(
          'upper_discharge',
          qu,
          'm2/s',
          'only with total_depth',
          'an upper-layer discharge needs the total depth of the channel (total_depth)',
        );
      const deep = D === undefined ? internalHydraulicJump(q, y1, g) : undefined;
      const r = deep
        ? { ...deep, downstreamThicknessInterfacialPressure: deep.downstreamThickness }
        : internalJumpFiniteDepth(q, y1, g, D!, qu);
      return {
        results: {
          downstream_thickness: num(r.downstreamThickness, 'm'),
          downstream_thickness_alt: num(r.downstreamThicknessInterfacialPressure, 'm'),
          head_loss: num(r.headLoss, 'm'),
          froude: num(r.froude, '1'),
        },
        warnings: r.warnings,
        sources: [(deep ? INTERNAL_HYDRAULIC_JUMP : INTERNAL_JUMP_FINITE_DEPTH).source],
      };
    },
  },
  {
    id: 'skimming-withdrawal',
    title: 'Largest discharge of one layer under a curtain wall or over a weir before the other layer is drawn',
    topic: 'hydraulics',
    params: [
      G_PRIME,
      {
        kind: 'choice',
        name: 'structure',
        description: 'curtain-wall: dense lower layer drawn under a wall; weir: light upper layer skimmed over a crest',
        choices: ['curtain-wall', 'weir'],
      },
      {
        kind: 'number',
        name: 'opening',
        unit: 'm',
        description: 'curtain wall: lip height above the bed; weir: crest depth below the upstream water surface',
        range: { min: 1e-3, max: 11000 },
      },
      {
        kind: 'number',
        name: 'interface_distance',
        unit: 'm',
        description:
          'upstream interface: height above the bed (curtain wall) or depth below the surface (weir); larger than the opening',
        range: { min: 1e-3, max: 11000 },
      },
      {
        kind: 'number',
        name: 'width',
        unit: 'm',
        description: 'width of the opening across the flow',
        default: 1,
        range: { ...positive, max: 1e5 },
      },
      {
        kind: 'choice',
        name: 'approach_velocity',
        description:
          'included: the withdrawn layer approaches at q/(its thickness) and its velocity head adds to the energy (the structure spans the approach channel); neglected: the approach flow is much wider or deeper than the opening',
        choices: ['included', 'neglected'],
        default: 'included',
      },
      {
        kind: 'number',
        name: 'contraction',
        unit: '1',
        description:
          'contraction coefficient C_c of the flow under a curtain-wall lip (curtain wall only): 0.598–0.611 for a sharp-edged lip, 0.61 recommended (Henderson 1966); 1 for a well-rounded lip',
        default: 1,
        range: { min: 0.5, max: 1 },
      },
    ],
    results: [
      {
        name: 'max_discharge_per_width',
        unit: 'm2/s',
        description: 'largest discharge per width that takes water of the near layer only',
      },
      { name: 'max_discharge', unit: 'm3/s', description: 'the same times the width' },
      {
        name: 'approach_head_ratio',
        unit: '1',
        description: 'largest discharge with the approach velocity head over that without it',
      },
    ],
    run(a) {
      const weir = arg.text(a, 'structure') === 'weir';
      const [g, opening, interfaceDistance, width] = [
        arg.num(a, 'g_prime'),
        arg.num(a, 'opening'),
        arg.num(a, 'interface_distance'),
        arg.num(a, 'width'),
      ];
      if (opening >= interfaceDistance)
        throw new InputError(
          'opening',
          opening,
          'm',
          `< ${qty(interfaceDistance, 'm')}`,
          `it must be less than interface_distance = ${qty(interfaceDistance, 'm')} (the ${weir ? 'crest lies above' : 'lip lies below'} the interface)`,
        );
      const approachVelocity = arg.text(a, 'approach_velocity') === 'included';
      const contraction = arg.num(a, 'contraction');
      const r = weir
        ? weirSkimmingWithdrawalMax(g, opening, interfaceDistance, { approachVelocity })
        : curtainWallWithdrawalMax(g, opening, interfaceDistance, { approachVelocity, contraction });
      const warnings = [...r.warnings];
      if (weir && contraction !== 1)
        warnings.push(
          note(
            'input-ignored',
            'contraction applies to the flow under a curtain-wall lip; a weir crest ignores it.',
            'contraction',
          ),
        );
      return {
        results: {
          max_discharge_per_width: num(r.value, 'm2/s'),
          max_discharge: num(r.value * width, 'm3/s'),
          approach_head_ratio: num(r.approachHeadRatio, '1'),
        },
        warnings,
        sources: [(weir ? WEIR_SKIMMING_WITHDRAWAL : CURTAIN_WALL_WITHDRAWAL).source],
      };
    },
  },
];
