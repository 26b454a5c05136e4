/** Relative difference |a/b − 1|, the tolerance measure of the reference comparisons (stdlib-js style). */
export const rel = (a: number, b: number): number => Math.abs(a / b - 1);
