// The condition behind a surface as the file gives it: the core's conditions,
// except that a linked face names its plate's other face (the core numbers it).
import type { TubeCondition, WallCondition } from '../../core/balance';
import type { SurfaceCondition } from '../../core/exchange';

export type { SurfaceCondition } from '../../core/exchange';
export type { TubeProperties, WallProperties } from '../schema';

/** One face of a thin plate; `surface` names the other face. */
export interface LinkedByName {
  kind: 'linked';
  surface: string;
}

/** A condition as the file gives it (units as in src/core/balance/conditions.ts: K, m, W/(m K), W/(m^2 K)). */
export type SketchCondition = SurfaceCondition | WallCondition | TubeCondition | LinkedByName;
