/**
 * Child process of `npm run bench`: runs one qforge command line in-process (exactly what bin/qforge.js
 * does) and then writes its own wall time, CPU time and peak RSS as JSON to the file named by the first
 * argument, so the parent measures the build alone and not itself.
 *
 * Usage: node dist/bench/child.js REPORT.json build DIR --out OUT ...
 */
import { writeFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { main } from '../pipeline/cli.js';

const [report, ...argv] = process.argv.slice(2);
if (!report) throw new Error('usage: child.js REPORT.json ARGS...');
const t0 = performance.now();
const exitCode = await main(argv, { stdout: { write: () => true } as unknown as NodeJS.WriteStream });
const wallMs = performance.now() - t0;
const usage = process.resourceUsage();
// CPU of every thread of the process (workers included), peak RSS of the process in KiB.
writeFileSync(
  report,
  JSON.stringify({ exitCode, wallMs, userMs: usage.userCPUTime / 1000, systemMs: usage.systemCPUTime / 1000, maxRssKb: usage.maxRSS }),
);
process.exitCode = exitCode;
