import { num } from '../calc/resolve';
import { arg, type CalcMethod } from '../calc/types';
import { positive } from '../core/range';
import { NAVIGATION_LOCK_EXCHANGE, navigationLockExchange } from './lock';
import { LOCK_EXCHANGE } from '../gravity-currents/front-speed';

/** Points of the exchanged-volume curve. */
const CURVE_POINTS = 61;

/** The navigation-lock method of `gprime calc`: salt water let in while a lock gate stands open. */
export const lockCalcMethods: CalcMethod[] = [
  {
    id: 'navigation-lock',
    title: 'Water and salt exchanged through an open navigation-lock gate',
    topic: 'estuaries',
    params: [
      {
        kind: 'number',
        name: 'g_prime',
        unit: 'm/s2',
        description: 'reduced gravity between the salt and the fresh side of the gate',
        range: { ...positive, max: 1 },
      },
      { kind: 'number', name: 'length', unit: 'm', description: 'chamber length L', range: { ...positive, max: 1e4 } },
      { kind: 'number', name: 'width', unit: 'm', description: 'chamber width B', range: { ...positive, max: 1e3 } },
      {
        kind: 'number',
        name: 'depth',
        unit: 'm',
        description: 'water depth H in the chamber',
        range: { ...positive, max: 1e4 },
      },
      {
        kind: 'number',
        name: 'salinity_difference',
        unit: 'PSU',
        description: 'salinity difference across the open gate',
        range: { min: 0, max: 70 },
      },
      {
        kind: 'number',
        name: 'open_time',
        unit: 's',
        description: 'time the gate stands open',
        range: { min: 0, max: 1e6 },
      },
      {
        kind: 'choice',
        name: 'speed',
        description: 'front speed: the typical laboratory 0.46√(g′H) or the ideal ½√(g′H)',
        choices: ['typical', 'ideal'],
        default: 'typical',
      },
    ],
    results: [
      { name: 'exchanged_volume', unit: 'm3', description: 'volume exchanged each way while the gate is open' },
      { name: 'salt_mass', unit: 'kg', description: 'salt carried into the fresh side' },
      { name: 'exchanged_fraction', unit: '1', description: 'exchanged volume over the chamber volume' },
      { name: 'front_speed', unit: 'm/s', description: 'front speed of the lock exchange' },
      { name: 'traverse_time', unit: 's', description: 'time for the fronts to reach the chamber ends, L/U' },
    ],
    everyday: { g_prime: [0.01, 0.25], length: [50, 400], width: [8, 40], depth: [2, 15], open_time: [0, 3600] },
    run(a) {
      const input = {
        gPrime: arg.num(a, 'g_prime'),
        length: arg.num(a, 'length'),
        width: arg.num(a, 'width'),
        depth: arg.num(a, 'depth'),
        salinityDifference: arg.num(a, 'salinity_difference'),
        speed: arg.text<'ideal' | 'typical'>(a, 'speed'),
      };
      const open = arg.num(a, 'open_time');
      const r = navigationLockExchange(input, [open]);
      const end = Math.max(open, 3 * r.traverseTime);
      const times = Array.from({ length: CURVE_POINTS }, (_, i) => (end * i) / (CURVE_POINTS - 1));
      const curve = navigationLockExchange(input, times);
      return {
        results: {
          exchanged_volume: num(r.volume[0], 'm3'),
          salt_mass: num(r.saltMass[0], 'kg'),
          exchanged_fraction: num(r.volume[0] / r.chamberVolume, '1'),
          front_speed: num(r.frontSpeed, 'm/s'),
          traverse_time: num(r.traverseTime, 's'),
        },
        warnings: r.warnings,
        sources: [NAVIGATION_LOCK_EXCHANGE.source, LOCK_EXCHANGE.source],
        series: [
          {
            kind: 'lock-exchanged-volume',
            title: 'Exchanged volume against gate-open time',
            x: { label: 'Gate-open time', unit: 's', values: curve.time },
            y: [{ label: 'Exchanged volume', unit: 'm3', values: curve.volume }],
            caption: 'Volume exchanged each way; the fronts reach the chamber ends at L/U',
          },
        ],
      };
    },
  },
];
