export {
  addContributions,
  addMoments,
  assertTemperature,
  contributionOf,
  LevelSumError,
  TemperatureError,
  type PartitionMoments,
  type ThermoContribution,
} from './moments.js';
export { createLevelList, levelSumMoments, type LevelList } from './level-sum.js';
export { translationalMoments } from './translational.js';
export { electronicLevelList, electronicMoments } from './electronic.js';
export { linearRotorMoments, linearRotorClassicalLimit, linearRotorMulholland } from './rigid-rotor-linear.js';
export { nonlinearRotorMoments } from './rigid-rotor-nonlinear.js';
export { harmonicMoments } from './harmonic.js';
export {
  freeRotorClassicalMoments,
  hinderedRotorBasisLimit,
  hinderedRotorBasisSize,
  hinderedRotorEnergyCeiling,
  hinderedRotorHarmonicWavenumber,
  hinderedRotorLevels,
  hinderedRotorMoments,
  smallestHinderedRotorConstant,
  symmetricTridiagonalEigenvalues,
  HINDERED_ROTOR_CEILING_TEMPERATURE,
  MAX_HINDERED_ROTOR_BASIS,
  type HinderedRotorLevels,
} from './hindered-rotor.js';
export {
  diatomicLevels,
  diatomicMoments,
  diatomicSpinManifolds,
  diatomicTermValue,
  centrifugalConstantOf,
  higherOrderTermsOf,
  rotationalConstantOf,
  vibrationalTerm,
  MAX_ROTATIONAL_LEVELS,
  MAX_TOTAL_LEVELS,
  MAX_VIBRATIONAL_LEVELS,
  type DiatomicLevels,
  type DiatomicModelInput,
  type DiatomicSpinManifolds,
  type DiatomicStateLevels,
} from './diatomic.js';
export { DEFAULT_NUCLEAR_SPIN_MIXTURE, frozenMixtureContribution, type FrozenMixtureComponent } from './spin-mixture.js';
