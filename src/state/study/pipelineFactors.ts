// The results pipeline's view factors handed to a study on the page (known.ts
// says why). Kept apart from known.ts, which the study worker loads: the worker
// needs no results pipeline.
import { toScene } from '../../document';
import { parseParameter } from '../../document/study';
import { shownResult } from '../results/derive';
import type { ViewFactorCache } from '../results/slice';
import { sameEntries } from '../../core/sameEntries';
import { sameScene } from './known';
import type { StudyRequest } from './run';

/**
 * The request with the pipeline's surface view factors attached when they belong
 * to the request's sketch (not stale, the same scene exactly) and the study keeps
 * its geometry (sensitivity, or a parameter that moves no shape). Otherwise the
 * request as it was. The worker gets a copy (postMessage); in-line runs copy too.
 */
export function withKnownFactors(request: StudyRequest, vf: ViewFactorCache): StudyRequest {
  const shown = shownResult(vf);
  if (!shown || shown.stale) return request;
  if (request.kind !== 'effects') {
    const parsed = parseParameter(request.address);
    if (!parsed.ok || parsed.value.kind === 'shape' || parsed.value.kind === 'row') return request;
  }
  // Not stale: the factors are those of the current checked geometry, which the pipeline holds.
  const held = vf.current;
  if (!held) return request;
  const own = toScene(request.sketch);
  // Same names in the same order: the matrix rows are the study's surfaces.
  if (!sameEntries(own.surfaceNames, held.surfaces.names)) return request;
  const heldScene = {
    polygons: held.polygons,
    circles: held.circles,
    edgeSurface: held.surfaces.edgeSurface,
    surfaceCount: held.surfaces.names.length,
  };
  if (!sameScene(heldScene, own.scene)) return request;
  return { ...request, factors: shown.result };
}
