/**
 * `qforge table BUILD --name N2` / `qforge table nasa7.txt --name N2`: what a kinetics or CFD code will
 * see, i.e. the fitted NASA 7-coefficient polynomial evaluated on a grid, printed in the same columns
 * and units as the partition-function table (TABLE_CSV_HEADER). H is absolute (it includes ΔfH°(298.15),
 * the NASA polynomial convention) and G = H − T·S, as in the computed table.
 *
 * Fitted range: a polynomial is never evaluated outside the [T_low, T_high] recorded with it. An explicit
 * temperature (--at, --range) outside it is refused as a usage error (exit 2) naming the range; the
 * default grid is cut to the range, and the title line states the range.
 */
import type { CliIo } from './io.js';
import { polynomialProperties, readPolynomialSet, ReadBuildUsageError } from '../storage/read-build.js';
import { type TableRow, renderTableCsv, renderTableText, tableTemperatures, TableArgumentError } from './table-format.js';

/** Names listed at most in a "no species named" message (a nightly file may hold thousands). */
const MAX_LISTED_NAMES = 20;

export interface FittedTableOptions {
  name?: string;
  at?: string;
  range?: string;
  format: 'text' | 'csv';
  digits: number;
  /** --pressure: only checked (a polynomial holds the pressure it was fitted at); 'bar' is the default. */
  pressure?: 'bar' | 'atm';
}

export async function fittedTableCommand(io: CliIo, file: string, fileLabel: string, o: FittedTableOptions): Promise<number> {
  const fail = (message: string, code: number) => {
    io.stderr.write(`qforge: error: ${message}\n`);
    return code;
  };
  let set;
  try {
    set = await readPolynomialSet(file, fileLabel);
  } catch (e) {
    return fail((e as Error).message, e instanceof ReadBuildUsageError ? 2 : 1);
  }
  const names = [...set.species.keys()];
  const listed = names.length > MAX_LISTED_NAMES ? `${names.slice(0, MAX_LISTED_NAMES).join(', ')}, … (${names.length} in all)` : names.join(', ') || 'none';
  let entry;
  if (o.name !== undefined) {
    entry = set.species.get(o.name);
    if (!entry) return fail(`no species named '${o.name}' in ${set.origin} (it holds: ${listed})`, 2);
  } else if (names.length > 1) {
    return fail(`${set.origin} holds ${names.length} species (${listed}); choose one with --name`, 2);
  } else {
    entry = set.species.get(names[0]!);
    if (!entry) return fail(`${set.origin} holds no species`, 1);
  }
  const poly = entry.polynomial;
  const explicit = o.at !== undefined || o.range !== undefined;
  let temperatures: number[];
  try {
    temperatures = tableTemperatures(o.at, o.range);
  } catch (e) {
    if (e instanceof TableArgumentError) return fail(e.message, 2);
    throw e;
  }
  const inside = (T: number) => T >= poly.tLow && T <= poly.tHigh;
  const rangeLabel = `${poly.tLow}-${poly.tHigh} K`;
  if (explicit) {
    const outside = temperatures.filter((T) => !inside(T));
    if (outside.length) {
      const shown = outside.slice(0, 5).join(', ') + (outside.length > 5 ? ', …' : '');
      return fail(
        `${entry.name} in ${set.origin} is fitted on ${rangeLabel}; ${outside.length} temperature(s) outside it (${shown} K): a fitted polynomial is not evaluated outside its range`,
        2,
      );
    }
  } else {
    temperatures = temperatures.filter(inside);
    if (!temperatures.includes(poly.tLow)) temperatures.unshift(poly.tLow);
    if (!temperatures.includes(poly.tHigh)) temperatures.push(poly.tHigh);
  }
  const rows: TableRow[] = temperatures.map((T) => {
    const p = polynomialProperties(poly, T);
    return { T, Cp: p.cp, S: p.s, HminusH298: p.hMinusH298, H: p.h, G: p.h - (T * p.s) / 1000 };
  });
  const pressure = set.settings?.standard_pressure;
  // --pressure cannot convert a fitted polynomial: a request for 1 atm that the build does not hold is refused.
  if (o.pressure === 'atm' && pressure !== '1 atm') {
    return fail(`--pressure atm: ${set.origin} holds polynomials for standard pressure ${pressure ?? 'not recorded (80-column file)'}; a fitted polynomial is printed at the pressure it was built for`, 2);
  }
  const title = `${entry.name}: fitted NASA 7-coefficient polynomial from ${set.origin} (${rangeLabel}${pressure ? `, standard pressure ${pressure}` : ''}), as a kinetics code reads it; valid only inside the fitted range`;
  io.stdout.write(o.format === 'csv' ? renderTableCsv(rows, o.digits) : renderTableText(entry.name, '', rows, o.digits, title));
  return 0;
}
