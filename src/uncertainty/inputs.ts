/**
 * The uncertain inputs of a species: one entry per independent input that declares a standard
 * uncertainty, each with a function that moves that input of a (cloned) species by δ. Propagation,
 * central differences and Monte Carlo all go through these same functions and the pipeline's own
 * evaluator, so the uncertainty is that of the model that produced the numbers.
 *
 * Species with conformers: a vibration or rotational constant of the main structure moves the same entry
 * of every conformer by the same relative amount (treated as fully correlated between conformers).
 */
import type { InputUncertainties, LinearSpecies, NonlinearSpecies, PolyatomicMolecularPart, Species } from '../model.js';
import type { UncertainInput } from './types.js';

export interface PerturbableInput extends UncertainInput {
  /** Moves this input of `species` (mutated in place; pass a clone) by `delta`, in the input's unit. */
  apply(species: Species, delta: number): void;
}

type Polyatomic = LinearSpecies | NonlinearSpecies;

/** The structure and every conformer: the parts a polyatomic input lives in. */
function parts(s: Polyatomic): PolyatomicMolecularPart[] {
  return [s as unknown as PolyatomicMolecularPart, ...((s.conformers ?? []) as PolyatomicMolecularPart[])];
}

/** Moves entry `pick` of every part by the same fraction δ/value of the main structure's value. */
function relativeInAllParts(
  value: number,
  pick: (p: PolyatomicMolecularPart) => { get: () => number; set: (v: number) => void } | undefined,
): (species: Species, delta: number) => void {
  return (species, delta) => {
    for (const p of parts(species as Polyatomic)) {
      const h = pick(p);
      if (h) h.set(h.get() * (1 + delta / value));
    }
  };
}

/** Every input of `species` with a non-zero declared uncertainty, in a fixed order. */
export function uncertainInputs(species: Species): PerturbableInput[] {
  const u: InputUncertainties = species.uncertainties ?? {};
  const out: PerturbableInput[] = [];
  const add = (name: string, value: number, sd: number | undefined, unit: string, apply: PerturbableInput['apply']) => {
    if (sd !== undefined && sd > 0 && Number.isFinite(sd)) out.push({ name, value, u: sd, unit, apply });
  };

  if (species.structure === 'linear' || species.structure === 'nonlinear') {
    // Each loop below runs only when its uncertainty is declared: otherwise `add` would refuse every entry,
    // and the names and closures it was handed (one per vibration) were garbage for every species.
    if (u.vibrations !== undefined || u.vibrationsRelative !== undefined) species.vibrations.forEach((v, i) => {
      const sd = u.vibrations?.[i] ?? (u.vibrationsRelative !== undefined ? u.vibrationsRelative * v.wavenumber : undefined);
      add(`vibration[${i}]`, v.wavenumber, sd, 'cm-1', relativeInAllParts(v.wavenumber, (p) => {
        const x = p.vibrations[i];
        return x ? { get: () => x.wavenumber, set: (w) => (x.wavenumber = w) } : undefined;
      }));
    });
    add('scale_factor', 1, u.scaleFactorRelative, '', (sp, d) => {
      for (const p of parts(sp as Polyatomic)) for (const x of p.vibrations) x.wavenumber *= 1 + d;
    });
    if (u.rotationalConstantsRelative !== undefined) species.rotationalConstants.forEach((b, j) => {
      add(`rotational_constant[${j}]`, b, u.rotationalConstantsRelative !== undefined ? u.rotationalConstantsRelative * b : undefined, 'cm-1',
        relativeInAllParts(b, (p) => (p.rotationalConstants[j] !== undefined ? { get: () => p.rotationalConstants[j]!, set: (w) => (p.rotationalConstants[j] = w) } : undefined)));
    });
    if (u.barriersRelative !== undefined) (species.internalRotors ?? []).forEach((r, k) => {
      add(`barrier[${k}]`, r.barrier, u.barriersRelative !== undefined ? u.barriersRelative * r.barrier : undefined, 'cm-1', (sp, d) => {
        const rotor = (sp as Polyatomic).internalRotors![k]!;
        rotor.barrier = Math.max(0, rotor.barrier + d);
      });
    });
    if (u.anharmonicRelative !== undefined) (species.anharmonicity?.x ?? []).forEach(([i, j, x], k) => {
      add(`x[${i},${j}]`, x, u.anharmonicRelative !== undefined ? u.anharmonicRelative * Math.abs(x) : undefined, 'cm-1', (sp, d) => {
        (sp as Polyatomic).anharmonicity!.x[k]![2] += d;
      });
    });
  }
  if (species.structure === 'diatomic') {
    // States that repeat the same constant (e.g. the two spin-orbit components of one term) share one
    // physical value: they move together, as one input named after all of them.
    const shared = (key: 'we' | 'Be' | 'wexe', rel: number | undefined, label: string) => {
      if (rel === undefined) return; // `add` would refuse every group
      const groups = new Map<number, number[]>();
      species.electronicStates.forEach((st, m) => groups.set(st[key], [...(groups.get(st[key]) ?? []), m]));
      for (const [value, members] of groups) {
        const terms = members.map((m) => species.electronicStates[m]!.term).join(',');
        add(`${label}[${terms}]`, value, rel !== undefined ? rel * Math.abs(value) : undefined, 'cm-1', (sp, d) => {
          for (const m of members) (sp as typeof species).electronicStates[m]![key] += d;
        });
      }
    };
    shared('we', u.vibrationsRelative, 'we');
    shared('Be', u.rotationalConstantsRelative, 'Be');
    shared('wexe', u.anharmonicRelative, 'wexe');
    if (u.electronicEnergies !== undefined) species.electronicStates.forEach((st, m) => {
      if (st.energy > 0) add(`Te[${st.term}]`, st.energy, u.electronicEnergies, 'cm-1', (sp, d) => ((sp as typeof species).electronicStates[m]!.energy += d));
    });
  } else {
    if (u.electronicEnergies !== undefined) species.electronicLevels.forEach((l, k) => {
      if (l.energy > 0) {
        add(`electronic_level[${k}]`, l.energy, u.electronicEnergies, 'cm-1', (sp, d) => {
          const level = (sp as Polyatomic).electronicLevels[k]!;
          level.energy = Math.max(1e-9, level.energy + d);
        });
      }
    });
  }
  add('enthalpy_of_formation', species.enthalpyOfFormation.value, u.enthalpyOfFormation, 'J/mol', (sp, d) => (sp.enthalpyOfFormation.value += d));
  add('molar_mass', species.molarMass, u.molarMassRelative !== undefined ? u.molarMassRelative * species.molarMass : undefined, 'g/mol', (sp, d) => (sp.molarMass += d));
  return out;
}
