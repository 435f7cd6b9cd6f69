// The worker's API over a real message channel (comlink), as the browser runs it.
import { describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { MessageChannel } from 'node:worker_threads';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import { viewFactorApi } from '../../src/worker/api';
import { jobFromPolygons, type ViewFactorApi } from '../../src/worker/job';
import { computeViewFactors } from '../../src/core/viewFactors';
import { documentApi } from '../../src/state/documentApi';
import { surfaceFactors } from '../../src/state/results/derive';
import { surfaceIndex } from '../../src/document/surfaceIndex';
import { demoSketch } from '../../src/state/demo';

/** The checked form of a sketch, as the app passes it to toScene. */
function checked(doc: unknown) {
  const r = documentApi.restore(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.sketch;
}

describe('worker api', () => {
  it('returns edge factors through the channel that sum to the surface matrix the core gives directly', async () => {
    const { port1, port2 } = new MessageChannel();
    Comlink.expose(viewFactorApi, nodeEndpoint(port1));
    const remote = Comlink.wrap<ViewFactorApi>(nodeEndpoint(port2));
    const sketch = checked(demoSketch);
    const { scene } = documentApi.toScene(sketch);
    const direct = computeViewFactors(scene);
    const viaWorker = await remote.compute(jobFromPolygons(scene.polygons));
    expect(viaWorker.F).toBeInstanceOf(Float64Array);
    expect(viaWorker.F).toHaveLength(direct.edgeCount * direct.edgeCount);
    expect(viaWorker.closed).toBe(true);
    const summed = surfaceFactors(viaWorker, surfaceIndex(sketch.shapes));
    expect(Array.from(summed.F)).toEqual(Array.from(direct.F));
    expect(Array.from(summed.surfaceLength)).toEqual(Array.from(direct.surfaceLength));
    port1.close();
    port2.close();
  });
});
