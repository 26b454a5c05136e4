/**
 * Shared copies of small read-only records that recur across species: a build keeps one record per species
 * until the end (its source positions, ~0.5 KB as separate objects), and in a database of similar files
 * most of them are equal (`name` on line 2, column 7 in every file). Equal records are frozen and shared;
 * after MAX_INTERNED distinct ones, new ones are kept as they are (the memory bound of the table itself).
 */
export const MAX_INTERNED = 4096;

type Positions = Record<string, { line: number; column: number }>;

export class PositionInterner {
  private readonly records = new Map<string, Positions>();

  /** An equal frozen record shared with earlier callers (same keys in the same order, same numbers). */
  intern<P extends Positions>(positions: P): P {
    let signature = '';
    for (const key in positions) {
      const p = positions[key]!;
      signature += `${key}\u0000${p.line}\u0000${p.column}\u0000`;
    }
    const known = this.records.get(signature);
    if (known) return known as P;
    if (this.records.size >= MAX_INTERNED) return positions;
    const copy = {} as Positions;
    for (const key in positions) copy[key] = Object.freeze({ line: positions[key]!.line, column: positions[key]!.column });
    this.records.set(signature, Object.freeze(copy));
    return copy as P;
  }
}
