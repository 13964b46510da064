import { num, text } from '../calc/resolve';
import { arg, type CalcMethod, type Series } from '../calc/types';
import { positive } from '../core/range';
import { GRAVITY } from '../quantities';
import { DEFAULT_INTERFACIAL_FRICTION, SCHIJF_SCHONFELD_1953, saltWedgeLengthSchijfSchonfeld1953, saltWedgeProfile } from './salt-wedge';
import { FISCHER_1972, estuarineRichardsonFischer1972 } from './richardson';
import { ARMI_FARMER_1986, FARMER_ARMI_1986, maximalExchangeContractionArmiFarmer1986, maximalExchangeSillFarmerArmi1986 } from './exchange';

const G_PRIME = { kind: 'number', name: 'g_prime', unit: 'm/s2', description: 'reduced gravity between sea and river water', range: { ...positive, max: GRAVITY } } as const;

/** The estuaries methods of `gprime calc`. */
export const estuaryCalcMethods: CalcMethod[] = [
  {
    id: 'salt-wedge',
    title: 'Arrested salt wedge intrusion length',
    topic: 'estuaries',
    params: [
      { kind: 'number', name: 'river_velocity', unit: 'm/s', description: 'river velocity over the full depth, Q/(W H)', range: { ...positive, max: 20 } },
      { kind: 'number', name: 'depth', unit: 'm', description: 'channel depth H', range: { ...positive, max: 1e3 } },
      G_PRIME,
      { kind: 'number', name: 'interfacial_friction', unit: '1', description: 'f_i with interfacial stress τ_i = ρ f_i u1², u1 the upper-layer velocity (default: Sørgard et al. 1990)', default: DEFAULT_INTERFACIAL_FRICTION, range: { ...positive, max: 0.1 } },
    ],
    results: [
      { name: 'length', unit: 'm', description: 'intrusion length from the mouth to the tip (0 when no wedge is arrested)' },
      { name: 'river_froude', unit: '1', description: 'F0 = U0/√(g′H)' },
    ],
    run(a) {
      const input = { riverVelocity: arg.num(a, 'river_velocity'), depth: arg.num(a, 'depth'), gPrime: arg.num(a, 'g_prime'), interfacialFriction: arg.num(a, 'interfacial_friction') };
      const r = saltWedgeLengthSchijfSchonfeld1953(input);
      const profile = saltWedgeProfile(input);
      const series: Series[] = profile.distance.length ? [{
        title: 'Salt-wedge interface', x: { label: 'Distance landward from the mouth', unit: 'm', values: profile.distance },
        y: [{ label: 'Interface depth', unit: 'm', values: profile.interfaceDepth }], depthAxis: true,
        caption: 'Depth of the interface between river water and the salt wedge, mouth to tip',
      }] : [];
      return { results: { length: num(r.length.value, 'm'), river_froude: num(r.riverFroude, '1') }, warnings: [...r.length.warnings, ...profile.warnings], sources: [SCHIJF_SCHONFELD_1953.source], series };
    },
  },
  {
    id: 'estuarine-richardson',
    title: 'Estuarine Richardson number and stratification class',
    topic: 'estuaries',
    params: [
      G_PRIME,
      { kind: 'number', name: 'river_discharge', unit: 'm3/s', description: 'river (fresh-water) discharge', range: { ...positive, max: 1e6 } },
      { kind: 'number', name: 'width', unit: 'm', description: 'estuary width', range: { ...positive, max: 1e6 } },
      { kind: 'number', name: 'tidal_velocity', unit: 'm/s', description: 'root-mean-square tidal velocity', range: { min: 1e-3, max: 10 } },
    ],
    results: [
      { name: 'richardson', unit: '1', description: 'Ri_E = g′Q/(W U_t³)' },
      { name: 'class', unit: '', description: 'strongly stratified, partially mixed or well mixed (rules of thumb)' },
    ],
    run(a) {
      const r = estuarineRichardsonFischer1972(arg.num(a, 'g_prime'), arg.num(a, 'river_discharge'), arg.num(a, 'width'), arg.num(a, 'tidal_velocity'));
      return { results: { richardson: num(r.richardson.value, '1'), class: text(r.estuaryClass) }, warnings: r.richardson.warnings, sources: [FISCHER_1972.source] };
    },
  },
  {
    id: 'exchange-flow',
    title: 'Maximal two-layer exchange flow through a contraction or over a sill',
    topic: 'estuaries',
    params: [
      G_PRIME,
      { kind: 'number', name: 'depth', unit: 'm', description: 'depth at the control (contraction depth or sill-crest depth)', range: { ...positive, max: 1e4 } },
      { kind: 'number', name: 'width', unit: 'm', description: 'width at the control', range: { ...positive, max: 1e6 } },
      { kind: 'choice', name: 'control', description: 'narrowest section of a flat channel, or a sill', choices: ['contraction', 'sill'], default: 'contraction' },
    ],
    results: [{ name: 'exchange_discharge', unit: 'm3/s', description: 'discharge of each layer (each way) at maximal exchange' }],
    run(a) {
      const sill = arg.text(a, 'control') === 'sill';
      const f = sill ? maximalExchangeSillFarmerArmi1986 : maximalExchangeContractionArmiFarmer1986;
      const r = f(arg.num(a, 'g_prime'), arg.num(a, 'depth'), arg.num(a, 'width'));
      return { results: { exchange_discharge: num(r.discharge.value, 'm3/s') }, warnings: r.discharge.warnings, sources: [(sill ? FARMER_ARMI_1986 : ARMI_FARMER_1986).source] };
    },
  },
];
