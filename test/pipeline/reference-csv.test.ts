/**
 * Reference CSV tables for `qforge compare`: every header must be recognised (never a silently dropped
 * column), units are never guessed, and messages give the line of the file. The N2 values are NIST-JANAF
 * 4th ed. table N-023 (Chase 1998), as in test/fixtures/db/reference/janaf-4th-ed.csv; the deliberately
 * wrong values (a Cp off by 70) are invented for the tests.
 */
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseReferenceCsv } from '../../pipeline/commands/compare.js';
import { runCli, sharedBuiltWorkspace } from './helpers.js';

const workspace = sharedBuiltWorkspace();

// NIST-JANAF 4th ed., N-023: S(1000 K) = 228.170 J/(mol K), Cp(1000 K) = 32.697 J/(mol K).
const N2_S_1000 = '228.170';

async function refuse(text: string): Promise<string> {
  try {
    await parseReferenceCsv(text, 'N2.csv');
  } catch (e) {
    return (e as Error).message;
  }
  throw new Error('expected the table to be refused');
}

describe('reference CSV headers: every column recognised or the file refused', () => {
  it("refuses 'Cp (J/mol/K)' instead of ignoring it (compare used to say ok with a Cp off by 70)", async () => {
    const file = path.join(workspace().root, 'N2.csv');
    // Invented wrong Cp (102.7 instead of 32.697) in a column whose header the reader does not accept.
    await writeFile(file, `T [K],Cp (J/mol/K),S [J/(mol K)]\n1000,102.697,${N2_S_1000}\n`);
    const r = await runCli(['compare', 'out', '--reference', 'N2.csv', '--tolerance', 'cp=0.25,s=0.05'], workspace().root);
    expect(r.code).toBe(1);
    expect(r.stderr).not.toMatch(/compare ok/);
    expect(r.stderr).toMatch(/N2\.csv:1: column 2: header 'Cp \(J\/mol\/K\)' has no unit in square brackets \(a unit in parentheses is not read\); units are never guessed: write e\.g\. 'Cp \[J\/\(mol K\)\]'/);
  });

  it.each([
    ['unknown quantity', 'T [K],Cv [J/(mol K)]\n1000,20\n', /N2\.csv:1: column 2: header 'Cv \[J\/\(mol K\)\]' is not recognised; accepted headers: 'T \[K\]'; 'Cp \[unit\]'.*'H-H298 \[unit\]'.*optional 'species'/],
    ['wrong case', 'T [K],cp [J/(mol K)]\n1000,20\n', /column 2: header 'cp \[J\/\(mol K\)\]' is not recognised \(names are case-sensitive and units go in square brackets\)/],
    ['unit-less Cp', 'T [K],Cp\n1000,29\n', /N2\.csv:1: column 2: header 'Cp' has no unit; units are never guessed/],
    ['unknown unit', 'T [K],Cp [J/kg/K]\n1000,29\n', /column 2: header 'Cp \[J\/kg\/K\]': unknown unit 'J\/kg\/K'; expected one of J\/\(mol K\)/],
    ['T not in K', 'T [C],Cp [J/(mol K)]\n1000,29\n', /column 1: header 'T \[C\]': temperatures must be in K/],
    ['empty header cell (trailing comma)', 'T [K],Cp [J/(mol K)],\n1000,29,\n', /column 3: empty header; every column needs one/],
    ['a note column', 'T [K],Cp [J/(mol K)],comment\n1000,29,x\n', /column 3: header 'comment' is not recognised/],
    ['the same quantity twice', 'T [K],Cp [J/(mol K)],Cp [cal/(mol K)]\n1000,29,7\n', /column 3: header 'Cp \[cal\/\(mol K\)\]' repeats column 2/],
    ['no property column', 'T [K],species\n1000,N2\n', /N2\.csv:1: no property column \(Cp, S or H-H298 with a unit\) in the header, so nothing can be compared/],
    ['no T column', 'Cp [J/(mol K)]\n29\n', /N2\.csv:1: no 'T \[K\]' column/],
  ])('%s', async (_what, text, message) => {
    expect(await refuse(text)).toMatch(message);
  });

  it('names the header line when comment lines come first, and lists every bad header at once', async () => {
    const m = await refuse('# NIST-JANAF 4th ed., N-023\n#\n\nT,Cp (J/mol/K)\n1000,32.697\n');
    expect(m.split('\n')).toEqual([
      expect.stringMatching(/^N2\.csv:4: column 1: header 'T' has no unit/),
      expect.stringMatching(/^N2\.csv:4: column 2: header 'Cp \(J\/mol\/K\)' has no unit in square brackets/),
    ]);
  });

  it('accepts the documented headers, including species/name and the H-H(298.15) spellings', async () => {
    const t = await parseReferenceCsv(`name,T [K],Cp [J/(mol K)],S [cal/(mol K)],H-H(298.15) [kJ/mol]\nN2,1000,32.697,,21.463\n`, 'x.csv');
    expect(t.species.get('N2')).toEqual([{ T: 1000, cp: 32.697, h: 21.463 }]);
  });
});

describe('reference CSV rows: file line numbers', () => {
  it('gives the FILE line (5), not the data row, when comment lines come first', async () => {
    // Line 1-2 comments, 3 header, 4 good row, 5 bad value, 6 blank, 7 comment, 8 bad T.
    const text = `# NIST-JANAF 4th ed., N-023\n# (1 bar)\nT [K],S [J/(mol K)]\n1000,${N2_S_1000}\n2000,25x\n\n# more\nabc,1\n`;
    const m = await refuse(text);
    expect(m.split('\n')).toEqual([
      "N2.csv:5: S [J/(mol K)] = '25x' is not a number",
      "N2.csv:8: T = 'abc' is not a temperature in K",
    ]);
  });

  it('does not take hexadecimal or blank cells for numbers', async () => {
    expect(await refuse('T [K],S [J/(mol K)]\n0x10,1\n')).toMatch(/N2\.csv:2: T = '0x10' is not a temperature/);
    const t = await parseReferenceCsv('T [K],S [J/(mol K)],Cp [J/(mol K)]\n1000,,32.697\n,,\n', 'N2.csv');
    expect(t.species.get('N2')).toEqual([{ T: 1000, cp: 32.697 }]);
  });

  it('refuses a row with more cells than the header has columns', async () => {
    expect(await refuse('T [K],S [J/(mol K)]\n1000,228.17,32.697\n')).toMatch(/N2\.csv:2: 3 cells but the header has 2 columns/);
  });
});
