/**
 * The demo report in a real browser: headless Chromium from Debian's package (`apt-get install chromium`)
 * driven by playwright-core. Builds species/ with --report into a temp folder, opens report.html from the
 * file system, and checks one Cp chart per species, no console errors, no network requests, the filter
 * script, and a readable layout; saves a screenshot to .ci/out/report-screenshot.png (gitignored) for a
 * person to look at. Skipped, with the reason printed, where /usr/bin/chromium is not installed (.ci/run
 * installs it). Holds no reference values: it checks the page's structure and behaviour, not numbers.
 */
import { existsSync } from 'node:fs';
import { mkdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REPO, runCli, tempWorkspace } from '../helpers.js';

const CHROMIUM = '/usr/bin/chromium';
const available = existsSync(CHROMIUM);
if (!available) console.warn(`browser test skipped: ${CHROMIUM} is not installed (apt-get install chromium)`);

describe.skipIf(!available)('the demo report in headless Chromium', () => {
  let ws: Awaited<ReturnType<typeof tempWorkspace>>;
  beforeAll(async () => {
    ws = await tempWorkspace();
    // --keep-going: a species failing its fit check must not hide the report (it then shows as FAILED).
    const r = await runCli(['build', path.join(REPO, 'species'), '--out', 'demo', '--report', '--keep-going', '-q'], ws.root);
    expect(r.code, r.stderr).toBeLessThanOrEqual(1);
  });
  afterAll(async () => {
    await ws?.cleanup();
  });

  it('shows one chart per species, loads nothing from the network and logs no errors', async () => {
    const { chromium } = await import('playwright-core');
    const out = path.join(ws.root, 'demo');
    const db = JSON.parse(await readFile(path.join(out, 'thermo.json'), 'utf8')) as { species: Array<{ name: string }> };
    const reportUrl = pathToFileURL(path.join(out, 'report.html')).href;
    const browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--no-sandbox'] });
    try {
      const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
      const problems: string[] = [];
      const requests: string[] = [];
      page.on('console', (m) => {
        if (m.type() === 'error' || m.type() === 'warning') problems.push(`${m.type()}: ${m.text()}`);
      });
      page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
      page.on('request', (r) => {
        if (r.url() !== reportUrl) requests.push(r.url());
      });
      await page.goto(reportUrl, { waitUntil: 'load' });
      expect(await page.locator('svg.chart.cp').count()).toBe(db.species.length);
      // One Cp chart in the section of every species that was built (failed species have a section without).
      const perSection = await page.$$eval('section.species', (els) =>
        els.filter((e) => e.querySelector('.badge.ok')).map((e) => [e.getAttribute('data-name'), e.querySelectorAll('svg.chart.cp').length]),
      );
      expect(perSection).toEqual(db.species.map((s) => [s.name, 1]));
      // Charts are laid out at their size (not collapsed) and the overview links resolve to sections.
      const box = await page.locator('svg.chart.cp').first().boundingBox();
      expect(box!.width).toBeGreaterThan(500);
      const firstLink = await page.locator('table.overview a').first().getAttribute('href');
      expect(await page.locator(firstLink!).count()).toBe(1);
      // Type-to-filter: only rows containing "NH" stay visible.
      await page.fill('#filter input', 'NH');
      const visible = await page.locator('table.overview tr[data-name]:visible').allTextContents();
      expect(visible.length).toBeGreaterThan(0);
      expect(visible.every((t) => t.includes('NH'))).toBe(true);
      await page.fill('#filter input', '');
      await mkdir(path.join(REPO, '.ci/out'), { recursive: true });
      await page.screenshot({ path: path.join(REPO, '.ci/out/report-screenshot.png') });
      await page.locator('section.species[data-name="H2O2"]').screenshot({ path: path.join(REPO, '.ci/out/report-species-screenshot.png') });
      expect(problems).toEqual([]);
      expect(requests).toEqual([]);
    } finally {
      await browser.close();
    }
  });
});
