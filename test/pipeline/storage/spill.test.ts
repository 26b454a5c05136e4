/**
 * The build's spill file (pipeline/storage/spill.ts): values come back exactly as stored (structured clone,
 * doubles bit for bit), in any order, from concurrent puts; a range past the end is refused; closing removes
 * the file. Holds no reference values: the stored values are written by hand or generated here.
 */
import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { serialize } from 'node:v8';
import { SpillFile } from '../../../pipeline/storage/spill.js';

describe('SpillFile', () => {
  it('round-trips values bit for bit, concurrently and out of order, and raw bytes as given', async () => {
    const spill = await SpillFile.open();
    try {
      const values = Array.from({ length: 200 }, (_, i) => ({
        i,
        doubles: Float64Array.from([i / 7, -0, Number.MIN_VALUE * i, Math.PI * 1e300]),
        text: `species ${i} ${'é'.repeat(i % 5)}`,
        nested: { list: Array.from({ length: i % 13 }, (_, k) => k * 0.1) },
      }));
      const refs = await Promise.all(values.map((v) => spill.put(v)));
      for (const i of [199, 0, 57, 3, 198]) {
        const back = await spill.get<(typeof values)[number]>(refs[i]!);
        expect(back).toEqual(values[i]);
        expect(Object.is(back.doubles[1], -0)).toBe(true);
        const bits = (a: Float64Array) => Buffer.from(a.buffer, a.byteOffset, a.byteLength);
        expect(bits(back.doubles).equals(bits(values[i]!.doubles))).toBe(true);
      }
      const raw = serialize({ big: 'x'.repeat(300_000) });
      const ref = await spill.putBytes(raw);
      expect((await spill.getBytes(ref)).equals(raw)).toBe(true);
      const { ref: appended, written } = spill.appendBytes(Buffer.from('tail'));
      await written;
      expect((await spill.getBytes(appended)).toString()).toBe('tail');
      await expect(spill.getBytes({ offset: appended.offset, length: 10 })).rejects.toThrow(/spill file: read 4 of 10 bytes/);
    } finally {
      await spill.close();
      await spill.close();
    }
  });

  it('close removes the file', async () => {
    const spill = await SpillFile.open();
    const dir = (spill as unknown as { dir: string }).dir;
    expect(existsSync(dir)).toBe(true);
    await spill.close();
    expect(existsSync(dir)).toBe(false);
  });
});
