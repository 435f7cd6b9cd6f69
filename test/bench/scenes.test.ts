// Every scene the benchmarks time is a sketch the app would accept: a bench figure for
// a sketch with a tube through a wall times an answer no user can get. Named after the
// fault it caught: the tube bank's last tube of the second row crossed the right wall
// (centre 12.06 in a 12 m box), and the core's factors next to it disagreed with the
// ray-cast reference by up to 3e-3, as they may on a sketch outside its rules.
import { describe, expect, it } from 'vitest';
import { checkCircles } from '../../src/core/arc/circleChecks';
import type { SceneInput } from '../../src/core/scene';
import { checkSketchGeometry } from '../../src/core/sketchChecks';
import { emptyOval } from './floor';
import { hardScene } from './hardScenes';
import { bankScene, furnaceScene, tubeScene } from './scenes';
import { studySketch } from './bigSketch';
import { restore } from '../../src/document';
import { runStudy } from '../../src/state/study';

function problems(scene: SceneInput): unknown[] {
  const polygons = scene.polygons.map((polygon, shape) => ({ shape, polygon }));
  const circles = (scene.circles ?? []).map((circle, k) => ({ shape: scene.polygons.length + k, circle }));
  return [...checkSketchGeometry(scene.polygons), ...checkCircles(polygons, circles)];
}

describe('bench scenes are valid sketches', () => {
  const scenes: [string, SceneInput][] = [
    ['tube bank', bankScene()],
    ['deep tube bank', bankScene(4)],
    ['furnace section, exact circles', furnaceScene(0)],
    ['furnace section, 24-sided tubes', furnaceScene(24)],
    ['20 tubes, 100 edges', tubeScene(1, 20, 4, 20)],
    ['20 tubes, 400 edges', tubeScene(1, 20, 18, 40)],
    ['20 tubes, 1600 edges', tubeScene(1, 20, 75, 100)],
    ['hard scene, 1000 edges', hardScene(13, 1000)],
    ['hard scene, 2000 edges', hardScene(13, 2000)],
    ['empty oval', emptyOval(400)],
  ];
  for (const [name, scene] of scenes) {
    it(name, () => {
      expect(problems(scene)).toEqual([]);
    });
  }

  it('the check finds a tube through a wall (the old tube bank)', () => {
    const scene = bankScene();
    const circles = scene.circles!.map((c) => ({ ...c }));
    circles[circles.length - 1].cx = 12.06;
    expect(problems({ ...scene, circles })).not.toEqual([]);
  });
});

describe('the study bench sketch', () => {
  it('is a valid file whose sensitivity the app can work out (the browser bench times it)', () => {
    const read = restore(studySketch());
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    const reply = runStudy({ kind: 'effects', sketch: read.sketch });
    expect(reply.kind).toBe('effects');
  });
});
