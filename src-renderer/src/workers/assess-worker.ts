// Runs the live assessment off the main thread: the one way from the workspace into the physics. One
// incremental assessor per worker, so an edit recomputes only the estimates whose inputs changed.
import { SiteAssessor, type Site } from '../../../shared-core/site';
import type { AssessReply, AssessRequest } from '../lib/assess-messages';

const assessor = new SiteAssessor();

self.onmessage = (event: MessageEvent<AssessRequest>) => {
  const { seq, site } = event.data;
  let reply: AssessReply;
  const t0 = performance.now();
  try {
    const assessment = assessor.assess(site as Site, { gprimeVersion: 'workspace', siteHash: '' }, { bands: false });
    reply = { seq, ok: true, assessment, computed: assessor.computed, ms: performance.now() - t0 };
  } catch (err) {
    reply = { seq, ok: false, error: `the assessment failed (${err instanceof Error ? err.message : String(err)})` };
  }
  (self as unknown as Worker).postMessage(reply);
};
