#!/usr/bin/env node
// `npx tautline <command> FILE [options]` in a checkout: runs the TypeScript
// command line (src/cli/main.ts) through tsx, a dev dependency, so no build
// step is needed. Exit code, standard input and output pass straight through.
import { spawnSync } from 'node:child_process';
import { createRequire } from 'node:module';
import process from 'node:process';
import { URL, fileURLToPath } from 'node:url';

const main = fileURLToPath(new URL('./main.ts', import.meta.url));
const require = createRequire(import.meta.url);
let tsxCli;
try {
  tsxCli = require.resolve('tsx/cli');
} catch {
  process.stderr.write('tautline: tsx is not installed; run `npm ci` in the checkout first\n');
  process.exit(1);
}
const run = spawnSync(process.execPath, [tsxCli, main, ...process.argv.slice(2)], { stdio: 'inherit' });
if (run.error) {
  process.stderr.write(`tautline: could not start the command line: ${run.error.message}\n`);
  process.exit(1);
}
// A signal (e.g. Ctrl-C) ends the child without a status: report it as a failure.
process.exit(run.status ?? 1);
