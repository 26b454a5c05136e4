#!/usr/bin/env node
// Thin launcher: the CLI is compiled to dist/ by `npm run build` (run by `prepare` on `npm ci`).
import { main } from '../dist/pipeline/cli.js';

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err) => {
    process.stderr.write(`qforge: internal error: ${err && err.stack ? err.stack : String(err)}\n`);
    process.exitCode = 3;
  },
);
