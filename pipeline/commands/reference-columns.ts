/**
 * Reference-table header cells that `compare` recognises beyond its own columns. qforge's own CSV tables
 * (`table --format csv`: `H [kJ/mol]`, `G [kJ/mol]`; `build/tables/<name>.csv`: `Cp computed [...]`,
 * `Cp fitted [...]`, `Cp fitted-computed [...]`, …) and published tables (`-(G-H298)/T`, `ΔfG`, `log Kf`)
 * carry columns that compare does not use: those are ignored and reported as such, never a refusal. Any
 * other unknown header stays an error (a column silently skipped could be the one the user meant to check),
 * and so does an unknown unit in a column that is used.
 *
 * In `build/tables/<name>.csv` the `computed` columns (the partition-function values) are the reference;
 * the `fitted` and `fitted-computed` columns are ignored.
 */

/**
 * Header names of a ΔfH° column. compare uses its 298.15 K value against the polynomial's H(298.15)
 * (which is ΔfH°(298.15) in the NASA convention); values at other temperatures are ΔfH(T), which needs
 * the elements' tables, so they are reported as not compared.
 */
export const FORMATION_ENTHALPY_NAMES = { ΔfH: 'dfh', 'ΔfH°': 'dfh', DfH: 'dfh', 'DfH°': 'dfh' } as const;

/** Quantities compare does not use, by their header name (without the unit). */
const UNUSED_NAMES = new Set([
  'H',
  'G',
  '-(G-H298)/T',
  '-(G-H298.15)/T',
  '-[G-H(298.15)]/T',
  '-(G-H(298.15))/T',
  'ΔfG',
  'ΔfG°',
  'DfG',
  'log Kf',
  'logKf',
  'log10 Kf',
]);

export type HeaderAlias = { ignored: true } | { ignored: false; cell: string };

/**
 * A header cell as compare's own parser should read it: `{ignored: true}` for a column that is known but
 * not used, else the cell with a qforge `computed` qualifier removed (`Cp computed [J/(mol K)]` →
 * `Cp [J/(mol K)]`), else the cell unchanged.
 */
export function referenceHeaderAlias(cell: string): HeaderAlias {
  const c = cell.trim();
  const q = /^(\S+)\s+(computed|fitted|fitted-computed)\s*(\[.*\])?$/.exec(c);
  if (q && q[2] !== 'computed') return { ignored: true };
  const plain = q ? `${q[1]}${q[3] ? ` ${q[3]}` : ''}` : c;
  const name = plain.replace(/\s*\[.*\]$/, '').trim();
  return UNUSED_NAMES.has(name) ? { ignored: true } : { ignored: false, cell: plain };
}
