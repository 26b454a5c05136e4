/** Type declarations of scripts/generate-types.mjs (for the drift test). */
export const SCHEMA_PATH: string;
export const OUTPUT_PATH: string;
export function generateSpeciesInputTypes(schema: object): Promise<string>;
