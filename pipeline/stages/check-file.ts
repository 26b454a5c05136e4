/**
 * The check of one species file's bytes — parse, validate every document under the warning policy, and
 * reduce the file to its findings (`FileFacts`) plus the valid documents' species objects. It depends only
 * on the bytes, the file name, the geometry files they name and the policy (whose use of the settings'
 * accepted warnings it returns as indices, `settingsUsed`), so it gives the same findings on any thread:
 * the runner runs it here or on a worker thread of the build (workers/species-worker.ts).
 */
import { serialize } from 'node:v8';
import type { Species } from '../../src/model.js';
import { createWarningPolicy, type WarningPolicy } from '../core/strict.js';
import type { DatabaseSettings } from '../core/settings.js';
import type { DocumentFacts, FileFacts, Position } from '../storage/fast-entries.js';
import { canonicalJson, sha256Hex } from '../storage/hash.js';
import { toleranceKeyPositions } from './limit-origin.js';
import { loadYamlBytes, type LoadedDocument } from './load.js';
import { hasErrors } from '../core/diagnostics.js';
import { nameFact } from './names.js';
import type { SpeciesValidation } from './validate.js';

/** A valid document's species and its normalised input, as the build needs them later. */
export interface SpeciesPair {
  species: Species;
  normalisedInput: unknown;
}

/** How the species of valid documents come back: as objects, as v8.serialize bytes (for a spill file), or not. */
export type KeepAs = 'objects' | 'bytes' | 'none';

export interface FileCheck {
  facts: FileFacts;
  /** Per document of `facts.documents`: its species when valid and kept (`keep`), else undefined. */
  kept: Array<SpeciesPair | Uint8Array | undefined>;
  loadMs: number;
  validateMs: number;
}

let validation: Promise<typeof import('./validate.js')> | undefined;

/** The source positions of a valid species that later stages quote in their messages. */
export function positionsOf(doc: LoadedDocument): Record<string, Position> {
  const out: Record<string, Position> = {};
  for (const key of ['name', 'composition'] as const) {
    const p = doc.locate([key]);
    if (p) out[key] = { line: p.line, column: p.column };
  }
  const v = doc.value as Record<string, unknown> | null;
  if (v && typeof v === 'object' && 'temperature_ranges' in v) {
    const tr = doc.locate(['temperature_ranges']);
    if (tr) out.temperature_ranges = { line: tr.line, column: tr.column };
  }
  Object.assign(out, toleranceKeyPositions(doc));
  return out;
}

/** The hash a file entry records of one geometry file: of what load attaches to the document for it. */
export const geometryHash = (read: unknown): string => sha256Hex(canonicalJson(read));

/**
 * The warning policy of a file check on any thread: the settings' acceptances only; which of them went
 * unused is the check's finding on the main thread (it sees every file's `settingsUsed`).
 */
export function checkPolicy(settings: DatabaseSettings, strict: boolean): WarningPolicy {
  return createWarningPolicy({ strict, accepted: settings.accepted_warnings });
}

/**
 * Checks a species file from its bytes. `file` is the path as the findings name it (and the base of the
 * geometry files the documents refer to). Documents with only a duplicate key or an unknown tag are checked
 * too, so the user sees every error of the file in one run; they are never built (one of their values is a
 * guess).
 */
export async function checkFileBytes(bytes: Uint8Array, file: string, policy: WarningPolicy, keep: KeepAs): Promise<FileCheck> {
  const tl = performance.now();
  // A view, not a copy: the bytes may have come from another thread as a plain Uint8Array.
  const loaded = await loadYamlBytes(Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), file, file);
  const { validateSpecies } = await (validation ??= import('./validate.js'));
  const used = new Set<number>();
  const validated = (doc: LoadedDocument): SpeciesValidation => {
    const r = validateSpecies(doc);
    const name = doc.value && typeof doc.value === 'object' ? (doc.value as { name?: unknown }).name : undefined;
    r.diagnostics = policy.applySpecies(
      r.diagnostics,
      { raw: doc.value, file: doc.file, ...(typeof name === 'string' ? { name } : {}), locate: (at) => doc.locate(at) },
      used,
    );
    return r;
  };
  const facts: FileFacts = { loadDiagnostics: policy.applyOther(loaded.diagnostics, used), documents: [], recovered: [], settingsUsed: [], geometry: [] };
  const loadMs = performance.now() - tl;
  const tv = performance.now();
  const kept: FileCheck['kept'] = [];
  for (const doc of loaded.documents) {
    const r = validated(doc);
    const fact: DocumentFacts = { ...nameFact(doc), diagnostics: r.diagnostics };
    if (r.species && !hasErrors(r.diagnostics)) {
      fact.valid = { name: r.species.name, positions: positionsOf(doc) };
      const pair: SpeciesPair = { species: r.species, normalisedInput: r.normalisedInput ?? r.species };
      kept.push(keep === 'objects' ? pair : keep === 'bytes' ? serialize(pair) : undefined);
    } else kept.push(undefined);
    facts.documents.push(fact);
  }
  for (const doc of loaded.recoveredDocuments) {
    facts.recovered.push({ ...nameFact(doc), diagnostics: validated(doc).diagnostics, yamlErrors: [...(doc.yamlErrors ?? [])] });
  }
  const validateMs = performance.now() - tv;
  facts.settingsUsed = [...used].sort((a, b) => a - b);
  const geometry = new Map<string, string>();
  for (const doc of [...loaded.documents, ...loaded.recoveredDocuments]) {
    for (const [name, g] of Object.entries(doc.geometryFiles ?? {})) if (!geometry.has(name)) geometry.set(name, geometryHash(g));
  }
  facts.geometry = [...geometry].map(([name, hash]) => ({ name, hash }));
  return { facts, kept, loadMs, validateMs };
}
