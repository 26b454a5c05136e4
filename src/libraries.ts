/**
 * The CommonJS libraries of the physics core, loaded with `require` rather than `import`.
 *
 * Why: when an ES module imports a CommonJS one, node first lexes its source (and the source of every
 * module it re-exports) to find the export names; `require` only evaluates it. Measured on the 2-core
 * machine, CPU of a fresh process: ml-matrix 64 ms imported against 9 ms required, chemical-elements
 * 99 ms against 41 ms (its re-exported isotope table is 184 KB of source). The lexer also runs hot enough
 * to be compiled by TurboFan, ~0.19 s of background CPU, and every worker thread pays all of it again at
 * its start. `require` returns the same module instance an `import` would (one module cache), so the
 * classes and tables are the same objects either way. This is module loading, not file I/O.
 */
import { createRequire } from 'node:module';
import type * as MlMatrix from 'ml-matrix';
import type * as ChemicalElements from 'chemical-elements';

const requireHere = createRequire(import.meta.url);
const mlMatrix = requireHere('ml-matrix') as typeof MlMatrix;
const chemicalElements = requireHere('chemical-elements') as typeof ChemicalElements;

export const { EigenvalueDecomposition, Matrix, QrDecomposition, SingularValueDecomposition } = mlMatrix;
export const { elementsObject, elementsAndIsotopesObject, isotopesObject } = chemicalElements;
