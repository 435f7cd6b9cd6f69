// The whole surface balance: radiation, convection to a transparent gas, and
// what lies behind each surface (lined walls, tubes, thin linked plates).
export {
  backHeat,
  layerResistance,
  layerTemperatures,
  tubeResistance,
  tubeWallResistance,
  wallFlux,
  type BalanceCondition,
  type LinkedCondition,
  type TubeCondition,
  type WallCondition,
  type WallLayer,
} from './conditions';
export { balanceNodes, nodeCoupling, nodeIrradiation } from './nodes';
export { RadiosityNetwork } from './radiosity';
export { balanceInputFor, type BalanceSetup } from './setup';
export { BALANCE_TOLERANCE, MAX_ITERATIONS, solveBalance } from './solve';
export type { BalanceInput, BalanceOutcome, BalanceResult } from './types';
