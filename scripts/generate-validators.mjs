#!/usr/bin/env node
/**
 * Compiles the input schemas (schemas/species.schema.json, schemas/settings.schema.json) to standalone
 * validation code with ajv's own code generator, with the options every input check uses
 * (stages/schema-check.ts INPUT_AJV_OPTIONS), and writes pipeline/generated/species-validator.ts and
 * settings-validator.ts (committed).
 * ajv compiling the two schemas at run time cost 0.3–0.5 s of every build and check; loading the code
 * costs milliseconds. Two modules, so that a run that reads only the settings (a no-change rebuild) does not
 * load the species validator. A test regenerates them in memory and fails when a committed file has drifted
 * from its schema or the options.
 *
 * Also the output validators of the streamed files (pipeline/core/output-schemas.ts says which), which cost
 * another ~0.2 s to compile at run time; they are written to pipeline/generated/output-validators.ts.
 *
 * Usage: npm run build && node scripts/generate-validators.mjs (the options are read from dist/)
 */
import { readFile, writeFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { Ajv2020 } from 'ajv/dist/2020.js';
import standaloneCode from 'ajv/dist/standalone/index.js';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
/** Output file, schema file and export name of each validator. */
export const VALIDATORS = [
  { output: `${ROOT}pipeline/generated/species-validator.ts`, schema: 'species.schema.json', name: 'validateSpeciesInput' },
  { output: `${ROOT}pipeline/generated/settings-validator.ts`, schema: 'settings.schema.json', name: 'validateSettingsInput' },
];

/** A generated module: `ajv` with its schemas added, one export per entry of `exports` (name → schema id or ref). */
function moduleText(ajv, exports, generatedFrom) {
  return `// @ts-nocheck
/* eslint-disable */
/**
 * GENERATED from ${generatedFrom} by scripts/generate-validators.mjs (ajv standalone code). Do not edit by
 * hand: change the schema and run \`npm run build && node scripts/generate-validators.mjs\`. A test fails
 * when this file drifts.
 */
import { createRequire } from 'node:module';
const require = createRequire(import.meta.url);
${standaloneCode.default(ajv, { ...exports }).replace(/^"use strict";/, '')}
`;
}

const standaloneAjv = (options) => new Ajv2020({ ...options, code: { source: true, esm: true, lines: true } });

/** The generated module text: `name`, the validator of `schema` compiled with the ajv `options`. */
export function generateValidator(schema, schemaFile, name, options) {
  const ajv = standaloneAjv(options);
  ajv.addSchema(schema);
  return moduleText(ajv, { [name]: schema.$id }, `schemas/${schemaFile}`);
}

/** The schema object of a file in schemas/. */
export async function readSchema(schemaFile) {
  return JSON.parse(await readFile(`${ROOT}schemas/${schemaFile}`, 'utf8'));
}

/** Output file of the output validators (thermo.json's records and frame, summary.json's entries and frame). */
export const OUTPUT_VALIDATORS_PATH = `${ROOT}pipeline/generated/output-validators.ts`;

/**
 * The generated module of the output validators: `schemas` added to one ajv with `options`, one export per
 * entry of `targets` (export name → schema id or ref); see pipeline/core/output-schemas.ts.
 */
export function generateOutputValidators(schemas, targets, options) {
  const ajv = standaloneAjv(options);
  for (const schema of schemas) ajv.addSchema(schema);
  return moduleText(ajv, targets, 'schemas/database.schema.json, summary.schema.json and settings.schema.json (as\n * pipeline/core/output-schemas.ts derives them)');
}

async function main() {
  const { INPUT_AJV_OPTIONS } = await import(`${ROOT}dist/pipeline/stages/schema-check.js`);
  for (const v of VALIDATORS) {
    await writeFile(v.output, generateValidator(await readSchema(v.schema), v.schema, v.name, INPUT_AJV_OPTIONS));
    process.stdout.write(`wrote ${v.output}\n`);
  }
  const out = await import(`${ROOT}dist/pipeline/core/output-schemas.js`);
  const code = generateOutputValidators(out.outputValidatorSchemas(await readSchema('settings.schema.json')), out.OUTPUT_VALIDATOR_TARGETS, out.OUTPUT_AJV_OPTIONS);
  await writeFile(OUTPUT_VALIDATORS_PATH, code);
  process.stdout.write(`wrote ${OUTPUT_VALIDATORS_PATH}\n`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  main().catch((err) => {
    process.stderr.write(`${err && err.stack ? err.stack : err}\n`);
    process.exitCode = 1;
  });
}
