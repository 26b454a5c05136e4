/**
 * Entry of a species worker thread: receives batches of validated species and returns their outcomes
 * (compute → fit → verify → table through the cache, exactly `buildOneSpecies` of the runner). Loaded
 * from the compiled dist/ code. A thrown error is sent back for the batch; anything worse (a crash, an
 * exit) is seen by the pool as the worker's 'error'/'exit' event.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { buildOneSpecies, type LimitSource } from '../runner.js';
import { StageCache } from '../storage/cache.js';
import { useCodeFingerprint } from '../storage/code-fingerprint.js';
import { errorText } from '../core/text.js';
import { renderTable } from '../stages/emit-table.js';
import { replyOutcome, type BatchRequest, type ReplyOutcome, type WorkerInit, type WorkerReply } from './protocol.js';

const init = workerData as WorkerInit;
useCodeFingerprint(init.codeFingerprint);
const cache = new StageCache(init.cacheDir);
const uncertaintyOptions = init.uncertaintySamples !== undefined ? { uncertaintySamples: init.uncertaintySamples } : {};
const limits: LimitSource = {
  settingsSetAt: (segments) => init.limits.setAt[segments.join('.')],
  ...(init.limits.settingsFile !== undefined ? { settingsFile: init.limits.settingsFile } : {}),
};

parentPort!.on('message', (req: BatchRequest) => {
  void (async () => {
    let reply: WorkerReply;
    try {
      const outcomes: ReplyOutcome[] = [];
      for (const v of req.species) {
        if (init.testCrashOn !== undefined && v.name === init.testCrashOn) process.exit(70);
        const o = await buildOneSpecies(v, init.settings, cache, limits, uncertaintyOptions);
        if (o.built && init.keepSamples !== true) o.built.computed = { ...o.built.computed, samples: [], extrapolationSamples: [] };
        // The table is rendered here, where the species was built, and crosses as one string (see BuiltSpecies.tableText).
        if (o.built && init.settings.outputs.tables) {
          o.built.tableText = renderTable(o.built);
          o.built.table = [];
        }
        outcomes.push(replyOutcome(o));
      }
      reply = { id: req.id, outcomes };
      if (cache.writeProblem !== undefined) reply.cacheWriteProblem = cache.writeProblem;
    } catch (e) {
      reply = { id: req.id, error: errorText(e) };
    }
    parentPort!.postMessage(reply);
  })();
});
