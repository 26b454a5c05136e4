/**
 * The build report document: one self-contained HTML file (inline CSS and SVG, no network, readable
 * without script) with the overview table ordered worst first, and the species sections. Up to
 * `REPORT_INLINE_LIMIT` species the sections are inline; beyond it each species gets its own page
 * `report/<name>.html` (same style sheet) so report.html stays small for nightly builds of thousands.
 *
 * Deterministic: no dates, species sections in name order, the overview in a total order.
 */
import { CAUTION } from '../stages/emit.js';
import { compareText } from '../core/text.js';
import { escapeHtml, sig } from './html.js';
import type { ReportRow } from './species-section.js';

/** Most species whose sections are written inline into report.html. */
export const REPORT_INLINE_LIMIT = 200;

export interface ReportHeader {
  title: string;
  toolName: string;
  toolVersion: string;
  constantsEdition: string;
  standardPressure: string;
  status: string;
  /** Label of the build compared against, if any. */
  against?: string;
  /** Labels of the reference files, if any. */
  references: string[];
  /** Species that failed before they had a row of their own (invalid documents), as "file#n: message". */
  invalid: string[];
}

const STYLE = `
:root{--ink:#1d232b;--muted:#5d6773;--rule:#d5dae0;--fit:#0b5394;--prev:#b35c00;--ref:#a3123a;--res:#4b2a7b;--ok:#2f6b2f;--bad:#a3123a;--warn:#8a5a00;--paper:#fbfaf7}
*{box-sizing:border-box}
body{margin:0;font:14px/1.45 system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;color:var(--ink);background:var(--paper)}
header,main{max-width:1180px;margin:0 auto;padding:0 18px}
header{padding-top:18px;border-bottom:3px double var(--rule)}
h1{font-size:22px;margin:0 0 4px}
h2{font-size:18px;display:inline;margin:0}
h3{font-size:15px;margin:14px 0 4px}
.caution{border-left:4px solid var(--warn);background:#fff6e0;padding:8px 12px;margin:10px 0;font-size:13px}
.meta{color:var(--muted);font-size:13px;margin:4px 0 10px}
table{border-collapse:collapse;background:#fff}
th,td{border:1px solid var(--rule);padding:3px 6px;text-align:right;vertical-align:top;font-variant-numeric:tabular-nums}
th{background:#eef1f4;text-align:center;font-weight:600}
td.name,td.text{text-align:left}
table.overview{width:100%;font-size:13px}
tr.failed td{background:#fbe9ee}
tr.warned td.name{border-left:4px solid var(--warn)}
.badge{font-size:12px;padding:1px 7px;border-radius:9px;margin-left:8px;vertical-align:middle;color:#fff}
.badge.ok{background:var(--ok)}.badge.failed{background:var(--bad)}
.file{color:var(--muted);font-size:12px;margin-left:10px;font-weight:400}
section.species{background:#fff;border:1px solid var(--rule);border-radius:6px;margin:16px 0;padding:10px 14px}
summary{cursor:pointer;list-style-position:outside}
.residuals{display:flex;flex-wrap:wrap;gap:4px}
dl.facts{display:grid;grid-template-columns:max-content 1fr;gap:2px 12px;font-size:13px;margin:8px 0}
dl.facts dt{color:var(--muted)}dl.facts dd{margin:0}
p.error{color:var(--bad);margin:2px 0}p.warning{color:var(--warn);margin:2px 0}
.filter{margin:10px 0}.filter input{font:inherit;padding:4px 8px;width:18em}
svg.chart{display:block;max-width:100%;height:auto;background:#fff;font-size:11px}
svg .grid{stroke:#e6e9ed;stroke-width:1;fill:none}
svg .axis{stroke:#6b7480;fill:none}
svg .ticks text{fill:#3b434d}svg .ticks.x text{text-anchor:middle}svg .ticks.y text{text-anchor:end}
svg .label{fill:var(--ink);font-size:12px;text-anchor:middle}
svg .s-fit{stroke:var(--fit);stroke-width:2;fill:none}
svg .s-extrapolation{stroke:var(--fit);stroke-width:2;stroke-dasharray:6 4;fill:none}
svg .s-previous{stroke:var(--prev);stroke-width:1.8;stroke-dasharray:9 3 2 3;fill:none}
svg .s-residual{stroke:var(--res);stroke-width:1.4;fill:none}
svg .s-computed{fill:#2a2f36;stroke:#fff;stroke-width:.6}
svg .s-reference{fill:#fff;stroke:var(--ref);stroke-width:1.6}
svg .s-band{fill:var(--fit);fill-opacity:.16;stroke:var(--fit);stroke-opacity:.45;stroke-width:.6;stroke-dasharray:2 2}
svg .s-limit{fill:#e9c46a;fill-opacity:.16;stroke:#9a7b1c;stroke-width:.8;stroke-dasharray:4 3}
svg .marker{stroke:#6b7480;stroke-width:1;stroke-dasharray:1 3;fill:none}
svg .marker-label{fill:var(--muted);font-size:10.5px}
svg .legend text{fill:var(--ink);font-size:11px}
svg .legend-box{fill:#fff;fill-opacity:.88;stroke:var(--rule)}
table.unc td small{color:var(--muted)}
@media print{
 body{background:#fff;font-size:11px}
 .filter,.top,script{display:none}
 section.species{break-inside:avoid-page;border:none;border-top:1px solid #999;border-radius:0}
 svg.chart{break-inside:avoid}
 a{color:inherit;text-decoration:none}
 .caution{background:none}
}
`;

