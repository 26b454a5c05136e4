/**
 * Libraries loaded on first use rather than at start-up. A no-change rebuild (every file's findings and
 * every species' outputs from the cache) and most commands never compile a schema at run time (the
 * validators are compiled ahead of time, pipeline/generated/) nor hand a file to the full YAML parser (plain
 * files are read by stages/yaml-plain.ts); loading ajv's compiler and the yaml library costs ~50–100 ms
 * of start-up on the 2-core machine, a twentieth of a 10,000-species rebuild.
 * Both packages are CommonJS, so `require` returns the very instance an `import` would (one module cache).
 */
import { createRequire } from 'node:module';
import type * as AjvModule from 'ajv/dist/2020.js';
import type * as YamlModule from 'yaml';

const requireHere = createRequire(import.meta.url);
let ajv: typeof AjvModule | undefined;
let yaml: typeof YamlModule | undefined;

/** ajv's JSON Schema 2020-12 compiler module. */
export function ajv2020Module(): typeof AjvModule {
  return (ajv ??= requireHere('ajv/dist/2020.js') as typeof AjvModule);
}

/** The yaml library. */
export function yamlModule(): typeof YamlModule {
  return (yaml ??= requireHere('yaml') as typeof YamlModule);
}
