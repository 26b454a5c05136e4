/**
 * Isotopic masses of the atoms of a geometry.
 *
 * Source: the `chemical-elements` package (cheminfo), whose isotope table holds the atomic masses of the
 * Atomic Mass Evaluation (AME) and the representative isotopic compositions of IUPAC/CIAAW. A bare element
 * symbol means its most abundant isotope (¹H, ¹²C, ¹⁶O, ³²S, ...), the convention of spectroscopic
 * structures; an isotope is written with its mass number first (13C, 2H, 18O) and D, T stand for ²H, ³H.
 */
import { elementsAndIsotopesObject } from '../libraries.js';
import { GeometryError } from './errors.js';

interface IsotopeRecord {
  nominal: number;
  mass: number;
  abundance?: number;
}

const ELEMENTS = elementsAndIsotopesObject as unknown as Record<string, { isotopes: IsotopeRecord[] }>;

/** The composition element an atom symbol counts under and its isotopic mass (u). */
export interface AtomIdentity {
  element: string;
  mass: number;
}

const SYMBOL = /^(\d{1,3})?([A-Z][a-z]{0,2})$/;

/**
 * Resolves `symbol` (C, 13C, D, T, 2H, 3H) to its composition element and isotopic mass, u.
 * Hydrogen isotopes count as the pseudo-elements D and T of the composition (as in src/elements.ts), so a
 * CH3OD geometry matches composition {C: 1, H: 3, O: 1, D: 1}. Throws GeometryError `geometry-unknown-atom`
 * for an unknown element or isotope, and for an element without a stable isotope given without a mass number.
 */
export function atomIdentity(symbol: string): AtomIdentity {
  const written = symbol === 'D' ? '2H' : symbol === 'T' ? '3H' : symbol;
  const match = SYMBOL.exec(written);
  const record = match ? ELEMENTS[match[2]!] : undefined;
  if (!match || !record) {
    throw new GeometryError('geometry-unknown-atom', `unknown atom symbol '${symbol}'`);
  }
  const elementSymbol = match[2]!;
  let iso: IsotopeRecord | undefined;
  if (match[1] !== undefined) {
    const nominal = Number(match[1]);
    iso = record.isotopes.find((i) => i.nominal === nominal);
    if (!iso) throw new GeometryError('geometry-unknown-atom', `no isotope ${nominal}${elementSymbol} in the isotope table`);
  } else {
    for (const i of record.isotopes) if ((i.abundance ?? 0) > (iso?.abundance ?? 0)) iso = i;
    if (!iso) {
      throw new GeometryError('geometry-unknown-atom', `${elementSymbol} has no stable isotope: give the mass number (e.g. 99${elementSymbol})`);
    }
  }
  const element = elementSymbol === 'H' && iso.nominal === 2 ? 'D' : elementSymbol === 'H' && iso.nominal === 3 ? 'T' : elementSymbol;
  return { element, mass: iso.mass };
}
