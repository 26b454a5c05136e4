/**
 * Species given by their geometry (test/fixtures/db-geometry), from the YAML through the validator to the
 * thermodynamic functions, against published tables:
 * - H2O: NIST-JANAF 4th ed. (Chase 1998), table H-064, S°(298.15) = 188.834 J/(mol K) — from memory (the
 *   project's JANAF excerpt has no H2O row);
 * - C2H6: Chao, Wilhoit & Hall, J. Phys. Chem. Ref. Data 2, 427 (1973): S°(298.15) ≈ 229.2, Cp° ≈ 52.5
 *   J/(mol K) — from memory;
 * - CH3OH: Chao, Rodgers, Wilhoit & Zwolinski, J. Phys. Chem. Ref. Data 15, 1369 (1986): S°(298.15) ≈ 239.8,
 *   Cp° ≈ 44.0 J/(mol K) — from memory.
 * Tolerances are the ones the task sets (0.5 in S for H2O; 0.4 in S and 0.6 in Cp with a rotor). The
 * geometries, frequencies and barriers are named in each species file.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { formatDiagnostic } from '../../pipeline/core/diagnostics.js';
import { loadYamlFile } from '../../pipeline/stages/load.js';
import { validateSpecies } from '../../pipeline/stages/validate.js';
import { atomsOf, rotationalConstantOfMoment, torsionOf } from '../../src/geometry/index.js';
import type { NonlinearSpecies } from '../../src/model.js';
import { createThermoEvaluator, standardProperties } from '../../src/thermo/index.js';
import { methanol } from '../fixtures/geometries.js';
import { hinderedRotorHarmonicWavenumber } from '../../src/partition/hindered-rotor.js';

const DB = path.join(path.dirname(fileURLToPath(import.meta.url)), '../fixtures/db-geometry');

async function speciesFrom(file: string): Promise<NonlinearSpecies> {
  const loaded = await loadYamlFile(path.join(DB, file), file);
  expect(loaded.diagnostics).toEqual([]);
  const v = validateSpecies(loaded.documents[0]!);
  expect(v.diagnostics.map(formatDiagnostic)).toEqual([]);
  return v.species as NonlinearSpecies;
}

const at298 = (s: NonlinearSpecies) => standardProperties(createThermoEvaluator(s), 298.15);

/**
 * The same species with its torsion as a harmonic vibration of wavenumber n·√(V0·B) instead of a rotor
 * (RRHO with the harmonic torsion a frequency calculation gives).
 */
function asRigidRotorHarmonic(s: NonlinearSpecies): NonlinearSpecies {
  const { internalRotors, ...rest } = s;
  const torsion = hinderedRotorHarmonicWavenumber(internalRotors![0]!);
  return { ...rest, vibrations: [...s.vibrations, { wavenumber: torsion, degeneracy: 1 }] };
}

describe('H2O from its equilibrium geometry', () => {
  it('gets sigma = 2 and A > B > C from the geometry, and S(298.15) within 0.5 J/(mol K) of NIST-JANAF', async () => {
    const s = await speciesFrom('H2O.yaml');
    expect(s.symmetryNumber).toBe(2);
    // Equilibrium constants of H2O (A_e 27.88, B_e 14.51, C_e 9.55 cm-1 — from memory): the r_e structure gives them.
    expect(s.rotationalConstants.map((x) => Number(x.toFixed(1)))).toEqual([27.4, 14.6, 9.5]);
    const p = at298(s);
    const janaf = 188.834; // NIST-JANAF 4th ed. H-064, from memory
    expect(Math.abs(p.S - janaf)).toBeLessThan(0.5);
  });
});

describe('a torsion from the geometry (Pitzer reduced moment, hindered-rotor levels)', () => {
  const cases = [
    { file: 'C2H6.yaml', name: 'ethane', S: 229.2, Cp: 52.5, sigma: 6, rotorSigma: 3 },
    { file: 'CH3OH.yaml', name: 'methanol', S: 239.8, Cp: 44.0, sigma: 1, rotorSigma: 3 },
  ];
  it.each(cases.map((c) => [c.name, c] as const))('%s: S and Cp at 298.15 K within 0.4 and 0.6 J/(mol K) of the published table', async (_n, c) => {
    const s = await speciesFrom(c.file);
    expect(s.symmetryNumber).toBe(c.sigma);
    expect(s.internalRotors![0]!.symmetryNumber).toBe(c.rotorSigma);
    const summary = createThermoEvaluator(s).summary.contributions.join('\n');
    expect(summary).toContain(`symmetry number ${c.sigma}`);
    expect(summary).toMatch(/reduced moment [0-9.]+ amu\*angstrom\^2 \(Pitzer I\(2,3\); two-body [0-9.]+\)/);
    const p = at298(s);
    expect(Math.abs(p.S - c.S)).toBeLessThan(0.4);
    expect(Math.abs(p.Cp - c.Cp)).toBeLessThan(0.6);
  });
  it.each(cases.map((c) => [c.name, c] as const))('%s: rigid rotor + harmonic with the torsion as its harmonic vibration is about 1.3 J/(mol K) low in S', async (_n, c) => {
    const s = await speciesFrom(c.file);
    const deficit = c.S - at298(asRigidRotorHarmonic(s)).S;
    expect(Math.abs(deficit - 1.3)).toBeLessThan(0.2);
  });
  it('methanol: Pitzer I(2,3) is about 7 % below the two-body approximation, about 0.25 J/(mol K) in S(298.15)', async () => {
    const t = torsionOf(atomsOf(methanol()), 0, 1);
    const ratio = t.twoBodyMoment / t.reducedMoment - 1;
    expect(ratio).toBeGreaterThan(0.05);
    expect(ratio).toBeLessThan(0.09);
    const s = await speciesFrom('CH3OH.yaml');
    const rotor = s.internalRotors![0]!;
    const twoBody = { ...s, internalRotors: [{ ...rotor, rotationalConstant: rotationalConstantOfMoment(t.twoBodyMoment) }] };
    const dS = at298(twoBody).S - at298(s).S;
    expect(dS).toBeGreaterThan(0.15);
    expect(dS).toBeLessThan(0.35);
  });
});
