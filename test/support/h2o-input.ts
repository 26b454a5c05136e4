/**
 * A nonlinear H2O species file as text, for tests that edit one line of it (constants from memory: NIST CCCBDB,
 * Shimanouchi NSRDS-NBS 39). Lines 1-8; `over` replaces lines by their number, `extra` lines are appended.
 */
export function h2oInput(over: Record<number, string> = {}, ...extra: string[]): string {
  const base = [
    'name: XH2O',
    'composition: {H: 2, O: 1}',
    'enthalpy_of_formation: -241.826',
    'sources: ["H2O constants from memory (NIST CCCBDB, Shimanouchi), edited for a test"]',
    'structure: nonlinear',
    'symmetry_number: 2',
    'rotational_constants: [27.8806, 14.5216, 9.2777]',
    'vibrations: [3657.05, 1594.75, 3755.93]',
  ];
  for (const [k, v] of Object.entries(over)) base[Number(k) - 1] = v;
  return `${[...base, ...extra].join('\n')}\n`;
}
