/**
 * The CLI bounds V8's heap growth (cli.ts HEAP_GROWING_PERCENT) unless the user started node with a growth
 * of their own; the flag values below are written by hand. Whether the bound lowers peak memory is measured
 * by `npm run bench`, not here.
 */
import { describe, expect, it } from 'vitest';
import { heapGrowthGiven } from '../../pipeline/cli.js';

describe('heapGrowthGiven', () => {
  it('sees a growth given on the command line or in NODE_OPTIONS, in either spelling', () => {
    expect(heapGrowthGiven({}, [])).toBe(false);
    expect(heapGrowthGiven({ NODE_OPTIONS: '--max-old-space-size=4096' }, ['--enable-source-maps'])).toBe(false);
    expect(heapGrowthGiven({}, ['--heap-growing-percent=50'])).toBe(true);
    expect(heapGrowthGiven({ NODE_OPTIONS: '--heap_growing_percent=5' }, [])).toBe(true);
  });
});
