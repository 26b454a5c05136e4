/**
 * Golden file of the 80-column writer: the fixed, hand-written records of test/fixtures/nasa7/golden-records.ts
 * must produce test/fixtures/nasa7/golden.txt byte for byte (source of the layout: the published record of
 * Gordon & McBride 1971, NASA SP-273;
 * McBride, Gordon & Reno 1993, NASA TM-4513). To update after a deliberate layout change:
 *   QFORGE_UPDATE_GOLDEN=1 npx vitest run test/src/nasa7/golden.test.ts   (then review the diff)
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expect, it } from 'vitest';
import { formatNasa7File } from '../../../src/nasa7/format.js';
import { parseNasa7File } from '../../../src/nasa7/parse.js';
import { GOLDEN_HEADER, GOLDEN_RECORDS } from '../../fixtures/nasa7/golden-records.js';

const goldenPath = fileURLToPath(new URL('../../fixtures/nasa7/golden.txt', import.meta.url));

it('writer output equals the golden file byte for byte', () => {
  const text = formatNasa7File(GOLDEN_RECORDS, GOLDEN_HEADER);
  if (process.env.QFORGE_UPDATE_GOLDEN === '1') writeFileSync(goldenPath, text);
  expect(text).toBe(readFileSync(goldenPath, 'utf8'));
});

it('the golden file reads back into the same records', () => {
  const parsed = parseNasa7File(readFileSync(goldenPath, 'utf8'), 'golden.txt');
  expect(parsed.errors).toEqual([]);
  expect(parsed.header).toEqual(GOLDEN_HEADER);
  expect(parsed.records.map((r) => [r.name, r.identifier, r.elements, r.phase])).toEqual(
    GOLDEN_RECORDS.map((r) => [r.name, r.identifier, r.elements, r.phase]),
  );
  parsed.records.forEach((r, i) => {
    const want = GOLDEN_RECORDS[i]!.polynomial;
    for (const set of ['low', 'high'] as const) {
      r.polynomial[set].forEach((v, k) => {
        const w = want[set][k]!;
        // Terms that round below 1e-99 are written as zero (format.ts); everything else to E15.8 precision.
        if (v === 0) expect(Math.abs(w)).toBeLessThan(1e-99);
        else expect(Math.abs(v - w)).toBeLessThanOrEqual(5e-9 * Math.abs(w));
      });
    }
  });
});
