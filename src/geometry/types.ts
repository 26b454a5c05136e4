/** Shapes shared by the steps of the geometry library. Lengths in Å, masses in u (unified atomic mass units). */

/** One atom of a geometry row: its symbol as written, the composition element it counts as, mass and position. */
export interface Atom {
  /** As written: an element (C), an isotope (13C, 2H) or D / T. */
  symbol: string;
  /** The composition key it counts under: the element, except D and T (also written 2H, 3H). */
  element: string;
  /** Isotopic mass, u. */
  mass: number;
  /** Cartesian position, Å. */
  position: readonly [number, number, number];
}

export type Vector3 = [number, number, number];
/** Row-major 3×3 matrix. */
export type Matrix3 = [Vector3, Vector3, Vector3];
