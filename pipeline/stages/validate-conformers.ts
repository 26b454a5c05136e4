/**
 * Cross-conformer checks of a species with `conformers` (each conformer's own fields go through the same
 * molecular-part validation as a plain species, in validate.ts): unique names, the lowest conformer at
 * energy 0, and the double-counting caveat of hindered rotors.
 */
import type { Conformer } from '../../src/model.js';
import type { AnharmonicReporter } from './validate-anharmonic.js';

type Obj = Record<string, unknown>;

/** Checks over the list; `conformers` are the normalised ones, `raw` the input items (same order). */
export function checkConformerSet(f: AnharmonicReporter, conformers: readonly Conformer[], raw: readonly unknown[]): boolean {
  let ok = true;
  const seen = new Map<string, number>();
  conformers.forEach((c, i) => {
    const first = seen.get(c.label);
    if (first !== undefined) {
      f.error(['conformers', i, 'name'], `conformer name '${c.label}' is already used by conformers[${first}]`, {
        value: c.label,
        expected: 'a name unique within the species',
        code: 'conformer-duplicate-name',
      });
      ok = false;
    } else seen.set(c.label, i);
  });
  const lowest = Math.min(...conformers.map((c) => c.energy));
  if (lowest !== 0) {
    const i = conformers.findIndex((c) => c.energy === lowest);
    f.error(['conformers', i, 'energy'], `the lowest conformer is at ${lowest} cm-1, not at 0`, {
      value: (raw[i] as Obj).energy,
      expected: 'energies measured from the lowest conformer, which is at energy 0',
      code: 'conformer-lowest-energy-not-zero',
    });
    ok = false;
  }
  if (conformers.length > 1) {
    const i = conformers.findIndex((c) => (c.internalRotors?.length ?? 0) > 0);
    if (i >= 0) {
      f.warn(['conformers', i, 'internal_rotors'], 'a hindered rotor already sums over all wells of its torsion; if other conformers listed here are wells of that torsion they are counted twice', {
        key: true,
        expected: 'conformers that differ in a coordinate no listed rotor spans, or one conformer with the rotor alone',
        code: 'conformer-rotor-double-counting',
      });
    }
  }
  return ok;
}
