/**
 * The build report: charts are pure SVG strings (axes, labels, legend, one element per series), the
 * overview is worst first, the report is written through the atomic publish (listed in the marker),
 * byte-identical on a rebuild, compared with a previous build, and split into pages beyond the inline limit.
 * Test data: the fixture database (sources named in its files) and hand-written series below.
 */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { decimateEnvelope, renderChart } from '../../../pipeline/report/chart.js';
import { anchorId, escapeHtml } from '../../../pipeline/report/html.js';
import { renderReport, worstFirst } from '../../../pipeline/report/page.js';
import type { ReportRow } from '../../../pipeline/report/species-section.js';
import { runCli, tempWorkspace } from '../helpers.js';

describe('chart', () => {
  it('renders axes with tick labels, axis labels with units, a legend and one path per series', () => {
    const svg = renderChart({
      title: 'test <chart>',
      xLabel: 'T [K]',
      yLabel: 'Cp°/R [–]',
      width: 400,
      height: 240,
      series: [
        { kind: 'line', style: 'fit', label: 'fit', points: [[200, 3.5], [1000, 4], [6000, 4.5]] },
        { kind: 'points', style: 'computed', label: 'computed', points: [[200, 3.5], [1000, 4.01]] },
      ],
      markers: [{ x: 1000, label: 'T_mid' }],
    });
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('<title>test &lt;chart&gt;</title>');
    expect(svg).toContain('>T [K]</text>');
    expect(svg).toContain('>Cp°/R [–]</text>');
    expect(svg).toMatch(/class="s-fit" d="M/);
    expect(svg).toMatch(/class="s-computed" d="M/);
    expect(svg).toContain('>T_mid</text>');
    // tick labels on both axes, e.g. 4.0 on y and 1,000 on x
    expect(svg).toMatch(/<g class="ticks x">(<text[^>]*>[0-9,]+<\/text>){4,}/);
    expect(svg).toMatch(/<g class="ticks y">(<text[^>]*>[0-9.]+<\/text>){3,}/);
    expect(svg).toContain('<g class="legend"');
    expect(svg).not.toMatch(/NaN|undefined/);
  });

  it('keeps the extremes of a dense curve when decimating', () => {
    const pts: Array<[number, number]> = [];
    for (let i = 0; i <= 1000; i++) pts.push([i, Math.sin(i / 30) * (i === 517 ? 5 : 1)]);
    const d = decimateEnvelope(pts, 50);
    expect(d.length).toBeLessThanOrEqual(200);
    expect(d.some((p) => p[0] === 517)).toBe(true);
    expect(d[0]).toEqual(pts[0]);
    expect(d[d.length - 1]).toEqual(pts[1000]);
  });

  it('escapes text and makes fragment ids from any name', () => {
    expect(escapeHtml(`<a href="x">&'`)).toBe('&lt;a href=&quot;x&quot;&gt;&amp;&#39;');
    expect(anchorId('NO+')).toBe('sp-NO.2b');
    expect(anchorId('C2H5(a)')).not.toMatch(/[()+ ]/);
  });
});

const row = (name: string, over: Partial<ReportRow> = {}): ReportRow => ({
  name,
  anchor: anchorId(name),
  file: `${name}.yaml`,
  status: 'ok',
  worstRatio: 0.1,
  warnings: 0,
  errors: 0,
  cacheHit: false,
  ...over,
});

describe('overview', () => {
  it('orders failed species first, then by the largest error relative to its limit, then by name', () => {
    const rows = [row('B', { worstRatio: 0.2 }), row('A', { worstRatio: 0.9 }), row('C', { status: 'failed', worstRatio: Infinity }), row('D', { worstRatio: 0.2 })];
    expect([...rows].sort(worstFirst).map((r) => r.name)).toEqual(['C', 'A', 'B', 'D']);
  });

  it('puts the sections on pages of their own beyond the inline limit', () => {
    const header = { title: 't', toolName: 'qforge', toolVersion: '0', constantsEdition: 'c', standardPressure: '1 bar', status: 'ok', references: [], invalid: [] };
    const species = ['A', 'B', 'C'].map((n) => ({ row: row(n), html: `<section id="${anchorId(n)}"><a href="#overview">back to the overview</a></section>` }));
    const inline = renderReport(header, species, (n) => `report/${n}.html`, 5);
    expect(inline.pages.size).toBe(0);
    expect(inline.main).toContain('href="#sp-A"');
    const paged = renderReport(header, species, (n) => `report/${n}.html`, 2);
    expect([...paged.pages.keys()]).toEqual(['report/A.html', 'report/B.html', 'report/C.html']);
    expect(paged.main).toContain('href="report/A.html#sp-A"');
    expect(paged.main).not.toContain('<section');
    expect(paged.pages.get('report/B.html')).toContain('href="../report.html#overview"');
  });
});

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
beforeEach(async () => {
  ws = await tempWorkspace();
});
afterEach(async () => {
  await ws.cleanup();
});

describe('qforge build --report', () => {

  it('writes report.html into the build folder, lists it in the marker, and rewrites it byte for byte', async () => {
    const r = await runCli(['build', 'db', '--out', 'out', '--report', '-q'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    const html = await readFile(path.join(ws.out, 'report.html'), 'utf8');
    expect(await readFile(path.join(ws.out, '.qforge-build'), 'utf8')).toMatch(/^report\.html$/m);
    const summary = JSON.parse(await readFile(path.join(ws.out, 'summary.json'), 'utf8'));
    expect(summary.outputs).toContain('report.html');
    expect(summary.outputs[summary.outputs.length - 1]).toBe('summary.json');
    // one Cp chart and three residual charts per species; overview rows link to the sections
    expect(html.match(/<svg class="chart cp"/g)?.length).toBe(5);
    expect(html.match(/<svg class="chart residual"/g)?.length).toBe(15);
    for (const n of ['Ar', 'CO', 'H2O', 'N2', 'O']) expect(html).toContain(`<a href="#sp-${n}">${n}</a>`);
    // self-contained: no external resources
    expect(html).not.toMatch(/<link|src=|url\(|@import|https?:\/\/(?!www\.w3\.org\/2000\/svg)/);
    expect(html).toContain('CAUTION: these polynomials are valid only inside');
    expect(html).toContain('@media print');
    // a rebuild (from the cache) writes the same report except the cache column
    await runCli(['build', 'db', '--out', 'out2', '--report', '-q', '--no-cache'], ws.root);
    expect(await readFile(path.join(ws.root, 'out2', 'report.html'), 'utf8')).toBe(html);
  });

  it('is written when the settings ask for it, and not otherwise', async () => {
    await runCli(['build', 'db', '--out', 'out', '-q'], ws.root);
    expect(await readdir(ws.out)).not.toContain('report.html');
    const { appendFile } = await import('node:fs/promises');
    await appendFile(path.join(ws.db, 'qforge.yaml'), '\noutputs: {report: true}\n');
    const r = await runCli(['build', 'db', '--out', 'out', '-q'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    expect(await readdir(ws.out)).toContain('report.html');
  });

  it('compares with a previous build (--report-against) and refuses a missing one with a usage error', async () => {
    expect((await runCli(['build', 'db', '--out', 'old', '-q'], ws.root)).code).toBe(0);
    const r = await runCli(['build', 'db', '--out', 'out', '--report-against', 'old', '-q'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    const html = await readFile(path.join(ws.out, 'report.html'), 'utf8');
    expect(html).toContain('largest change<br><small>vs old</small>');
    expect(html).toMatch(/class="s-previous" d="M/);
    const bad = await runCli(['build', 'db', '--out', 'out3', '--report-against', 'nowhere', '-q'], ws.root);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/nowhere/);
  });
});

describe('report pages and failures through the runner', () => {

  it('beyond the inline limit writes one page per species, all listed in the marker', async () => {
    const { runBuild } = await import('../../../pipeline/runner.js');
    const r = await runBuild({ dir: ws.db, out: ws.out, cacheDir: null, report: { inlineLimit: 2 } });
    expect(r.exitCode).toBe(0);
    const pages = (await readdir(path.join(ws.out, 'report'))).sort();
    expect(pages).toEqual(['Ar.html', 'CO.html', 'H2O.html', 'N2.html', 'O.html']);
    const marker = await readFile(path.join(ws.out, '.qforge-build'), 'utf8');
    for (const p of pages) expect(marker).toContain(`report/${p}\n`);
    const main = await readFile(path.join(ws.out, 'report.html'), 'utf8');
    expect(main).not.toContain('<svg class="chart cp"');
    expect(main).toContain('href="report/CO.html#sp-CO"');
    expect(await readFile(path.join(ws.out, 'report/CO.html'), 'utf8')).toContain('<svg class="chart cp"');
    // The pages belong to the build: the next build replaces them (and drops them without --report).
    expect((await runBuild({ dir: ws.db, out: ws.out, cacheDir: null })).exitCode).toBe(0);
    expect(await readdir(ws.out)).not.toContain('report');
  });

  it('with --keep-going lists a document that failed validation and keeps the good species', async () => {
    const { writeFile } = await import('node:fs/promises');
    await writeFile(path.join(ws.db, 'Bad.yaml'), 'name: Bad\ncomposition: {Xx: 1}\nstructure: atom\n');
    const r = await runCli(['build', 'db', '--out', 'out', '--report', '--keep-going', '-q'], ws.root);
    expect(r.code).toBe(1);
    const html = await readFile(path.join(ws.out, 'report.html'), 'utf8');
    expect(html).toContain('Documents that failed validation');
    expect(html).toMatch(/Bad\.yaml#1: /);
    expect(html.match(/<svg class="chart cp"/g)?.length).toBe(5);
    expect(html).toContain('build status partial');
  });
});
