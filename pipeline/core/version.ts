/** Tool identity written into every output and mixed into every cache key. */
import pkg from '../../package.json' with { type: 'json' };
import { CONSTANTS_EDITION } from '../../src/constants.js';

export const TOOL_NAME = 'qforge';
export const TOOL_VERSION: string = pkg.version;
export { CONSTANTS_EDITION };
