/**
 * The vibrational factor of a polyatomic (or of one conformer): harmonic oscillators by default; the direct
 * anharmonic level sum (with the level-dependent part of the rotor) when `anharmonicity` is given; the
 * first-order centrifugal factor of the ground-state rotor when only `centrifugalDistortion` is given.
 * Built once per species; the returned function only sums.
 */
import type { PolyatomicMolecularPart } from '../model.js';
import {
  anharmonicMoments,
  buildAnharmonicLevels,
  centrifugalCoefficient,
  centrifugalFactorMoments,
} from '../partition/anharmonic-vibration.js';
import { harmonicMoments } from '../partition/harmonic.js';
import { addMoments, type PartitionMoments } from '../partition/moments.js';

const describeScale = (part: PolyatomicMolecularPart): string =>
  part.vibrationScaleFactor ? `; wavenumbers scaled by ${part.vibrationScaleFactor.value} (${part.vibrationScaleFactor.source})` : '';

/**
 * Moments function of the vibrations (and of what anharmonic coupling moves into them), with the model
 * summary lines appended to `contributions`.
 */
export function vibrationFactor(part: PolyatomicMolecularPart, contributions: string[]): (T: number) => PartitionMoments {
  const vib = part.vibrations;
  const modes = vib.reduce((n, v) => n + v.degeneracy, 0);
  const cd = part.centrifugalDistortion;
  const anharmonicity = part.anharmonicity;
  if (anharmonicity) {
    const model = buildAnharmonicLevels({
      vibrations: vib,
      anharmonicity,
      rotationalConstants: part.rotationalConstants,
      ...(cd ? { centrifugalDistortion: cd } : {}),
      ...(part.dissociationEnergy !== undefined ? { dissociationEnergy: part.dissociationEnergy } : {}),
    });
    const coupling = [
      anharmonicity.alpha ? 'rotational constants per state B_v = B_0 - sum alpha_i v_i (classical rotor ratio per level)' : '',
      cd ? 'first-order classical centrifugal distortion per level' : '',
    ].filter((s) => s !== '');
    contributions.push(
      `anharmonic vibrations, direct level sum (${modes} modes, ${anharmonicity.x.length} x_ij, ${anharmonicity.g.length} g_tt'; ${model.states} states, ${model.levels.theta.length} levels below ${model.cut.toFixed(1)} cm-1 set by the ${model.cutBy}; ${model.turnovers} ladders end where G(v) turns over; v_max ${model.maxQuanta.join('/')}${coupling.length ? `; ${coupling.join('; ')}` : ''}${describeScale(part)})`,
    );
    return (T) => anharmonicMoments(model, T);
  }
  contributions.push(`harmonic oscillators (${modes} modes${describeScale(part)})`);
  if (!cd) return (T) => harmonicMoments(vib, T);
  const a = centrifugalCoefficient(part.rotationalConstants, cd);
  contributions.push(`first-order classical centrifugal distortion of the rigid rotor, factor 1 + aT (a = ${a.toExponential(4)} 1/K)`);
  return (T) => addMoments([harmonicMoments(vib, T), centrifugalFactorMoments(a, T)]);
}
