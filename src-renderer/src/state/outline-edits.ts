import type { Workspace } from './workspace.svelte';
import {
  blankCondition,
  blankFeature,
  suggestedEstimates,
  uniqueId,
  type FeatureKind,
  KIND_WORDS,
} from '../lib/templates';
import { readQuantity } from '../lib/quantity';

/** Adding and removing the items of the outline; each is one undo step. */
const ids = (ws: Workspace) =>
  new Set([...ws.doc.site.conditions, ...ws.doc.site.features, ...ws.doc.site.estimates].map((x) => x.id));

export function addFeature(ws: Workspace, kind: FeatureKind): void {
  const taken = ids(ws);
  const id = uniqueId(kind, taken);
  taken.add(id);
  const depth = readQuantity(ws.doc.site.waterBody.depth, 'm', 'depth').si ?? 20;
  const conditionId = ws.conditionId;
  ws.doc.change((d) => {
    const f = blankFeature(kind, id, depth);
    f.name = `${KIND_WORDS[kind]} ${d.features.filter((x) => x.kind === kind).length + 1}`;
    ws.addedFeatures = new Map([...ws.addedFeatures, [id, structuredClone(f)]]);
    d.features.push(f);
    d.estimates.push(...suggestedEstimates(kind, id, conditionId, taken));
  });
  ws.selection = { kind: 'feature', id };
  ws.say(`Added ${KIND_WORDS[kind].toLowerCase()} with its usual estimates for the current condition.`);
}

export function removeFeature(ws: Workspace, id: string): void {
  const name = ws.doc.site.features.find((f) => f.id === id)?.name ?? 'the feature';
  const gone = ws.doc.site.estimates.filter((e) => e.feature === id).length;
  ws.doc.change((d) => {
    d.features = d.features.filter((f) => f.id !== id);
    d.estimates = d.estimates.filter((e) => e.feature !== id);
  });
  ws.selection = { kind: 'waterBody' };
  ws.say(
    `Removed ${name}${gone ? ` and its ${gone} estimate${gone === 1 ? '' : 's'}` : ''}; Undo (Ctrl+Z) restores ${gone ? 'them' : 'it'}.`,
  );
}

export function addCondition(ws: Workspace): void {
  const id = uniqueId('condition', ids(ws));
  const from = ws.condition;
  ws.doc.change((d) => {
    const c = blankCondition(id, `Condition ${d.conditions.length + 1}`);
    if (from) c.profile = structuredClone(from.profile);
    d.conditions.push(c);
  });
  ws.conditionChoice = id;
  ws.selection = { kind: 'condition', id };
}

export function removeCondition(ws: Workspace, id: string): void {
  if (ws.doc.site.conditions.length < 2) return ws.say('A site keeps at least one condition.', 'error');
  const name = ws.doc.site.conditions.find((c) => c.id === id)?.name ?? 'the condition';
  const gone = ws.doc.site.estimates.filter((e) => e.condition === id).length;
  ws.doc.change((d) => {
    d.conditions = d.conditions.filter((c) => c.id !== id);
    d.estimates = d.estimates.filter((e) => e.condition !== id);
  });
  ws.selection = { kind: 'waterBody' };
  ws.say(
    `Removed ${name}${gone ? ` and its ${gone} estimate${gone === 1 ? '' : 's'}` : ''}; Undo (Ctrl+Z) restores ${gone ? 'them' : 'it'}.`,
  );
}

export function addEstimate(ws: Workspace): void {
  const id = uniqueId('estimate', ids(ws));
  const conditionId = ws.conditionId;
  ws.doc.change((d) => {
    d.estimates.push({ id, method: 'profile-summary', condition: conditionId, params: {} });
  });
  ws.selection = { kind: 'estimate', id };
}

export function removeEstimate(ws: Workspace, id: string): void {
  ws.doc.change((d) => {
    d.estimates = d.estimates.filter((e) => e.id !== id);
  });
  ws.selection = { kind: 'waterBody' };
}
