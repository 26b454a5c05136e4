/**
 * The free electron as a species: composition {E: 1}, charge −1, structure atom, one level of degeneracy 2
 * (spin). Its molar mass is m_e (src/elements.ts) and, under the thermal-electron convention of
 * src/thermo/reference-states.ts (NIST-JANAF 4th ed.), ΔfH°(e⁻) = 0 at every T. E may not appear in any
 * other composition: ions carry their electrons through `charge`.
 */
import type { Structure } from '../../src/model.js';
import type { AnharmonicReporter } from './validate-anharmonic.js';

export function checkElectron(
  f: AnharmonicReporter,
  composition: { counts: Record<string, number>; symbols: string[] } | undefined,
  charge: unknown,
  structure: Structure | undefined,
  electronicLevels: unknown,
): void {
  if (!composition || !composition.symbols.includes('E')) return;
  const alone = composition.symbols.length === 1 && composition.counts.E === 1;
  if (!alone || charge !== -1 || structure !== 'atom') {
    f.error(['composition', 'E'], "E is the free electron: it is a species of its own, composition {E: 1}, charge -1, structure 'atom'", {
      key: true,
      value: { composition: composition.counts, charge: charge ?? 0, structure },
      expected: "composition {E: 1}, charge: -1, structure: atom for e-; an ion gives its charge with 'charge' and no E",
      code: 'electron-composition',
    });
    return;
  }
  const levels = Array.isArray(electronicLevels) ? electronicLevels : undefined;
  const g = levels?.length === 1 && levels[0] !== null && typeof levels[0] === 'object' ? (levels[0] as { degeneracy?: unknown }).degeneracy : undefined;
  if (g !== 2) {
    f.warn(levels ? ['electronic_levels'] : ['composition', 'E'], 'the free electron has one level of spin degeneracy 2 (S = 1/2)', {
      key: levels === undefined,
      value: electronicLevels,
      expected: 'electronic_levels: [{energy: 0, degeneracy: 2}] (without it S is R ln 2 low)',
      code: 'electron-spin-degeneracy',
    });
  }
}