/** Optional: type-to-filter of the overview and the sections; the report reads fully without it. */
const FILTER_SCRIPT = `
(function(){var f=document.getElementById('filter');if(!f)return;f.hidden=false;
var q=f.querySelector('input');q.addEventListener('input',function(){var t=q.value.trim().toLowerCase();
document.querySelectorAll('[data-name]').forEach(function(e){var n=e.getAttribute('data-name').toLowerCase();
e.style.display=!t||n.indexOf(t)>=0?'':'none';});});})();
`;

/** Worst first: failed, then the largest error-to-limit ratio, then most warnings, then by name. */
export function worstFirst(a: ReportRow, b: ReportRow): number {
  const failed = Number(b.status === 'failed') - Number(a.status === 'failed');
  if (failed) return failed;
  const largestChange = (r: ReportRow) => Math.max(r.change?.ratio ?? 0, r.deviation?.ratio ?? 0);
  return (
    (b.worstRatio === a.worstRatio ? 0 : b.worstRatio > a.worstRatio ? 1 : -1) ||
    largestChange(b) - largestChange(a) ||
    b.warnings - a.warnings ||
    compareText(a.name, b.name)
  );
}

const diffCell = (d: ReportRow['change']) =>
  d && d.value === 0 ? 'none' : d ? `${d.quantity} ${sig(d.value, 3)} ${escapeHtml(d.unit)}<br><small>at ${sig(d.T, 5)} K</small>` : '–';

function overviewTable(rows: readonly ReportRow[], href: (r: ReportRow) => string, header: ReportHeader): string {
  const head =
    '<tr><th>species</th><th>status</th><th>ranges [K]</th><th>T_mid [K]</th>' +
    '<th>worst |ΔCp/R|<br><small>at T [K]</small></th><th>worst |ΔH/RT|</th><th>worst |ΔS/R|</th>' +
    '<th>warnings</th><th>cache</th><th>u(S°298)<br><small>J/(mol K)</small></th><th>u(Cp°1000)<br><small>J/(mol K)</small></th>' +
    (header.against !== undefined ? `<th>largest change<br><small>vs ${escapeHtml(header.against)}</small></th>` : '') +
    (header.references.length ? '<th>largest deviation<br><small>vs references</small></th>' : '') +
    '</tr>';
  const body = [...rows]
    .sort(worstFirst)
    .map((r) => {
      const w = (q: 'cp' | 'h' | 's') => (r.worst ? `${sig(r.worst[q].value, 2)}<br><small>${sig(r.worst[q].T, 5)}</small>` : '–');
      const u = (v: number | undefined) => (v === undefined ? '–' : `${sig(v, 2)}${r.noUncertaintyInputs ? '<sup title="no input uncertainties declared">∅</sup>' : ''}`);
      const cls = [r.status === 'failed' ? 'failed' : '', r.warnings ? 'warned' : ''].filter(Boolean).join(' ');
      return (
        `<tr${cls ? ` class="${cls}"` : ''} data-name="${escapeHtml(r.name)}"><td class="name"><a href="${escapeHtml(href(r))}">${escapeHtml(r.name)}</a></td>` +
        `<td class="text">${r.status === 'ok' ? 'ok' : `FAILED (${r.errors})`}</td>` +
        `<td>${r.ranges ? `${sig(r.ranges.low, 5)}–${sig(r.ranges.high, 5)}` : '–'}</td><td>${r.ranges ? sig(r.ranges.mid, 5) : '–'}</td>` +
        `<td>${w('cp')}</td><td>${w('h')}</td><td>${w('s')}</td><td>${r.warnings}</td><td class="text">${r.cacheHit ? 'hit' : 'computed'}</td>` +
        `<td>${u(r.uS298)}</td><td>${u(r.uCp1000)}</td>` +
        (header.against !== undefined ? `<td>${diffCell(r.change)}</td>` : '') +
        (header.references.length ? `<td>${diffCell(r.deviation)}</td>` : '') +
        '</tr>'
      );
    })
    .join('\n');
  return `<table class="overview" id="overview-table">${head}\n${body}</table>`;
}

