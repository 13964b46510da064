import { describe, expect, it } from 'vitest';
import type { JetEvent, JetPath } from '../../../shared-core/jets/buoyant-jet';
import { describeOutcome } from '../../../shared-core/jets/outcome';
import { sentenceIn } from '../../../shared-core/units/sentence';

// The outcome sentence is gprime's own wording of the path's events (no outside source); lengths in US units
// by NIST SP 811 (2008), App. B (1 ft = 0.3048 m).
const at = (kind: JetEvent['kind'], s: number, z: number, dilution: number): JetEvent => ({
  kind,
  s,
  x: s / 2,
  y: 0,
  z,
  depth: 20 - z,
  horizontalDistance: s / 2,
  radius: 1,
  dilutionCentreline: dilution,
  dilutionAverage: dilution * 1.7,
});
const path = { s: [0, 20.78] } as JetPath;

describe('the outcome of a trapped plume in words', () => {
  it('a plume that rose, sank back through its neutral level and turned again is told in that order', () => {
    const events = [
      at('maximum rise', 10.96, 4.17, 8),
      at('neutral buoyancy', 16.59, 2.32, 11),
      at('lowest point', 20.78, 0.84, 13.1),
      at('end of near field', 20.78, 0.84, 13.1),
    ];
    const o = describeOutcome(events, 'completed', 4.17, path);
    expect(o.kind).toBe('trapped');
    expect(sentenceIn(o.text, 'si')).toBe(
      'The density layering traps the plume below the surface: it rises at most 4.17 m above the port, sinks back ' +
        'through its neutral level 2.32 m above the port (depth 17.7 m) to 0.84 m and will spread sideways near the ' +
        'neutral level; the centreline dilution at the turning point is 13.1.',
    );
    expect(sentenceIn(o.text, 'us')).toMatch(
      /rises at most 13\.7 ft above the port, sinks back through its neutral level 7\.61 ft/,
    );
  });

  it('a rising plume that overshoots its neutral level says so', () => {
    const events = [
      at('neutral buoyancy', 8, 3, 9),
      at('maximum rise', 11, 4.2, 10),
      at('end of near field', 11, 4.2, 10),
    ];
    const o = describeOutcome(events, 'completed', 4.2, { s: [0, 11] } as JetPath);
    expect(sentenceIn(o.text, 'si')).toMatch(
      /becomes neutrally buoyant 3 m above the port \(depth 17 m\), overshoots to 4\.2 m/,
    );
  });
});
