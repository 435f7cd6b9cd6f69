// How conditions and the surroundings are named in results tables: the same
// words as the command line's table (src/document/exchangeCsv.ts).
export { conditionInTable, seesSurroundings } from '../../document/exchangeCsv';
