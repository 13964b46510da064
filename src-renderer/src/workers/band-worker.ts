// Computes one estimate's Monte Carlo uncertainty band off the main thread (a band is 1000 method runs).
import { runEstimate, type Site } from '../../../shared-core/site';
import type { BandReply, BandRequest } from '../lib/band-messages';

self.onmessage = (event: MessageEvent<BandRequest>) => {
  const { seq, site, index } = event.data;
  let reply: BandReply;
  try {
    const s = site as Site;
    const post = (m: BandReply) => (self as unknown as Worker).postMessage(m);
    const outcome = runEstimate(s, s.estimates[index], index, {
      bandProgress: (done, total) => post({ seq, progress: done / total }),
    });
    if (outcome.status === 'error')
      reply = { seq, ok: false, error: outcome.error ?? 'the estimate cannot be computed' };
    else if (!outcome.uncertainty) reply = { seq, ok: false, error: 'no input uncertainty is stated' };
    else reply = { seq, ok: true, uncertainty: outcome.uncertainty };
  } catch (err) {
    reply = { seq, ok: false, error: `the band could not be computed (${String(err)})` };
  }
  (self as unknown as Worker).postMessage(reply);
};
