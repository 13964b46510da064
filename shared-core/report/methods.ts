import type { MethodInfo } from '../core/method';
import * as water1 from '../water/fresh-density';
import * as water2 from '../water/eos80';
import * as water3 from '../water/teos10';
import * as water4 from '../water/sediment';
import * as water5 from '../water/transport';
import * as water6 from '../water/buoyancy';
import * as water7 from '../water/salinity';
import * as water8 from '../water/brine';
import * as profile from '../profile/stratification';
import * as gravity1 from '../gravity-currents/front-speed';
import * as gravity2 from '../gravity-currents/viscous';
import * as gravity3 from '../gravity-currents/release';
import * as gravity4 from '../gravity-currents/flux';
import * as estuary1 from '../estuaries/salt-wedge';
import * as estuary2 from '../estuaries/richardson';
import * as estuary3 from '../estuaries/exchange';
import * as estuary4 from '../estuaries/lock';
import * as waves1 from '../internal-waves/modes';
import * as waves2 from '../internal-waves/two-layer';
import * as waves3 from '../internal-waves/basin';
import * as hydraulics1 from '../hydraulics/obstacle';
import * as hydraulics2 from '../hydraulics/two-layer';
import * as estuary5 from '../estuaries/exchange-net-flow';
import * as estuary6 from '../estuaries/exchange-sill-net-flow';
import * as hydraulics3 from '../hydraulics/jump-finite-depth';
import * as hydraulics4 from '../hydraulics/weir-withdrawal';
import * as withdrawal1 from '../withdrawal/outflow';
import * as withdrawal2 from '../withdrawal/blend';
import * as withdrawal3 from '../withdrawal/measured';
import * as withdrawal4 from '../withdrawal/layer';
import * as withdrawal5 from '../withdrawal/two-layer';
import * as withdrawal6 from '../withdrawal/interference';
import * as jets1 from '../jets/length-scales';
import * as jets2 from '../jets/closure';
import * as jets3 from '../jets/line-plume';
import * as jets4 from '../jets/diffuser';
import * as jets5 from '../jets/dense-jet-lab';
import * as inflows1 from '../inflows/underflow';
import * as inflows2 from '../inflows/entrainment';
import * as inflows3 from '../inflows/plunge';
import * as mixing from '../mixing-zone/required-dilution';
import * as mixingFarField from '../mixing-zone/far-field';
import * as uncertainty from '../uncertainty/propagate';

/**
 * The MethodInfo descriptors of shared-core, collected from the modules that declare them. The calc
 * sheet reads each estimate's equation from the descriptor whose `source` the estimate cites.
 * test/report/methods.test.ts checks that every descriptor in shared-core is found here.
 */
const MODULES: readonly Record<string, unknown>[] = [
  water1,
  water2,
  water3,
  water4,
  water5,
  water6,
  water7,
  water8,
  profile,
  gravity1,
  gravity2,
  gravity3,
  gravity4,
  estuary1,
  estuary2,
  estuary3,
  estuary4,
  estuary5,
  estuary6,
  waves1,
  waves2,
  waves3,
  hydraulics1,
  hydraulics2,
  hydraulics3,
  hydraulics4,
  withdrawal1,
  withdrawal2,
  withdrawal3,
  withdrawal4,
  withdrawal5,
  withdrawal6,
  jets1,
  jets2,
  jets3,
  jets4,
  jets5,
  inflows1,
  inflows2,
  inflows3,
  mixing,
  mixingFarField,
  uncertainty,
];

function isMethodInfo(x: unknown): x is MethodInfo {
  if (typeof x !== 'object' || x === null) return false;
  const m = x as Record<string, unknown>;
  return (
    typeof m.id === 'string' &&
    typeof m.title === 'string' &&
    typeof m.source === 'string' &&
    typeof m.equation === 'string' &&
    typeof m.validity === 'object'
  );
}

/** Every descriptor, in a stable order (module order, then export name), without duplicates. */
export const METHOD_CATALOGUE: readonly MethodInfo[] = (() => {
  const seen = new Set<string>();
  const out: MethodInfo[] = [];
  for (const mod of MODULES) {
    for (const key of Object.keys(mod).sort()) {
      const v = mod[key];
      if (isMethodInfo(v) && !seen.has(v.id)) {
        seen.add(v.id);
        out.push(v);
      }
    }
  }
  return out;
})();

/** The descriptors whose full source text is `source` (the same citation may serve several methods). */
export function methodsForSource(source: string): MethodInfo[] {
  return METHOD_CATALOGUE.filter((m) => m.source === source);
}
