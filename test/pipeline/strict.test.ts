/**
 * Warnings can fail a build: --strict and `strict: true`, acceptances in writing (accepted_warnings on a
 * species or in the settings), stale acceptances; and the demo database builds with no warning at all.
 * Species data: H2O of test/fixtures/db (from memory, see there) edited by hand into a warning.
 */
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { createWarningPolicy, STALE_ACCEPTANCE_CODE } from '../../pipeline/core/strict.js';
import type { Diagnostic } from '../../pipeline/core/diagnostics.js';
import { h2oInput } from '../support/h2o-input.js';
import { REPO, runCli, tempWorkspace } from './helpers.js';

/** H2O with one mode missing: the mode-count warning. */
const FEW_MODES = h2oInput({ 8: 'vibrations: [3657.05, 1594.75]' });

const warning = (code: string, species = 'A'): Diagnostic => ({ severity: 'warning', code, file: 'a.yaml', path: '', message: 'm', species });

describe('warning policy (pure)', () => {
  it('accepts by code, hardens the rest in strict mode, reports stale acceptances', () => {
    const p = createWarningPolicy({ strict: true, accepted: [{ code: 'x', reason: 'a reason of some length' }, { code: 'never', reason: 'a reason of some length' }] });
    const out = p.applySpecies([warning('x'), warning('y')], { raw: { accepted_warnings: [{ code: 'z', reason: 'a reason of some length' }] }, file: 'a.yaml', name: 'A', locate: () => ({ line: 9, column: 3 }) });
    expect(out.map((d) => [d.code, d.severity])).toEqual([
      ['y', 'error'],
      [STALE_ACCEPTANCE_CODE, 'error'],
    ]);
    expect(out[1]!.line).toBe(9);
    expect(p.staleSettingsEntries().map((d) => d.message)).toEqual(["warning made an error by strict mode: accepted warning 'never' no longer occurs; remove the entry"]);
  });
  it('without strict leaves warnings warnings; errors are never accepted', () => {
    const p = createWarningPolicy({ strict: false, accepted: [{ code: 'e', reason: 'a reason of some length' }] });
    const err: Diagnostic = { ...warning('e'), severity: 'error' };
    expect(p.applyOther([warning('y'), err])).toEqual([warning('y'), err]);
  });
});

describe('--strict, strict: true and accepted_warnings end to end', () => {
  it('a warning fails build --strict and check --strict, leaving the previous outputs', async () => {
    const ws = await tempWorkspace();
    try {
      await writeFile(path.join(ws.db, 'few.yaml'), FEW_MODES);
      expect((await runCli(['check', 'db'], ws.root)).code).toBe(0);
      const c = await runCli(['check', 'db', '--strict'], ws.root);
      expect(c.code).toBe(1);
      expect(c.stderr).toMatch(/db\/few\.yaml:8:13: error: \[XH2O\] vibrations: warning made an error by strict mode: 2 vibrational modes .*\[mode-count\]/);
      const b = await runCli(['build', 'db', '--out', 'out', '--strict'], ws.root);
      expect(b.code).toBe(1);
      expect(b.stderr).toMatch(/build failed \(1 species failed: XH2O;/);
    } finally {
      await ws.cleanup();
    }
  });

  it('strict: true in the settings does the same; an acceptance in the settings lets it pass', async () => {
    const ws = await tempWorkspace();
    try {
      await writeFile(path.join(ws.db, 'few.yaml'), FEW_MODES);
      const settings = path.join(ws.db, 'qforge.yaml');
      const original = await readFile(settings, 'utf8');
      await writeFile(settings, `${original}strict: true\n`);
      expect((await runCli(['build', 'db', '--out', 'out'], ws.root)).code).toBe(1);
      await writeFile(settings, `${original}strict: true\naccepted_warnings:\n  - {code: mode-count, species: XH2O, reason: "invented for a test: the bending overtone is left out on purpose"}\n`);
      const b = await runCli(['build', 'db', '--out', 'out'], ws.root);
      expect(b.code, b.stderr).toBe(0);
      expect(b.stderr).not.toMatch(/warning/);
    } finally {
      await ws.cleanup();
    }
  });

  it('an acceptance on the species itself lets build --strict pass; once the warning is gone it is stale', async () => {
    const ws = await tempWorkspace();
    try {
      const accepted = `${FEW_MODES}accepted_warnings: [{code: mode-count, reason: "invented for a test: one mode left out on purpose"}]\n`;
      await writeFile(path.join(ws.db, 'few.yaml'), accepted);
      const b = await runCli(['build', 'db', '--out', 'out', '--strict'], ws.root);
      expect(b.code, b.stderr).toBe(0);
      await writeFile(path.join(ws.db, 'few.yaml'), accepted.replace('[3657.05, 1594.75]', '[3657.05, 1594.75, 3755.93]'));
      const c = await runCli(['check', 'db'], ws.root);
      expect(c.code).toBe(0);
      expect(c.stderr).toMatch(/db\/few\.yaml:9:21: warning: \[XH2O\] accepted_warnings\[0\]: accepted warning 'mode-count' no longer occurs.*\[stale-accepted-warning\]/);
    } finally {
      await ws.cleanup();
    }
  });
});

describe('the demo database', () => {
  it('builds with no warning at all, also under --strict', async () => {
    const ws = await tempWorkspace();
    try {
      const r = await runCli(['build', path.join(REPO, 'species'), '--out', 'demo-out', '--strict', '--no-cache'], ws.root);
      expect(r.code, r.stderr).toBe(0);
      expect(r.stderr).not.toMatch(/warning/);
      const s = JSON.parse(await readFile(path.join(ws.root, 'demo-out', 'summary.json'), 'utf8'));
      expect(JSON.stringify(s)).not.toMatch(/warning:/);
    } finally {
      await ws.cleanup();
    }
  });
});
