/**
 * The one error class of the geometry library. `code` is stable (lower kebab-case) so the pipeline can turn
 * it into a diagnostic with the same code; `atoms` are the 0-based indices of the atoms concerned.
 */
export class GeometryError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly atoms: readonly number[] = [],
  ) {
    super(message);
    this.name = 'GeometryError';
  }
}
