/**
 * The common result of every partition-function model: the logarithm of the partition function and the
 * two derivatives that give the thermodynamic functions exactly, with no numerical differentiation.
 *
 * For a factor Q(T) of the molecular partition function:
 *   lnQ    = ln Q                                  (dimensionless)
 *   meanU  = T·d(ln Q)/dT                          → contribution to (H − H0)/(R T)
 *   varU   = d(T·meanU)/dT                         → contribution to Cp/R
 * so that S/R = Σ (lnQ + meanU). For a sum over levels with u = E/(kT) these are ln q, ⟨u⟩ and
 * ⟨u²⟩ − ⟨u⟩². The translational factor also carries the ideal-gas pV = RT term (H = U + RT) and the
 * 1/N! of indistinguishable particles, so its meanU = varU = 5/2 (see translational.ts).
 *
 * Source: standard statistical thermodynamics, e.g. McQuarrie, Statistical Mechanics (1976), ch. 5–6, 8.
 */
export interface PartitionMoments {
  lnQ: number;
  meanU: number;
  varU: number;
}

/** Independent factors of the partition function multiply, so their moments add. */
export function addMoments(parts: readonly PartitionMoments[]): PartitionMoments {
  let lnQ = 0;
  let meanU = 0;
  let varU = 0;
  for (const p of parts) {
    lnQ += p.lnQ;
    meanU += p.meanU;
    varU += p.varU;
  }
  return { lnQ, meanU, varU };
}

/**
 * Already-combined contributions to the dimensionless functions: s → S/R, hmh0 → (H − H0)/(R T),
 * cp → Cp/R. A mixture of independently populated species (e.g. frozen ortho/para hydrogen, see
 * spin-mixture.ts) has no single partition function, so its share cannot be a `PartitionMoments`; it is
 * a mole-fraction-weighted sum of these functions instead. Contributions of independent parts add.
 */
export interface ThermoContribution {
  s: number;
  hmh0: number;
  cp: number;
}

/** The functions a partition-function factor contributes: S/R = lnQ + meanU, (H − H0)/RT = meanU, Cp/R = varU. */
export function contributionOf(m: PartitionMoments): ThermoContribution {
  return { s: m.lnQ + m.meanU, hmh0: m.meanU, cp: m.varU };
}

export function addContributions(parts: readonly ThermoContribution[]): ThermoContribution {
  let s = 0;
  let hmh0 = 0;
  let cp = 0;
  for (const p of parts) {
    s += p.s;
    hmh0 += p.hmh0;
    cp += p.cp;
  }
  return { s, hmh0, cp };
}

/** Thrown when a level ladder does not terminate within its bound, or a level list is unusable. */
export class LevelSumError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'LevelSumError';
  }
}

/** Thrown for a temperature outside (0, ∞) or not finite. */
export class TemperatureError extends Error {
  constructor(readonly temperature: number) {
    super(`temperature must be a finite number > 0 K, got ${temperature}`);
    this.name = 'TemperatureError';
  }
}

export function assertTemperature(T: number): void {
  if (!(Number.isFinite(T) && T > 0)) throw new TemperatureError(T);
}
