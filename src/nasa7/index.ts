/** Public surface of the NASA-7 fit, checks and 80-column layout. */
export * from './types.js';
export { FitError, Nasa7FormatError } from './errors.js';
export { evaluateNasa7, evaluateRange, cpDerivative, cpSecondDerivative, rangeAt, type Nasa7Values } from './evaluate.js';
export { normaliseFitOptions, DEFAULT_FIT_OPTIONS, type PartialFitOptions } from './options.js';
export { fitNasa7 } from './fit.js';
export { computeMetrics, continuityResiduals } from './metrics.js';
export { assessFit, DEFAULT_FIT_TOLERANCES, type FitTolerances, type FitViolation, type FitViolationQuantity } from './quality.js';
export { formatNasa7File, formatNasa7Record, formatE15 } from './format.js';
export { parseNasa7File, parseFortranNumber, type Nasa7ParseError, type Nasa7ParseResult } from './parse.js';
export { roundForRecord, roundToE15 } from './round.js';