function documentHtml(title: string, bodyHtml: string, withScript: boolean): string {
  return (
    '<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8">' +
    '<meta name="viewport" content="width=device-width,initial-scale=1">' +
    `<title>${escapeHtml(title)}</title><style>${STYLE}</style></head>\n<body>\n${bodyHtml}\n` +
    (withScript ? `<script>${FILTER_SCRIPT}</script>\n` : '') +
    '</body></html>\n'
  );
}

function headerHtml(h: ReportHeader, count: number): string {
  return (
    `<header><h1>${escapeHtml(h.title)} — build report</h1>` +
    `<p class="meta">${escapeHtml(h.toolName)} ${escapeHtml(h.toolVersion)} · constants ${escapeHtml(h.constantsEdition)} · standard pressure ${escapeHtml(h.standardPressure)} · ${count} species · build status ${escapeHtml(h.status)}` +
    `${h.against ? ` · compared with ${escapeHtml(h.against)}` : ''}${h.references.length ? ` · references: ${h.references.map(escapeHtml).join(', ')}` : ''}</p>` +
    `<p class="caution">${escapeHtml(CAUTION)} Uncertainties shown are linear propagations of the declared input uncertainties only; model errors (e.g. rigid-rotor/harmonic approximations) are not included.</p></header>`
  );
}

export interface ReportFiles {
  /** report.html */
  main: string;
  /** Per-species pages (relative path → content) when there are more species than the inline limit. */
  pages: Map<string, string>;
}

/**
 * Assembles the report from the overview rows and the rendered sections (in any order; written in name
 * order). `pageOf` names the per-species page of a species (used only beyond `inlineLimit`).
 */
export function renderReport(
  header: ReportHeader,
  species: ReadonlyArray<{ row: ReportRow; html: string }>,
  pageOf: (name: string) => string,
  inlineLimit = REPORT_INLINE_LIMIT,
): ReportFiles {
  const sorted = [...species].sort((a, b) => compareText(a.row.name, b.row.name));
  const inline = sorted.length <= inlineLimit;
  const pages = new Map<string, string>();
  const href = (r: ReportRow) => (inline ? `#${r.anchor}` : `${pageOf(r.name)}#${r.anchor}`);
  const withUnc = sorted.filter((s) => s.row.noUncertaintyInputs === true).map((s) => s.row.name);
  const filter = '<p class="filter" id="filter" hidden><label>Filter species: <input type="search" placeholder="type part of a name"></label></p>';
  const invalid = header.invalid.length
    ? `<h3>Documents that failed validation (no section)</h3><ul>${header.invalid.map((x) => `<li class="error">${escapeHtml(x)}</li>`).join('')}</ul>`
    : '';
  const noUnc = withUnc.length
    ? `<p class="meta">Species without declared input uncertainties (their u are reported as zero, marked ∅): ${withUnc.map(escapeHtml).join(', ')}.</p>`
    : '';
  const overview =
    `<h2 id="overview">Overview (worst first)</h2>${filter}` +
    '<p class="meta">Worst errors are |fit − computed| of the dimensionless functions over the fitted samples; rows are ordered by failure, then by the largest error relative to its limit.</p>' +
    `${overviewTable(sorted.map((s) => s.row), href, header)}${noUnc}${invalid}`;
  let sections: string;
  if (inline) {
    sections = sorted.map((s) => s.html).join('');
  } else {
    sections = `<p class="meta">${sorted.length} species: more than ${inlineLimit}, so each species has its own page (linked from the overview).</p>`;
    for (const s of sorted) {
      const page = pageOf(s.row.name);
      const back = s.html.replace('<a href="#overview">back to the overview</a>', `<a href="${'../'.repeat(page.split('/').length - 1)}report.html#overview">back to the overview</a>`);
      pages.set(page, documentHtml(`${s.row.name} — ${header.title}`, `<main>${back}</main>`, false));
    }
  }
  const main = documentHtml(`${header.title} — build report`, `${headerHtml(header, sorted.length)}<main>${overview}${sections}</main>`, true);
  return { main, pages };
}
