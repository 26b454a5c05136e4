/**
 * The runner's one entry into the report: what to compare with (read once, before the species are
 * rendered), one section per species as it is handed over, and the finished files at the end. Reading goes
 * through storage/ (read-build) and the compare command's CSV parser; writing is the runner's atomic
 * publish, so report.html is listed in the build folder's marker like every other output.
 */
import path from 'node:path';
import { parseReferenceCsv, type ReferenceRow } from '../commands/compare.js';
import { displayPath } from '../core/display-path.js';
import { fitLimitsFor } from '../core/fit-plan.js';
import type { DatabaseSettings } from '../core/settings.js';
import { CONSTANTS_EDITION, TOOL_NAME, TOOL_VERSION } from '../core/version.js';
import { speciesFileStem } from '../stages/emit.js';
import { readInputFile, readPolynomialSet, type PolynomialSet } from '../storage/read-build.js';
import { renderReport, REPORT_INLINE_LIMIT, type ReportFiles, type ReportHeader } from './page.js';
import { renderSpeciesSection, type RenderedSpecies, type ReportSpeciesInput } from './species-section.js';

export interface ReportRequest {
  /** Build folder (or thermo.json / 80-column file) to compare with: `--report-against OLD`. */
  against?: { path: string; label: string };
  /** Species sections inline up to this count (default REPORT_INLINE_LIMIT); beyond, one page each. */
  inlineLimit?: number;
}

/** Collects the report species by species; `finish` renders the overview and returns the files. */
export class ReportWriter {
  private readonly rendered: RenderedSpecies[] = [];
  private constructor(
    private readonly settings: DatabaseSettings,
    private readonly previous: PolynomialSet | undefined,
    private readonly againstLabel: string | undefined,
    private readonly references: Array<{ label: string; species: Map<string, ReferenceRow[]> }>,
    private readonly inlineLimit: number,
  ) {}

  /** Reads the build to compare with and the settings' reference files (a bad one fails the build). */
  static async open(request: ReportRequest, settings: DatabaseSettings, databaseDir: string, displayBase?: string): Promise<ReportWriter> {
    const previous = request.against ? await readPolynomialSet(request.against.path, request.against.label) : undefined;
    const references = [];
    for (const f of settings.references.files) {
      const abs = path.resolve(databaseDir, f);
      const label = displayBase ? displayPath(displayBase, abs) : f;
      if (!/\.csv$/i.test(f)) continue; // 80-column references are for `compare`; the report overlays tables
      const table = await parseReferenceCsv(await readInputFile(abs, label, 'reference'), label);
      references.push({ label: path.basename(f), species: table.species });
    }
    return new ReportWriter(settings, previous, request.against?.label, references, request.inlineLimit ?? REPORT_INLINE_LIMIT);
  }

  /** Renders one species now and keeps only its HTML and its overview row. */
  add(input: Omit<ReportSpeciesInput, 'previous' | 'reference' | 'tolerances' | 'changeScale'> & Partial<Pick<ReportSpeciesInput, 'tolerances'>>): void {
    const prev = this.previous?.species.get(input.name);
    const ref = this.references.find((r) => r.species.has(input.name));
    this.rendered.push(
      renderSpeciesSection({
        ...input,
        // The species' own limits over the settings' (as the fit check used them).
        tolerances: input.tolerances ?? (input.species ? fitLimitsFor(this.settings.tolerances, input.species.fitLimits) : this.settings.tolerances),
        changeScale: this.settings.references.tolerances,
        ...(prev && this.againstLabel !== undefined ? { previous: { label: this.againstLabel, polynomial: prev.polynomial } } : {}),
        ...(ref ? { reference: { label: ref.label, rows: ref.species.get(input.name)! } } : {}),
      }),
    );
  }

  finish(status: string, invalid: string[]): ReportFiles {
    const header: ReportHeader = {
      title: this.settings.title,
      toolName: TOOL_NAME,
      toolVersion: TOOL_VERSION,
      constantsEdition: CONSTANTS_EDITION,
      standardPressure: this.settings.standard_pressure,
      status,
      ...(this.againstLabel !== undefined ? { against: this.againstLabel } : {}),
      references: this.references.map((r) => r.label),
      invalid,
    };
    const pageOf = pageNames(this.rendered.map((r) => r.row.name));
    return renderReport(header, this.rendered, (n) => pageOf.get(n)!, this.inlineLimit);
  }
}

/** `report/<stem>.html`, with the same case-insensitive collision rule as the tables. */
function pageNames(names: readonly string[]): Map<string, string> {
  const taken = new Set<string>();
  const out = new Map<string, string>();
  for (const name of [...names].sort()) {
    let stem = speciesFileStem(name);
    for (let i = 2; taken.has(stem.toLowerCase()); i++) stem = `${speciesFileStem(name)}_${i}`;
    taken.add(stem.toLowerCase());
    out.set(name, `report/${stem}.html`);
  }
  return out;
}
