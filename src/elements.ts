/**
 * Element data and molar masses.
 *
 * Atomic weights come from the `chemical-elements` package (cheminfo), which derives each standard atomic
 * weight from the IUPAC/CIAAW isotopic compositions and atomic masses (AME). The heavy hydrogen isotopes are
 * accepted as the pseudo-elements D (²H) and T (³H) with their isotopic masses. Electron mass: CODATA 2018.
 */
import { elementsObject, isotopesObject } from './libraries.js';
import { ELECTRON_MASS_U } from './constants.js';

interface ElementRecord {
  symbol: string;
  atomicWeight: number; // g/mol
}

function isotopeMass(symbol: string, nucleons: number): number {
  const iso = (isotopesObject as Record<string, { mass: number }>)[`${nucleons}${symbol}`];
  if (!iso) throw new Error(`isotope ${nucleons}${symbol} missing from element data`);
  return iso.mass;
}

const TABLE: ReadonlyMap<string, ElementRecord> = (() => {
  const m = new Map<string, ElementRecord>();
  for (const [symbol, e] of Object.entries(elementsObject as Record<string, { mass: number | null }>)) {
    if (typeof e.mass === 'number' && Number.isFinite(e.mass)) m.set(symbol, { symbol, atomicWeight: e.mass });
  }
  m.set('D', { symbol: 'D', atomicWeight: isotopeMass('H', 2) });
  m.set('T', { symbol: 'T', atomicWeight: isotopeMass('H', 3) });
  // The free electron, composition {E: 1} with charge -1: its mass enters through the charge term of
  // molarMass (− z·m_e), so E itself weighs nothing and e⁻ comes out at m_e (CODATA 2018).
  m.set('E', { symbol: 'E', atomicWeight: 0 });
  return m;
})();

/** True when `symbol` is an element (or D/T) with a known atomic weight. */
export function isKnownElement(symbol: string): boolean {
  return TABLE.has(symbol);
}

/** Standard atomic weight in g/mol; throws for an unknown symbol (validate first). */
export function atomicWeight(symbol: string): number {
  const e = TABLE.get(symbol);
  if (!e) throw new Error(`unknown element symbol '${symbol}'`);
  return e.atomicWeight;
}

/**
 * Molar mass of a species, g/mol: Σ n_i·A_i − z·m_e, where z is the charge (positive for cations, which
 * have lost electrons). Composition maps element symbol → count.
 */
export function molarMass(composition: Readonly<Record<string, number>>, charge = 0): number {
  let m = 0;
  for (const [symbol, n] of Object.entries(composition)) m += n * atomicWeight(symbol);
  return m - charge * ELECTRON_MASS_U;
}
