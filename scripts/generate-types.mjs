#!/usr/bin/env node
/**
 * Derives the TypeScript type of a species input document from schemas/species.schema.json, so the schema
 * stays the one source of truth. Writes pipeline/generated/species-input.ts (committed); a test regenerates it
 * in memory and fails when the committed file has drifted from the schema.
 *
 * Usage: node scripts/generate-types.mjs
 *
 * Before compiling, the schema is simplified for the type generator only:
 * - `title` is dropped (ours are human "expected ..." phrases, not type names; $defs keys and the name
 *   'SpeciesInput' name the types instead);
 * - siblings of `$ref` are dropped (otherwise every described use of a $def becomes its own type alias);
 * - the structure-dependent `allOf` of if/then rules is dropped: TypeScript cannot express them, so the fields
 *   they require stay optional in the type and the validator enforces them.
 */
import { readFile, writeFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { compile } from 'json-schema-to-typescript';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
export const SCHEMA_PATH = `${ROOT}schemas/species.schema.json`;
export const OUTPUT_PATH = `${ROOT}pipeline/generated/species-input.ts`;

const BANNER = `/* eslint-disable */
/**
 * GENERATED from schemas/species.schema.json by scripts/generate-types.mjs. Do not edit by hand:
 * change the schema and run \`node scripts/generate-types.mjs\`. A test fails when this file drifts.
 */`;

function simplify(node, isRoot = false) {
  if (Array.isArray(node)) return node.map((n) => simplify(n));
  if (node === null || typeof node !== 'object') return node;
  if (typeof node.$ref === 'string') return { $ref: node.$ref };
  const out = {};
  for (const [key, value] of Object.entries(node)) {
    if (key === 'title') continue;
    if (key === 'allOf' && isRoot) continue;
    if ((key === 'properties' || key === '$defs') && value && typeof value === 'object') {
      out[key] = Object.fromEntries(Object.entries(value).map(([k, v]) => [k, simplify(v)]));
    } else {
      out[key] = simplify(value);
    }
  }
  return out;
}

/** The generated TypeScript source for the given schema object. */
export async function generateSpeciesInputTypes(schema) {
  // Without a title the generator would name the root type after its $id.
  return compile({ ...simplify(schema, true), title: 'SpeciesInput' }, 'SpeciesInput', {
    bannerComment: BANNER,
    additionalProperties: false,
    declareExternallyReferenced: true,
    unreachableDefinitions: false,
    format: true,
    strictIndexSignatures: false,
  });
}

async function main() {
  const schema = JSON.parse(await readFile(SCHEMA_PATH, 'utf8'));
  await writeFile(OUTPUT_PATH, await generateSpeciesInputTypes(schema));
  process.stdout.write(`wrote ${OUTPUT_PATH}\n`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  main().catch((err) => {
    process.stderr.write(`${err && err.stack ? err.stack : err}\n`);
    process.exitCode = 1;
  });
}
