export * from './types.js';
export { uncertainInputs, type PerturbableInput } from './inputs.js';
export { CENTRAL_DIFFERENCE_STEP, centralDifference, propertiesAt, sensitivities } from './sensitivity.js';
export { harmonicWavenumberDerivatives } from './harmonic.js';
export { LARGEST_CONTRIBUTORS, monteCarlo, propagateUncertainty, type PropagationOptions } from './propagate.js';
export { createNormalSampler } from './prng.js';
