/**
 * Entry of a species worker thread: checks species files from their bytes (stages/check-file.ts) and
 * receives batches of validated species and returns their outcomes (compute → fit → verify → table
 * through the cache, exactly `buildOneSpecies` of the runner). Loaded
 * from the compiled dist/ code. A thrown error is sent back for the batch; anything worse (a crash, an
 * exit) is seen by the pool as the worker's 'error'/'exit' event.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { buildOneSpecies, type LimitSource } from '../runner.js';
import { StageCache } from '../storage/cache.js';
import { useCodeFingerprint } from '../storage/code-fingerprint.js';
import { errorText } from '../core/text.js';
import { checkFileBytes, checkPolicy } from '../stages/check-file.js';
import { renderTable } from '../stages/emit-table.js';
import type { WorkerInit, WorkerReply, WorkRequest } from './protocol.js';

const init = workerData as WorkerInit;
useCodeFingerprint(init.codeFingerprint);
const cache = new StageCache(init.cacheDir);
const uncertaintyOptions = init.uncertaintySamples !== undefined ? { uncertaintySamples: init.uncertaintySamples } : {};
const limits: LimitSource = {
  settingsSetAt: (segments) => init.limits.setAt[segments.join('.')],
  ...(init.limits.settingsFile !== undefined ? { settingsFile: init.limits.settingsFile } : {}),
};

const policy = checkPolicy(init.settings, init.strict === true);

parentPort!.on('message', (req: WorkRequest) => {
  void (async () => {
    let reply: WorkerReply;
    try {
      if ('check' in req) {
        const { file, bytes, keep } = req.check;
        if (init.testCrashOn !== undefined && file.endsWith(`${init.testCrashOn}.yaml`)) process.exit(70);
        const checked = await checkFileBytes(bytes, file, policy, keep);
        // v8.serialize gives each value an ArrayBuffer of its own: moved, not copied.
        const transfer = checked.kept.flatMap((k) => (k instanceof Uint8Array && k.byteOffset === 0 && k.buffer.byteLength === k.byteLength ? [k.buffer as ArrayBuffer] : []));
        parentPort!.postMessage({ id: req.id, checked } satisfies WorkerReply, transfer);
        return;
      }
      const outcomes = [];
      for (const v of req.species) {
        if (init.testCrashOn !== undefined && v.name === init.testCrashOn) process.exit(70);
        const o = await buildOneSpecies(v, init.settings, cache, limits, uncertaintyOptions);
        if (init.keepSamples !== true) {
          if (o.built) o.built.computed = { ...o.built.computed, samples: [], extrapolationSamples: [] };
          // Only the report reads a species object back on the main thread (a rebuild of one species
          // reads it again from the spill file or its own file).
          const { species: _species, normalisedInput: _input, ...meta } = o.valid;
          o.valid = meta;
        }
        // The table is rendered here, where the species was built, and crosses as one string: cheaper to
        // clone than its points, and the main thread, which emits every species, does less (BuiltSpecies.tableText).
        if (o.built && init.settings.outputs.tables) {
          o.built.tableText = renderTable(o.built);
          o.built.table = [];
        }
        outcomes.push(o);
      }
      // Written before the answer: the pool may stop this thread right after the last one.
      cache.flushWrites();
      reply = { id: req.id, outcomes };
      if (cache.writeProblem !== undefined) reply.cacheWriteProblem = cache.writeProblem;
    } catch (e) {
      cache.flushWrites();
      reply = { id: req.id, error: errorText(e) };
    }
    parentPort!.postMessage(reply);
  })();
});
