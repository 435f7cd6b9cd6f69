// The program's version as package.json gives it (one source for the report from the app and the command line).
import { version } from '../../../package.json';

export const PROGRAM_NAME = 'Tautline';
export const PROGRAM_VERSION: string = version;
