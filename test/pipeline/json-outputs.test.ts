/**
 * Every JSON qforge writes (thermo.json, summary.json, and the --json stdout of check, build, diff, compare,
 * cache prune and of a failing command) names its format, matches its schema in schemas/ and spells every
 * key in snake_case, except data keys: element symbols of `composition` and the recorded inputs (`input`
 * of thermo.json, `old`/`new` of diff's input and settings changes), which keep the input's own names.
 * Builds of the fixture database test/fixtures/db; the edited wavenumber-like constant is written by hand.
 */
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import cachePruneSchema from '../../schemas/cache-prune.schema.json' with { type: 'json' };
import checkSchema from '../../schemas/check.schema.json' with { type: 'json' };
import compareSchema from '../../schemas/compare.schema.json' with { type: 'json' };
import databaseSchema from '../../schemas/database.schema.json' with { type: 'json' };
import diffSchema from '../../schemas/diff.schema.json' with { type: 'json' };
import errorSchema from '../../schemas/error.schema.json' with { type: 'json' };
import settingsSchema from '../../schemas/settings.schema.json' with { type: 'json' };
import summarySchema from '../../schemas/summary.schema.json' with { type: 'json' };
import { runCli, tempWorkspace } from './helpers.js';

const SNAKE = /^[a-z0-9_]+$/;

/** Paths (a.b[].c) of keys that are not snake_case, skipping data subtrees. */
function nonSnakeKeys(value: unknown): string[] {
  const bad: string[] = [];
  const isData = (p: string) => /\.composition$|\.input$|_changes\[\]\.(old|new)$/.test(p);
  const walk = (v: unknown, p: string): void => {
    if (isData(p)) return;
    if (Array.isArray(v)) v.forEach((x) => walk(x, `${p}[]`));
    else if (v && typeof v === 'object') {
      for (const [k, x] of Object.entries(v)) {
        if (!SNAKE.test(k)) bad.push(`${p}.${k}`);
        walk(x, `${p}.${k}`);
      }
    }
  };
  walk(value, '');
  return [...new Set(bad)];
}

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
const outputs: Array<{ what: string; schema: { $id: string }; json: unknown }> = [];

beforeAll(async () => {
  ws = await tempWorkspace();
  const json = (s: string) => JSON.parse(s) as unknown;
  const cli = async (argv: string[], code = 0) => {
    const r = await runCli(argv, ws.root);
    expect(r.code, `${argv.join(' ')}: ${r.stderr}`).toBe(code);
    return r.stdout;
  };
  const before = await cli(['build', 'db', '--out', 'before', '--json', '--quiet']);
  outputs.push({ what: 'build --json', schema: summarySchema, json: json(before) });
  const file = path.join(ws.db, 'CO.yaml');
  await writeFile(file, (await readFile(file, 'utf8')).replace('we: 2169.81358', 'we: 2171.0'));
  await cli(['build', 'db', '--out', 'out', '--quiet']);
  for (const f of ['thermo.json', 'summary.json']) {
    outputs.push({ what: `out/${f}`, schema: f === 'thermo.json' ? databaseSchema : summarySchema, json: json(await readFile(path.join(ws.out, f), 'utf8')) });
  }
  outputs.push({ what: 'check --json', schema: checkSchema, json: json(await cli(['check', 'db', '--json'])) });
  outputs.push({ what: 'diff --json', schema: diffSchema, json: json(await cli(['diff', 'before', 'out', '--json', '--fail-above', 'cp=1e-6', '--fail-on-removed'], 1)) });
  outputs.push({ what: 'compare --json', schema: compareSchema, json: json(await cli(['compare', 'out', '--database', 'db', '--tolerance', 'cp=0.01', '--json'], 1)) });
  outputs.push({ what: 'cache prune --json', schema: cachePruneSchema, json: json(await cli(['cache', 'prune', 'db', '--json'])) });
  outputs.push({ what: 'error --json', schema: errorSchema, json: json(await cli(['diff', 'nowhere', 'out', '--json'], 2)) });
}, 240_000);
afterAll(async () => {
  await ws?.cleanup();
});

describe('JSON outputs', () => {
  it('each names its format and matches its schema', () => {
    const ajv = new Ajv2020({ allErrors: true, strict: false });
    ajv.addSchema(settingsSchema);
    for (const o of outputs) {
      const validate = ajv.getSchema(o.schema.$id) ?? ajv.compile(o.schema);
      expect(validate(o.json), `${o.what}: ${JSON.stringify(validate.errors)}`).toBe(true);
      expect((o.json as { format: string }).format, o.what).toMatch(/^qforge-[a-z-]+\/\d+$/);
    }
  });

  it('spell every key in snake_case (data keys excepted)', () => {
    for (const o of outputs) expect(nonSnakeKeys(o.json), o.what).toEqual([]);
  });

  it('diff and compare carry structured gate results', () => {
    const diff = outputs.find((o) => o.what === 'diff --json')!.json as { gate: { results: Array<Record<string, unknown>> } };
    expect(diff.gate.results).toContainEqual(expect.objectContaining({ species: 'CO', quantity: 'cp', unit: 'J/(mol K)', limit: 1e-6 }));
    const compare = outputs.find((o) => o.what === 'compare --json')!.json as { gate: { results: Array<Record<string, unknown>> } };
    expect(compare.gate.results.length).toBeGreaterThan(0);
    expect(compare.gate.results[0]).toEqual(expect.objectContaining({ quantity: expect.any(String), t: expect.any(Number), value: expect.any(Number), limit: 0.01 }));
  });
});
