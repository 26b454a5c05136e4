/**
 * How stable the midpoint search is: for each seeded synthetic species (bench/synthetic.ts, our own
 * generator; default settings: minimax, midpoint searched 700–2500 K step 100), the fit is made from the
 * computed samples and again from samples whose Cp/R, H/RT and S/R are each multiplied by 1 + ε·u, u a
 * seeded uniform deviate in [−1, 1]; the table counts the species whose T_mid differs, per ε. A change of
 * the physics at the level of the last digits (another summation order, another exponential) moves the
 * samples by about ε = 1e-15 … 1e-12, so this is how many species such a change would move to another
 * midpoint, and so to visibly different coefficients.
 *
 * Usage: node dist/bench/mid-stability.js [--species 2000] [--seed 1] [--eps 1e-15,1e-13,1e-12,1e-10]
 * (not part of `npm run bench`: one number per ε, for the decision on the search's ties).
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { planSpecies } from '../pipeline/core/plan.js';
import { withDefaults } from '../pipeline/core/settings.js';
import { computeSamples } from '../pipeline/stages/compute.js';
import { fitOptionsFor, fitSpecies } from '../pipeline/stages/fit.js';
import { parseYamlText } from '../pipeline/stages/load.js';
import { validateSpecies } from '../pipeline/stages/validate.js';
import { option } from './common.js';
import { seededRandom, syntheticSpecies } from './synthetic.js';

export interface MidStabilityRow {
  eps: number;
  /** Species fitted both times. */
  species: number;
  /** Those whose T_mid moved, as "name: from → to K". */
  moved: string[];
}

/** The rows of the table for `count` synthetic species of `seed`, one per ε. */
export function midStability(count: number, seed: number, epsilons: readonly number[]): MidStabilityRow[] {
  const settings = withDefaults({});
  const rows: MidStabilityRow[] = epsilons.map((eps) => ({ eps, species: 0, moved: [] }));
  for (let i = 0; i < count; i++) {
    const s = syntheticSpecies(seed, i);
    const species = validateSpecies(parseYamlText(s.yaml, `${s.name}.yaml`).documents[0]!).species;
    if (!species) continue;
    const plan = planSpecies(species, settings);
    const computed = computeSamples(species, plan.physics, plan.sampleTemperatures, plan.zoneTemperatures);
    const options = fitOptionsFor(plan.fitOptions);
    let tMid: number;
    try {
      tMid = fitSpecies(computed, options).polynomial.tMid;
    } catch {
      continue;
    }
    epsilons.forEach((eps, e) => {
      const rnd = seededRandom((seed * 7_919 + i * 104_729 + e) >>> 0);
      const shaken = computed.samples.map((p) => ({
        T: p.T,
        cpR: p.cpR * (1 + eps * (2 * rnd() - 1)),
        hRT: p.hRT * (1 + eps * (2 * rnd() - 1)),
        sR: p.sR * (1 + eps * (2 * rnd() - 1)),
      }));
      let moved: number;
      try {
        moved = fitSpecies({ ...computed, samples: shaken }, options).polynomial.tMid;
      } catch {
        return;
      }
      rows[e]!.species++;
      if (moved !== tMid) rows[e]!.moved.push(`${s.name}: ${tMid} → ${moved} K`);
    });
  }
  return rows;
}


if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  const argv = process.argv.slice(2);
  const count = Number(option(argv, '--species') ?? 2000);
  const seed = Number(option(argv, '--seed') ?? 1);
  const epsilons = (option(argv, '--eps') ?? '1e-15,1e-13,1e-12,1e-10').split(',').map(Number);
  console.log(`midpoint stability, ${count} synthetic species (seed ${seed}): samples × (1 + ε·u), u uniform in [−1, 1]`);
  for (const r of midStability(count, seed, epsilons)) {
    console.log(`ε = ${r.eps.toExponential(0)}: T_mid moved for ${r.moved.length} of ${r.species} species${r.moved.length ? ` (${r.moved.slice(0, 6).join('; ')}${r.moved.length > 6 ? '; …' : ''})` : ''}`);
  }
}
