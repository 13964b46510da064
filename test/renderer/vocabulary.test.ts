// The words the workspace shows for calc names and site-file places: every registered parameter and result
// has words of its own, labels carry no unit, and messages name fields as the editors label them.
import { describe, expect, it } from 'vitest';
import { CALC_METHODS } from '../../shared-core/calc/registry';
import { hasWords, labelOf, nameText } from '../../shared-core/core/vocabulary';
import { parseQuantity } from '../../shared-core/units/units';
import { plainMessage, helpText } from '../../src-renderer/src/lib/messages';
import { blankSite, blankFeature } from '../../src-renderer/src/lib/templates';
import { placeholderNotes, startingFields } from '../../src-renderer/src/lib/placeholders';

const UNIT_WORDS = /\b(m3\/s|m\/s2?|kg\/m3|degC|m2\/s|1\/s2?|dbar|PSU)\b|\[.*\]/;

describe('vocabulary', () => {
  const names = CALC_METHODS.flatMap((m) => [...m.params, ...m.results].map((x) => ({ method: m.id, name: x.name })));

  it('has words for every parameter and result of every registered method', () => {
    expect(names.filter((n) => !hasWords(n.name)).map((n) => `${n.method}.${n.name}`)).toEqual([]);
  });

  it('labels read as words: no underscores, no unit', () => {
    const bad = names
      .map((n) => nameText(n.name, n.method))
      .filter((t) => /_[a-z]{2,}|^[a-z]/.test(t.replace(/[A-Za-z]_[A-Za-z0-9′]+/g, '')) || UNIT_WORDS.test(t));
    expect(bad).toEqual([]);
  });

  it('tells apart the senses a name has in different methods', () => {
    expect(labelOf('froude', 'obstacle-flow').label).not.toBe(labelOf('froude', 'front-speed').label);
    expect(labelOf('width', 'far-field', 'input').label).not.toBe(labelOf('field_width', 'far-field').label);
    expect(nameText('l_q')).toBe('Jet length scale L_Q (Q/√M)');
    expect(nameText('g_prime')).toBe('Reduced gravity g′');
  });
});

describe('messages for people', () => {
  const site = blankSite();
  site.features.push({ ...blankFeature('outfall', 'outfall', 20), name: 'Works outfall' });

  it('names a site field as the editor does, the typed unit once, without the exception class', () => {
    let text = '';
    try {
      parseQuantity('features[0].portDepth', '30 parsecs', 'm');
    } catch (e) {
      text = String(e);
    }
    const shown = plainMessage(text, site);
    expect(shown).toContain('Works outfall: Port depth');
    expect(shown).not.toMatch(/features\[|InputError|parsecs" parsecs/);
  });

  it('reads parameter names inside a sentence as words and drops help that repeats the label', () => {
    expect(plainMessage('port_depth = 900 m is not allowed: give ambient_density or file', site)).toBe(
      'Port depth = 900 m is not allowed: give ambient density or file',
    );
    expect(helpText('port diameter', 'Port diameter D')).toBe('port diameter');
    expect(helpText('port diameter', 'Port diameter')).toBe('');
  });
});

describe('placeholder results', () => {
  it('names the starting values still in place and the placeholder profile of a new site', () => {
    const added = blankFeature('outfall', 'outfall', 20);
    const edited = { ...structuredClone(added), diameter: 0.5 };
    const fields = startingFields(edited, added);
    expect(fields).toContain('Discharge');
    expect(fields).not.toContain('Port diameter');
    const site = blankSite();
    site.features.push(edited);
    const outcome = {
      id: 'e',
      method: 'buoyant-jet',
      title: 't',
      feature: { id: 'outfall', name: edited.name, kind: 'outfall' },
      condition: { id: 'condition-1', name: 'Condition 1' },
    } as Parameters<typeof placeholderNotes>[1];
    expect(placeholderNotes(site, outcome, new Map([['outfall', added]]))).toHaveLength(2);
    expect(placeholderNotes(site, outcome, new Map())).toHaveLength(1);
    site.conditions[0].profile.rows[1] = [12, 11, 0];
    expect(placeholderNotes(site, outcome, new Map())).toHaveLength(0);
  });
});
