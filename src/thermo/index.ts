export {
  createThermoEvaluator,
  DEFAULT_PHYSICS_OPTIONS,
  normalisePhysicsOptions,
  PhysicsOptionsError,
} from './evaluator.js';
export { standardProperties } from './properties.js';
export {
  ELECTRON_CONVENTION,
  ELECTRON_INCREMENT_J_PER_MOL,
  ELEMENT_REFERENCE_STATES,
  elementIncrementPerAtom,
  formationEnthalpyAt298,
  MissingReferenceStateError,
  type ElementReferenceState,
} from './reference-states.js';
export * from '../partition/index.js';
