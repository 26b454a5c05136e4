/**
 * The species schema as the single source of truth (generated types must not drift, unit enums must match
 * src/units.ts, every property documented) and the ajv → diagnostic mapping on its own, with small invented
 * schemas shaped like the settings file's (oneOf of `false` or an object, nested anyOf, if/then).
 * No reference values here apart from the unit lists, whose source is src/units.ts (CODATA 2018 factors).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import schema from '../../../schemas/species.schema.json' with { type: 'json' };
import { formatDiagnostic } from '../../../pipeline/core/diagnostics.js';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { checkAgainstSchema, createSchemaValidator, formatFieldPath, nearestKey } from '../../../pipeline/stages/schema-check.js';
import { ENERGY_UNITS_TO_CM1, ENTHALPY_UNITS_TO_J_PER_MOL, INERTIA_UNITS_TO_KG_M2, ROTATIONAL_UNITS_TO_CM1 } from '../../../src/units.js';
import { OUTPUT_PATH, generateSpeciesInputTypes } from '../../../scripts/generate-types.mjs';
import { OUTPUT_VALIDATORS_PATH, VALIDATORS, generateOutputValidators, generateValidator, readSchema } from '../../../scripts/generate-validators.mjs';
import { OUTPUT_AJV_OPTIONS, OUTPUT_VALIDATOR_TARGETS, outputValidatorSchemas } from '../../../pipeline/core/output-schemas.js';
import { INPUT_AJV_OPTIONS } from '../../../pipeline/stages/schema-check.js';

type Obj = Record<string, unknown>;
const defs = (schema as unknown as { $defs: Record<string, Obj> }).$defs;
const unitsOf = (s: Obj) => ((s.properties as Obj).unit as { enum: string[] }).enum.slice().sort();

describe('species schema', () => {
  it('compiles under ajv strict mode', () => {
    expect(() => createSchemaValidator(schema)).not.toThrow();
  });

  it('generated types match the committed file (run `node scripts/generate-types.mjs` after a schema change)', async () => {
    const generated = await generateSpeciesInputTypes(schema);
    expect(generated).toBe(readFileSync(OUTPUT_PATH, 'utf8'));
  });

  it.each(VALIDATORS.map((v) => [v.schema, v] as const))(
    'the validator compiled ahead of time from %s matches the committed file (run `node scripts/generate-validators.mjs` after a schema change)',
    async (_f, v) => {
      expect(generateValidator(await readSchema(v.schema), v.schema, v.name, INPUT_AJV_OPTIONS)).toBe(readFileSync(v.output, 'utf8'));
    },
  );

  it('the output validators compiled ahead of time match the committed file', async () => {
    const generated = generateOutputValidators(outputValidatorSchemas(await readSchema('settings.schema.json')), OUTPUT_VALIDATOR_TARGETS, OUTPUT_AJV_OPTIONS);
    expect(generated).toBe(readFileSync(OUTPUT_VALIDATORS_PATH, 'utf8'));
  });

  it('lists exactly the units src/units.ts converts', () => {
    const energy = Object.keys(ENERGY_UNITS_TO_CM1).sort();
    for (const d of ['energy', 'nonNegativeEnergy', 'positiveEnergy']) expect(unitsOf(defs[d]!)).toEqual(energy);
    const rot = Object.keys(ROTATIONAL_UNITS_TO_CM1).sort();
    for (const d of ['rotationalConstant', 'rotationalTerm', 'nonNegativeRotationalTerm']) expect(unitsOf(defs[d]!)).toEqual(rot);
    expect(unitsOf(defs.momentOfInertia!)).toEqual(Object.keys(INERTIA_UNITS_TO_KG_M2).sort());
    const h = (schema as unknown as { properties: Record<string, Obj> }).properties.enthalpy_of_formation!;
    expect(unitsOf(h)).toEqual(Object.keys(ENTHALPY_UNITS_TO_J_PER_MOL).sort());
  });

  it('documents every property and forbids unknown keys in every object', () => {
    const missing: string[] = [];
    const open: string[] = [];
    const visit = (s: unknown, where: string) => {
      if (!s || typeof s !== 'object') return;
      const o = s as Obj;
      const types = Array.isArray(o.type) ? o.type : [o.type];
      if (o.properties) {
        if (types.includes('object') && o.additionalProperties !== false) open.push(where);
        for (const [k, v] of Object.entries(o.properties as Obj)) {
          if (v !== false && typeof (v as Obj).description !== 'string') missing.push(`${where}.${k}`);
          visit(v, `${where}.${k}`);
        }
      }
      for (const key of ['items', 'additionalProperties', 'then']) visit(o[key], `${where}/${key}`);
      if (Array.isArray(o.allOf)) o.allOf.forEach((x, i) => visit(x, `${where}/allOf/${i}`));
    };
    visit(schema, '#');
    for (const [k, v] of Object.entries(defs)) visit(v, `$defs.${k}`);
    expect(missing).toEqual([]);
    expect(open).toEqual([]);
  });
});

const SETTINGS_LIKE = {
  $schema: 'https://json-schema.org/draft/2020-12/schema',
  type: 'object',
  additionalProperties: false,
  properties: {
    title: { type: 'string', description: 'x' },
    mode: { enum: ['fast', 'careful'], description: 'x' },
    optimise: {
      description: 'x',
      oneOf: [
        { const: false },
        {
          title: '{min, max, step} in K',
          type: 'object',
          additionalProperties: false,
          required: ['min', 'max'],
          properties: { min: { type: 'number' }, max: { type: 'number' }, step: { type: 'number', exclusiveMinimum: 0 } },
        },
      ],
    },
    tolerance: {
      description: 'x',
      anyOf: [{ type: 'number', minimum: 0 }, { type: 'string', pattern: '^[0-9.]+%$', title: 'a percentage like "1%"' }],
    },
    kind: { enum: ['a', 'b'], description: 'x' },
    extra: { type: 'number', description: 'x' },
  },
  allOf: [{ if: { properties: { kind: { const: 'a' } }, required: ['kind'] }, then: { title: "kind 'a'", required: ['extra'] } }],
};

function check(yaml: string) {
  const doc = parseYamlText(yaml, 'qforge.yaml', { split: 'single' }).documents[0]!;
  return checkAgainstSchema(createSchemaValidator(SETTINGS_LIKE), doc);
}

describe('checkAgainstSchema', () => {
  it('returns nothing for a conforming document', () => {
    expect(check('title: t\noptimise: false\ntolerance: 2%\n')).toEqual([]);
  });

  it('reports every error at once, each located', () => {
    const ds = check('title: 5\nmode: quick\nmodes: fast\n');
    expect(ds.map((d) => [d.path, d.line, d.column])).toEqual([
      ['title', 1, 8],
      ['mode', 2, 7],
      ['modes', 3, 1],
    ]);
    expect(formatDiagnostic(ds[1]!)).toBe("qforge.yaml:2:7: error: mode: not an accepted value (got \"quick\"; expected one of fast, careful) [value-not-accepted]");
    expect(ds[2]!.message).toBe("unknown key 'modes' (did you mean 'mode'?)");
    expect(ds[2]!.expected).toBe('one of title, mode, optimise, tolerance, kind, extra');
  });

  it('collapses a oneOf whose value fits no branch into one message built from the branches', () => {
    const ds = check('optimise: true\n');
    expect(ds).toHaveLength(1);
    expect(ds[0]).toMatchObject({ path: 'optimise', line: 1, column: 11, message: 'not an accepted form', value: true });
    expect(ds[0]!.expected).toBe('false; or {min, max, step} in K');
  });

  it('reports only the errors of the branch whose type fits', () => {
    const ds = check('optimise: {min: 200, step: -1, stp: 1}\n');
    expect(ds.map((d) => d.path).sort()).toEqual(['optimise.max', 'optimise.step', 'optimise.stp']);
    expect(ds.find((d) => d.path === 'optimise.stp')!.message).toContain("did you mean 'step'");
    expect(ds.every((d) => !/must match|passingSchemas|const/.test(d.message))).toBe(true);
  });

  it('picks the anyOf branch by type: a number out of range, a text of the wrong form', () => {
    const a = check('tolerance: -1\n');
    expect(a).toHaveLength(1);
    expect(a[0]).toMatchObject({ path: 'tolerance', message: 'must not be negative', value: -1, expected: 'a value >= 0' });
    const b = check('tolerance: lots\n');
    expect(b).toHaveLength(1);
    expect(b[0]).toMatchObject({ path: 'tolerance', message: 'wrong form', expected: 'a percentage like "1%"' });
    const c = check('tolerance: [1]\n');
    expect(c).toHaveLength(1);
    expect(c[0]!.expected).toBe('a number; or a percentage like "1%"');
  });

  it('drops the "if" bookkeeping and names the condition of a then-branch', () => {
    const ds = check('kind: a\n');
    expect(ds).toHaveLength(1);
    expect(ds[0]!.message).toBe("missing required field 'extra' (required for kind 'a')");
    expect(ds[0]!.expected).toBe('a number');
  });
});

describe('helpers', () => {
  it('formats field paths', () => {
    expect(formatFieldPath(['vibrations', 1, 'wavenumber'])).toBe('vibrations[1].wavenumber');
    expect(formatFieldPath(['composition', 'C-13'])).toBe('composition["C-13"]');
    expect(formatFieldPath([])).toBe('');
  });

  it('suggests near keys and nothing for far ones', () => {
    const keys = ['vibrations', 'rotational_constants', 'symmetry_number', 'electronic_levels'];
    expect(nearestKey('vibration', keys)).toBe('vibrations');
    expect(nearestKey('rotational_constant', keys)).toBe('rotational_constants');
    expect(nearestKey('symetry_number', keys)).toBe('symmetry_number');
    expect(nearestKey('Electronic_Levels', keys)).toBe('electronic_levels');
    expect(nearestKey('colour', keys)).toBeUndefined();
  });
});
