/**
 * Frozen ortho/para mixture of a homonuclear diatomic: the even-J and odd-J manifolds as two separately
 * populated species at fixed mole fractions.
 *
 * Why a mixture: the nuclear-spin symmetry of a homonuclear diatomic ties each rotational level to one
 * nuclear-spin manifold (for H2: para, I = 0, even J with weight 1; ortho, I = 1, odd J with weight 3).
 * Collisions alone hardly change the nuclear spin, so without a catalyst the two modifications do not
 * interconvert and "normal" hydrogen keeps its room-temperature composition 1:3 when cooled.
 * Sources: Herzberg, Molecular Spectra and Molecular Structure I: Spectra of Diatomic Molecules (1950),
 * ch. III (influence of nuclear spin; ortho and para modifications); McQuarrie, Statistical Mechanics
 * (1976), §6-5 (ortho- and para-hydrogen; equilibrium and normal hydrogen).
 *
 * Derivation. Manifold i (even or odd J) has nuclear-spin weight g_i, levels k with g_k = g_el·(2J+1)
 * (no σ: the spin weights replace it) and u_k = c2·ε_k/T, every ε_k measured from the SAME zero, the
 * molecule's lowest level (para v = 0, J = 0 for H2), so that H − H0 of both manifolds is on one scale:
 *   q_i = Σ_{k∈i} g_k e^{−u_k},  ⟨u⟩_i = Σ_{k∈i} g_k u_k e^{−u_k}/q_i,  Var_i(u) = ⟨u²⟩_i − ⟨u⟩_i².
 * The frozen gas is an ideal mixture with fixed x_i = g_i/G, G = Σ_i g_i (the high-temperature ratio).
 * Fixed x means no heat of conversion, so the rovibronic shares are the mole-fraction averages
 *   (H − H0)/RT = Σ x_i ⟨u⟩_i,   Cp/R = Σ x_i Var_i(u)
 * (translation and the pV term are added by the caller as for any species). The total entropy, nuclear
 * spin included, is that of the components plus the ideal mixing term:
 *   S_total/R = Σ x_i [ln(g_i q_i) + ⟨u⟩_i] − Σ x_i ln x_i.
 * With x_i = g_i/G the spin and mixing terms combine exactly into a constant:
 *   Σ x_i ln g_i − Σ x_i ln x_i = Σ x_i ln(g_i/x_i) = Σ x_i ln G = ln G,
 * which is the nuclear-spin entropy R ln G that the conventional entropy (NIST-JANAF, CODATA) leaves out,
 * as the equilibrium sum does by normalising its weights by G. Hence the conventional frozen entropy is
 *   S/R = Σ x_i [ln q_i + ⟨u⟩_i].
 * Each ln q_i + ⟨u⟩_i is independent of the energy origin of manifold i, so only H − H0 needs the common
 * zero. The level sums therefore run from each manifold's own lowest level (no underflow at any T) and
 * the height θ_i = c2·(ε_lowest,i − ε_lowest) is added back: ⟨u⟩_i = ⟨u⟩'_i + θ_i/T, Var and S unchanged.
 *
 * High-T limit. The equilibrium sum is Q = Σ x_i q_i with manifold populations P_i = x_i q_i/Q and
 *   ⟨u⟩_eq = Σ P_i ⟨u⟩_i,  Var_eq = Σ P_i Var_i + Σ P_i (⟨u⟩_i − ⟨u⟩_eq)²  (the last term is the heat of
 * conversion). For T ≫ θ_rot the even and odd sums each approach half of the full sum, q_even/q_odd → 1,
 * so P_i → x_i, ⟨u⟩_i → ⟨u⟩_eq, ln Q → Σ x_i ln q_i, and frozen and equilibrium functions coincide
 * (tested: relative difference ~1e-6 at 2000 K for H2). They differ only where B/kT is not small: for H2
 * below ~300 K.
 *
 * Units: dimensionless. Valid for any T > 0.
 */
import type { NuclearSpinMixture } from '../model.js';
import { zeroGridMoments, type TemperatureGrid } from './grid-moments.js';
import { levelSumMoments, type LevelList } from './level-sum.js';
import { addLevelSumGrid } from './level-sum-grid.js';
import type { ThermoContribution } from './moments.js';

/**
 * Used when a species with nuclear spin weights does not choose. 'equilibrium', because NIST-JANAF 4th ed.
 * H2 (H-050) and CODATA are equilibrium hydrogen: at 200 K the equilibrium sum is within 0.006 J/(mol K)
 * of JANAF Cp while the frozen normal mixture is 0.17 lower (measured, test/src/thermo/spin-mixture.test.ts),
 * and above ~300 K the two agree anyway. 'frozen' is the choice for hydrogen kept below room temperature
 * without a conversion catalyst.
 */
export const DEFAULT_NUCLEAR_SPIN_MIXTURE: NuclearSpinMixture = 'equilibrium';

/** One independently populated component of a frozen mixture. */
export interface FrozenMixtureComponent {
  /** Label for summaries, e.g. 'even J'. */
  label: string;
  /** Mole fraction x_i; the fractions of a mixture sum to 1. */
  fraction: number;
  /** Levels of this component, measured from its own lowest level (see createLevelList). */
  levels: LevelList;
  /** Height of this component's lowest level above the common zero, K (c2·Δε). */
  offsetTheta: number;
}

/**
 * Rovibronic contributions of a frozen mixture at T (K): s = Σ x_i (ln q_i + ⟨u⟩_i),
 * hmh0 = Σ x_i (⟨u⟩'_i + θ_i/T), cp = Σ x_i Var_i(u); see the file comment for the derivation and sources.
 */
export function frozenMixtureContribution(components: readonly FrozenMixtureComponent[], T: number): ThermoContribution {
  let s = 0;
  let hmh0 = 0;
  let cp = 0;
  for (const c of components) {
    const m = levelSumMoments(c.levels, T);
    s += c.fraction * (m.lnQ + m.meanU);
    hmh0 += c.fraction * (m.meanU + c.offsetTheta / T);
    cp += c.fraction * m.varU;
  }
  return { s, hmh0, cp };
}

/** Dimensionless functions on a grid: s → S/R, hmh0 → (H − H0)/RT, cp → Cp/R (contributions add). */
export interface GridContribution {
  readonly s: Float64Array;
  readonly hmh0: Float64Array;
  readonly cp: Float64Array;
}

/** Grid form of `frozenMixtureContribution`, added into `into` (each component by level-sum-grid.ts). */
export function addFrozenMixtureGrid(components: readonly FrozenMixtureComponent[], grid: TemperatureGrid, into: GridContribution): void {
  for (const c of components) {
    const m = zeroGridMoments(grid.T.length);
    addLevelSumGrid(c.levels, grid, m);
    for (let j = 0; j < grid.T.length; j++) {
      into.s[j]! += c.fraction * (m.lnQ[j]! + m.meanU[j]!);
      into.hmh0[j]! += c.fraction * (m.meanU[j]! + c.offsetTheta * grid.invT[j]!);
      into.cp[j]! += c.fraction * m.varU[j]!;
    }
  }
}
