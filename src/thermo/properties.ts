/**
 * Standard properties in table units from the dimensionless functions of an evaluator.
 */
import { GAS_CONSTANT } from '../constants.js';
import type { StandardProperties, ThermoEvaluator } from '../model.js';

/**
 * Formula: Cp = R·cp, S = R·s, H − H298 = R T (H−H0)/RT − [H298 − H0],
 *          H = ΔfH°(298.15) + (H − H298), G = H − T S, hRT = H/(R T).
 * Units: T in K; Cp, S in J/(mol K); H − H298, H, G in kJ/mol. Valid wherever the evaluator is.
 * Source: definitions of the standard functions, e.g. NIST-JANAF 4th ed. (Chase 1998), introduction.
 */
export function standardProperties(ev: ThermoEvaluator, T: number): StandardProperties {
  return standardPropertiesOf(ev, T, ev.at(T));
}

/** `standardProperties` from already-evaluated dimensionless functions at T (e.g. one point of a grid). */
export function standardPropertiesOf(
  ev: Pick<ThermoEvaluator, 'h298MinusH0' | 'enthalpyOfFormation298'>,
  T: number,
  point: { cp: number; hmh0: number; s: number },
): StandardProperties {
  const R = GAS_CONSTANT;
  // Same operand order as the evaluator's h298MinusH0, so this is exactly 0 at 298.15 K.
  const hMinusH298Exact = R * T * point.hmh0 - ev.h298MinusH0; // J/mol
  const H = ev.enthalpyOfFormation298 + hMinusH298Exact; // J/mol
  const S = R * point.s;
  return {
    T,
    Cp: R * point.cp,
    S,
    HminusH298: hMinusH298Exact / 1000,
    H: H / 1000,
    G: (H - T * S) / 1000,
    cpR: point.cp,
    hRT: H / (R * T),
    sR: point.s,
  };
}
