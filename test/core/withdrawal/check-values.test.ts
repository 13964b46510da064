import { runCheckValues } from '../../helpers/check-values';
import { makeProfile } from '../../../shared-core/profile/profile';
import {
  criticalDischargeCraya1949,
  type SinkKind,
  type SinkPosition,
} from '../../../shared-core/withdrawal/two-layer';
import {
  halfThicknessLineSinkImberger1976,
  halfThicknessPointSinkImbergerPatterson1990,
} from '../../../shared-core/withdrawal/layer';
import { withdrawalLimitsBohanGrace1973 } from '../../../shared-core/withdrawal/measured';
import { portOutflow, withdrawalVelocityProfile } from '../../../shared-core/withdrawal/outflow';
import { blendRelease } from '../../../shared-core/withdrawal/blend';
import { optimiseRelease } from '../../../shared-core/withdrawal/release-optimiser';

/** 10 °C, practical salinity 30 → 32 PSU linear over 0–40 m (TEOS-10, as in the generator). */
const saltProfile = (temperature: (d: number) => number = () => 10) => {
  const depth = Array.from({ length: 81 }, (_, i) => i * 0.5);
  return makeProfile({
    depth,
    temperature: depth.map(temperature),
    salinity: depth.map((d) => 30 + (2 * d) / 40),
    eos: 'teos10',
  });
};
const salt = saltProfile();
const point = { sink: 'point' as const };

runCheckValues(
  'withdrawal',
  'withdrawal-two-layer-craya1949',
  (i) =>
    criticalDischargeCraya1949(Number(i.g_prime), Number(i.h), i.sink as SinkKind, i.position as SinkPosition, 1).value,
);

runCheckValues('withdrawal', 'withdrawal-line-sink-imberger1976', (i) => {
  const r = halfThicknessLineSinkImberger1976(
    Number(i.q),
    Number(i.n),
    i.length === undefined ? undefined : Number(i.length),
    i.nu === undefined ? undefined : Number(i.nu),
  );
  return i.quantity === 'froude' ? Number(i.q) / (Number(i.n) * r.halfThickness ** 2) : r.totalThickness;
});

runCheckValues(
  'withdrawal',
  'withdrawal-point-sink-imberger-patterson1990',
  (i) =>
    halfThicknessPointSinkImbergerPatterson1990(
      Number(i.discharge),
      Number(i.n),
      i.length === undefined ? undefined : Number(i.length),
    ).halfThickness,
);

runCheckValues('withdrawal', 'withdrawal-limits-bohan-grace1973', (i) => {
  const w = withdrawalLimitsBohanGrace1973(salt, Number(i.port), Number(i.discharge), point);
  return i.side === 'upper' ? w.upper.distance : i.side === 'lower' ? w.lower.distance : w.topDepth;
});

runCheckValues('withdrawal', 'withdrawal-velocity-bohan-grace1973', (i) => {
  if (i.quantity === 'salinity')
    return portOutflow(salt, Number(i.port), Number(i.discharge), point).columns.find((c) => c.name === 'salinity')!
      .value;
  const v = withdrawalVelocityProfile(salt, Number(i.port), Number(i.discharge), point);
  return Math.max(...v.fluxPerDepth);
});

const warmTop = saltProfile((d) => 20 - d / 4);
const twoPorts = [
  { depth: 12, capacity: 10 },
  { depth: 28, capacity: 10 },
];
runCheckValues('withdrawal', 'release-blend-flow-weighted', (i) => {
  if (i.quantity === 'blend') return blendRelease(warmTop, twoPorts, [Number(i.q1), Number(i.q2)], point).temperature;
  return optimiseRelease(warmTop, twoPorts, Number(i.release), { temperature: Number(i.target) }, point).flows[0];
});
