/**
 * `qforge table FILE`: one species' standard properties straight from its partition functions (no fit);
 * for a build folder or an 80-column file, the fitted polynomial instead (see table-fitted.ts).
 * CSV header (exact): T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol],H [kJ/mol],G [kJ/mol]
 */
import { stat } from 'node:fs/promises';
import { STANDARD_PRESSURE_ATM, STANDARD_PRESSURE_BAR } from '../../src/constants.js';
import type { StandardProperties } from '../../src/model.js';
import type { CliIo } from './io.js';
import { formatDiagnostic, hasErrors } from '../core/diagnostics.js';
import { computeTable } from '../stages/compute.js';
import { loadYamlFile } from '../stages/load.js';
import { validateSpecies } from '../stages/validate.js';
import { fittedTableCommand } from './table-fitted.js';
import { renderTableCsv, renderTableText, tableDigits, tableTemperatures } from './table-format.js';

export {
  DEFAULT_TABLE_DIGITS,
  DEFAULT_TABLE_TEMPERATURES,
  formatTableRows,
  MAX_TABLE_DIGITS,
  MAX_TABLE_ROWS,
  renderTableCsv,
  renderTableText,
  TABLE_CSV_HEADER,
  TableArgumentError,
  tableDigits,
  tableTemperatures,
} from './table-format.js';
export type { TableRow } from './table-format.js';

/** A folder (a build) or a file that is not YAML (80-column records, thermo.json); false when absent. */
async function isPolynomialSource(file: string): Promise<boolean> {
  try {
    return (await stat(file)).isDirectory() || !/\.ya?ml$/i.test(file);
  } catch {
    return false;
  }
}

export async function tableCommand(
  io: CliIo,
  file: string,
  fileLabel: string,
  o: { name?: string; at?: string; range?: string; format: 'text' | 'csv'; pressure: 'bar' | 'atm'; digits?: string },
): Promise<number> {
  let temperatures: number[];
  let digits: number;
  try {
    digits = tableDigits(o.digits);
    // A build folder or a polynomial file (anything but YAML): evaluate the fitted polynomial instead.
    if (await isPolynomialSource(file)) return await fittedTableCommand(io, file, fileLabel, { ...o, digits });
    temperatures = tableTemperatures(o.at, o.range);
  } catch (e) {
    io.stderr.write(`qforge: error: ${(e as Error).message}\n`);
    return 2;
  }
  // A FILE that is not there is a bad path argument: usage, exit 2, like diff and compare.
  try {
    await stat(file);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || code === 'ENOTDIR') {
      io.stderr.write(`qforge: error: ${fileLabel}: no such file\n`);
      return 2;
    }
    // Other problems (permissions, …) are reported by the loader with the OS reason.
  }
  const loaded = await loadYamlFile(file, fileLabel);
  const diagnostics = [...loaded.diagnostics];
  if (hasErrors(diagnostics)) {
    for (const d of diagnostics) io.stderr.write(`${formatDiagnostic(d)}\n`);
    return 1;
  }
  const names = loaded.documents.map((d) => (d.value && typeof d.value === 'object' ? (d.value as { name?: unknown }).name : undefined));
  let doc = loaded.documents[0];
  if (o.name !== undefined) {
    doc = loaded.documents.find((_, i) => names[i] === o.name);
    if (!doc) {
      // A usage error like a missing --name: the command line names something the file does not hold.
      io.stderr.write(`qforge: error: no species named '${o.name}' in ${fileLabel} (it holds: ${names.map(String).join(', ') || 'none'})\n`);
      return 2;
    }
  } else if (loaded.documents.length > 1) {
    io.stderr.write(`qforge: error: ${fileLabel} holds ${loaded.documents.length} species (${names.map(String).join(', ')}); choose one with --name\n`);
    return 2;
  }
  if (!doc) {
    io.stderr.write(`qforge: error: ${fileLabel} holds no species\n`);
    return 1;
  }
  const v = validateSpecies(doc);
  for (const d of v.diagnostics) io.stderr.write(`${formatDiagnostic(d)}\n`);
  if (!v.species || hasErrors(v.diagnostics)) return 1;
  const pressure = o.pressure === 'atm' ? STANDARD_PRESSURE_ATM : STANDARD_PRESSURE_BAR;
  let rows: StandardProperties[];
  try {
    rows = computeTable(v.species, { standardPressure: pressure }, temperatures);
  } catch (e) {
    io.stderr.write(`qforge: error: ${fileLabel}: [${v.species.name}] computing the properties failed: ${(e as Error).message}\n`);
    return 1;
  }
  const outside = temperatures.filter((T) => T < 200 || T > 6000);
  if (outside.length) {
    io.stderr.write(`qforge: warning: ${outside.length} temperature(s) outside 200-6000 K, where the models are meant to be used\n`);
  }
  io.stdout.write(o.format === 'csv' ? renderTableCsv(rows, digits) : renderTableText(v.species.name, o.pressure === 'atm' ? '1 atm' : '1 bar', rows, digits));
  return 0;
}
