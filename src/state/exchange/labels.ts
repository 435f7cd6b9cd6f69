// How conditions and the surroundings are named in results tables: the same
// words as the command line's table (src/document/exchange/labels.ts).
export { conditionInTable, seesSurroundings, SURROUNDINGS_LABEL } from '../../document/exchangeCsv';
