// How conditions, the surroundings and the gas are named in results tables, and
// the cautions beside them: the same words as the command line's
// (src/document/exchange/labels.ts, cautions.ts).
export { conditionInTable, GAS_LABEL, hasGas, seesSurroundings, SURROUNDINGS_LABEL } from '../../document/exchangeCsv';
export {
  BURN_GUIDES,
  BURN_TEMPERATURE,
  burnWarning,
  GAS_CAUTION,
  RESULTS_CAUTION,
  WALL_TUBE_CAUTION,
} from '../../document/exchange/cautions';
