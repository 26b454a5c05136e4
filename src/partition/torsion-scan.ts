/**
 * A torsional potential from a scan: least-squares Fourier series in multiples of the rotor symmetry number.
 */
import { Matrix, QrDecomposition } from '../libraries.js';
import type { FourierTerm } from '../model.js';
import { fourierPotential } from './fourier-rotor.js';

/** At most this many harmonics are fitted (enough for any smooth torsion; more would follow scan noise). */
export const MAX_SCAN_HARMONICS = 8;

export class TorsionScanError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
    this.name = 'TorsionScanError';
  }
}

export interface TorsionScanFit {
  terms: FourierTerm[];
  /** Root-mean-square and largest absolute residual of the fit at the scan points, cm⁻¹. */
  rmsResidual: number;
  maxResidual: number;
  /** max − min of the scan energies, cm⁻¹. */
  range: number;
  /** Largest gap between scan angles reduced to one period, degrees, and the period. */
  largestGapDegrees: number;
  periodDegrees: number;
}

/**
 * Largest gap (degrees) between the scan angles reduced modulo the period 360/σ, going round the circle.
 * A scan "covers the period" when this gap is small; the caller sets the limit.
 */
export function largestScanGap(anglesDegrees: readonly number[], symmetryNumber: number): number {
  const period = 360 / symmetryNumber;
  const reduced = [...new Set(anglesDegrees.map((a) => Number((((a % period) + period) % period).toFixed(9)) % period))].sort((x, y) => x - y);
  if (reduced.length === 0) return period;
  let gap = reduced[0]! + period - reduced[reduced.length - 1]!;
  for (let i = 1; i < reduced.length; i++) gap = Math.max(gap, reduced[i]! - reduced[i - 1]!);
  return gap;
}

/**
 * Fits V(φ) = c0 + Σ_{k=1..K} [a_k cos(kσφ) + b_k sin(kσφ)] to scan points (φ in degrees, V in cm⁻¹) by
 * linear least squares (ml-matrix QR), K = min(MAX_SCAN_HARMONICS, ⌊(distinct angles per period − 1)/2⌋), and
 * returns it in our form V_cos,n = −2a_k, V_sin,n = 2b_k with n = kσ (the constant drops out: energies are
 * measured from the lowest level). Only harmonics of σ are fitted because a top of symmetry σ has a
 * potential of period 2π/σ. Throws TorsionScanError `rotor-scan-too-few-points` below 3 distinct angles per
 * period. Source: standard practice for relaxed torsional scans (e.g. East & Radom, J. Chem. Phys. 106,
 * 6655 (1997), who fit scans to Fourier series before the level calculation).
 */
export function fitTorsionScan(points: ReadonlyArray<readonly [number, number]>, symmetryNumber: number): TorsionScanFit {
  const period = 360 / symmetryNumber;
  const distinct = new Set(points.map(([a]) => Number((((a % period) + period) % period).toFixed(9)) % period)).size;
  const harmonics = Math.min(MAX_SCAN_HARMONICS, Math.floor((distinct - 1) / 2));
  if (harmonics < 1) {
    throw new TorsionScanError('rotor-scan-too-few-points', `${distinct} distinct angle${distinct === 1 ? '' : 's'} per period of ${period} degrees: too few to fit a potential`);
  }
  const rad = Math.PI / 180;
  const design = new Matrix(points.length, 2 * harmonics + 1);
  const y = new Matrix(points.length, 1);
  points.forEach(([angle, v], row) => {
    design.set(row, 0, 1);
    for (let k = 1; k <= harmonics; k++) {
      design.set(row, 2 * k - 1, Math.cos(k * symmetryNumber * angle * rad));
      design.set(row, 2 * k, Math.sin(k * symmetryNumber * angle * rad));
    }
    y.set(row, 0, v);
  });
  const c = new QrDecomposition(design).solve(y);
  const terms: FourierTerm[] = [];
  for (let k = 1; k <= harmonics; k++) terms.push({ n: k * symmetryNumber, cos: -2 * c.get(2 * k - 1, 0), sin: 2 * c.get(2 * k, 0) });
  const offset = c.get(0, 0) + terms.reduce((s, t) => s - t.cos / 2, 0);
  let sumSquares = 0;
  let maxResidual = 0;
  for (const [angle, v] of points) {
    const r = v - (offset + fourierPotential(terms, angle * rad));
    sumSquares += r * r;
    maxResidual = Math.max(maxResidual, Math.abs(r));
  }
  const energies = points.map(([, v]) => v);
  return {
    terms,
    rmsResidual: Math.sqrt(sumSquares / points.length),
    maxResidual,
    range: Math.max(...energies) - Math.min(...energies),
    largestGapDegrees: largestScanGap(points.map(([a]) => a), symmetryNumber),
    periodDegrees: period,
  };
}
