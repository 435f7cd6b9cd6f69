// The worker's API over a real message channel (comlink), as the browser runs it.
import { describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { MessageChannel } from 'node:worker_threads';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import { viewFactorApi } from '../../src/worker/api';
import type { ViewFactorApi } from '../../src/worker/job';
import { jobFromScene } from '../../src/worker/job';
import { computeViewFactors } from '../../src/core/viewFactors';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';

/** The checked form of a sketch, as the app passes it to toScene. */
function checked(doc: unknown) {
  const r = documentApi.restore(doc);
  if (!r.ok) throw new Error(r.errors.join('; '));
  return r.sketch;
}

describe('worker api', () => {
  it('returns the same matrix through the channel as the core gives directly', async () => {
    const { port1, port2 } = new MessageChannel();
    Comlink.expose(viewFactorApi, nodeEndpoint(port1));
    const remote = Comlink.wrap<ViewFactorApi>(nodeEndpoint(port2));
    const { scene } = documentApi.toScene(checked(demoSketch));
    const direct = computeViewFactors(scene);
    const viaWorker = await remote.compute(jobFromScene(scene));
    expect(viaWorker.F).toBeInstanceOf(Float64Array);
    expect(Array.from(viaWorker.F)).toEqual(Array.from(direct.F));
    expect(Array.from(viaWorker.surfaceLength)).toEqual(Array.from(direct.surfaceLength));
    expect(viaWorker.closed).toBe(true);
    port1.close();
    port2.close();
  });
});
