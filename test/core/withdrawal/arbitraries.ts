import fc from 'fast-check';
import { makeProfile, type Profile } from '../../../shared-core/profile/profile';

/** A stable, warm-over-cold profile (all above 4 °C): temperature falls with depth by the given steps. */
export const stableProfile = fc
  .record({
    surface: fc.double({ min: 12, max: 28, noNaN: true }),
    drops: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 4, maxLength: 10 }),
    depth: fc.double({ min: 10, max: 60, noNaN: true }),
  })
  .map(({ surface, drops, depth }): Profile => {
    const total = drops.reduce((a, b) => a + b, 0) || 1;
    const span = surface - 5;
    const ds = drops.map((_, i) => ((i + 1) * depth) / drops.length);
    let t = surface;
    const temps = drops.map((x) => (t -= (x / total) * span * 0.999));
    return makeProfile({ depth: [0, ...ds], temperature: [surface, ...temps] });
  });
