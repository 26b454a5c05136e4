/** Argument and usage errors: the `qforge:` prefix on stderr and, with --json, a JSON error object on stdout (schemas/error.schema.json). */
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import schema from '../../../schemas/error.schema.json' with { type: 'json' };
import { REPO, runCli } from '../helpers.js';

const validate = new Ajv2020({ strict: false }).compile(schema);

describe('command-line errors', () => {
  it.each([
    [['build', '--fast'], 'unknown-option', 2],
    [['build', '--jobs', '0'], 'invalid-argument', 2],
    [['check', 'no-such-folder'], 'usage', 2],
    [['diff', 'only-one'], 'missing-argument', 2],
  ] as const)('%j → %s', async (argv, code, exit) => {
    const plain = await runCli([...argv], REPO);
    expect(plain.code).toBe(exit);
    expect(plain.stderr).toMatch(/^qforge: error: /m);
    expect(plain.stdout).toBe('');
    const json = await runCli([...argv, '--json'], REPO);
    expect(json.code).toBe(exit);
    const obj = JSON.parse(json.stdout);
    expect(validate(obj), JSON.stringify(validate.errors)).toBe(true);
    expect(obj.error.code).toBe(code);
  });
});
