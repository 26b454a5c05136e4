/** Type declarations of scripts/generate-validators.mjs (for the drift test). */
export const VALIDATORS: ReadonlyArray<{ output: string; schema: string; name: string }>;
export function generateValidator(schema: object, schemaFile: string, name: string, options: object): string;
export function readSchema(schemaFile: string): Promise<object>;
export const OUTPUT_VALIDATORS_PATH: string;
export function generateOutputValidators(schemas: object[], targets: Record<string, string>, options: object): string;
