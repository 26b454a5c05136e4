/**
 * The output schemas as the emit stages validate them: the options of every output check, and the derived
 * schemas of the streamed files (an envelope with its species list required to be empty; one species record
 * or summary entry on its own). The validators are compiled ahead of time from exactly these
 * (scripts/generate-validators.mjs → pipeline/generated/output-validators.ts, drift-tested).
 */
import databaseSchema from '../../schemas/database.schema.json' with { type: 'json' };
import summarySchema from '../../schemas/summary.schema.json' with { type: 'json' };

/** Our output schemas are fixed; checking them against the meta-schema on every run would cost more than the validation (tests do it). */
export const OUTPUT_AJV_OPTIONS = Object.freeze({ allErrors: true, strict: false, validateSchema: false });

/** `schema` with its `species` list required to be empty (a streamed file's frame). */
export function envelopeSchema<S extends { $id: string; properties: object }>(schema: S): S {
  return { ...schema, $id: `${schema.$id}-envelope`, properties: { ...schema.properties, species: { type: 'array', maxItems: 0 } } };
}

/** What each output validator checks: an id the validator is compiled for (a schema's $id or a ref). */
export const OUTPUT_VALIDATOR_TARGETS = Object.freeze({
  validateDatabaseSpecies: `${databaseSchema.$id}#/$defs/species`,
  validateDatabaseEnvelope: `${databaseSchema.$id}-envelope`,
  validateSummaryEntry: `${summarySchema.$id}-species`,
  validateSummaryEnvelope: `${summarySchema.$id}-envelope`,
});

/** The schemas those ids live in (the settings schema too: thermo.json's build_settings refer to it). */
export function outputValidatorSchemas(settingsSchema: object): object[] {
  return [
    settingsSchema,
    databaseSchema,
    envelopeSchema(databaseSchema),
    { ...summarySchema.properties.species.items, $id: OUTPUT_VALIDATOR_TARGETS.validateSummaryEntry },
    envelopeSchema(summarySchema),
  ];
}
