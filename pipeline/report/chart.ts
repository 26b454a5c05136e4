/**
 * Static SVG charts for the build report: linear scales and "nice" ticks from d3-scale, path strings from
 * d3-shape, everything else (axes, legend, markers) written here as plain SVG text. No DOM, no browser:
 * a chart is a pure function of its data and returns one `<svg>` string.
 *
 * Styling is by CSS class (`page.ts` holds the style sheet), so a chart carries only geometry and the
 * report stays small. Every series kind differs in shape or dash as well as colour (readable in greyscale
 * and by colour-blind readers): computed points are filled diamonds, reference points open circles, the fit
 * a solid line, its extrapolation dashed, the previous build dash-dotted, bands are hatched fills.
 */
import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import { escapeHtml } from './html.js';

export type SeriesStyle = 'fit' | 'extrapolation' | 'computed' | 'reference' | 'previous' | 'band' | 'limit' | 'residual';

export type ChartSeries =
  | { kind: 'line'; style: 'fit' | 'extrapolation' | 'previous' | 'residual'; label: string; points: ReadonlyArray<readonly [number, number]>; legend?: boolean }
  | { kind: 'points'; style: 'computed' | 'reference'; label: string; points: ReadonlyArray<readonly [number, number]>; legend?: boolean }
  | { kind: 'band'; style: 'band' | 'limit'; label: string; points: ReadonlyArray<readonly [number, number, number]>; legend?: boolean };

export interface ChartSpec {
  /** Accessible title (also the `<title>` of the svg). */
  title: string;
  xLabel: string;
  yLabel: string;
  width: number;
  height: number;
  series: readonly ChartSeries[];
  /** Vertical markers, e.g. T_mid. */
  markers?: ReadonlyArray<{ x: number; label: string }>;
  /** Force the y domain to include these values (e.g. 0 or the limit band). */
  yInclude?: readonly number[];
  /** Extra class on the svg element. */
  className?: string;
  /** Where the legend goes: inside the plot, bottom right (default), or in a strip above the plot. */
  legend?: 'inside' | 'above';
}

const MARGIN = { top: 12, right: 22, bottom: 40, left: 62 };

/** A coordinate with one decimal: plenty for a screen pixel, and it keeps 1,000-species reports small. */
const px = (v: number): string => {
  const r = Math.round(v * 10) / 10;
  return Object.is(r, -0) ? '0' : String(r);
};

const roundPath = (d: string | null): string => (d ?? '').replace(/-?\d+\.\d+(e-?\d+)?/g, (m) => px(Number(m)));

/** Diamond marker of half-size r centred on (x, y), as a relative path fragment. */
const diamond = (x: number, y: number, r: number) => `M${px(x)} ${px(y - r)}l${r} ${r}l${-r} ${r}l${-r} ${-r}z`;
/** Circle marker (two arcs) of radius r centred on (x, y). */
const circle = (x: number, y: number, r: number) => `M${px(x - r)} ${px(y)}a${r} ${r} 0 1 0 ${2 * r} 0a${r} ${r} 0 1 0 ${-2 * r} 0`;

export function renderChart(spec: ChartSpec): string {
  const { width, height } = spec;
  const above = spec.legend === 'above';
  const top = above ? MARGIN.top + 18 : MARGIN.top;
  const innerW = width - MARGIN.left - MARGIN.right;
  const innerH = height - top - MARGIN.bottom;
  const xs: number[] = [];
  const ys: number[] = [...(spec.yInclude ?? [])];
  for (const s of spec.series) {
    for (const p of s.points) {
      xs.push(p[0]);
      ys.push(p[1]);
      if (s.kind === 'band') ys.push((p as readonly [number, number, number])[2]);
    }
  }
  const finite = (a: number[]) => a.filter(Number.isFinite);
  const [x0, x1] = extent(finite(xs), [0, 1]);
  let [y0, y1] = extent(finite(ys), [0, 1]);
  if (y0 === y1) {
    const pad = Math.abs(y0) > 0 ? Math.abs(y0) * 0.05 : 1;
    y0 -= pad;
    y1 += pad;
  }
  // x exactly over the data (a "nice" 7000 K end would only waste width); y rounded out to nice ticks.
  const x = scaleLinear().domain([x0, x1]).range([0, innerW]);
  const y = scaleLinear().domain([y0, y1]).range([innerH, 0]).nice(6);

  const parts: string[] = [];
  parts.push(`<g transform="translate(${MARGIN.left},${top})">`);
  // Grid and axes.
  const xTicks = x.ticks(8);
  const yTicks = y.ticks(6);
  const fx = x.tickFormat(8);
  const fy = y.tickFormat(6);
  parts.push(
    `<path class="grid" d="${yTicks.map((t) => `M0 ${px(y(t))}H${px(innerW)}`).join('')}${xTicks.map((t) => `M${px(x(t))} 0V${px(innerH)}`).join('')}"/>`,
  );
  parts.push(`<path class="axis" d="M0 0V${px(innerH)}H${px(innerW)}"/>`);
  parts.push(
    `<g class="ticks x">${xTicks.map((t) => `<text x="${px(x(t))}" y="${px(innerH + 16)}">${escapeHtml(fx(t))}</text>`).join('')}</g>`,
  );
  parts.push(
    `<g class="ticks y">${yTicks.map((t) => `<text x="-6" y="${px(y(t) + 4)}">${escapeHtml(fy(t).replace('−', '-'))}</text>`).join('')}</g>`,
  );
  parts.push(`<text class="label x" x="${px(innerW / 2)}" y="${px(innerH + 34)}">${escapeHtml(spec.xLabel)}</text>`);
  parts.push(`<text class="label y" transform="translate(-48,${px(innerH / 2)}) rotate(-90)">${escapeHtml(spec.yLabel)}</text>`);

  const clipX = (v: number) => v >= x.domain()[0]! && v <= x.domain()[1]!;
  // Bands first (underneath), then lines, then points.
  const order: Record<ChartSeries['kind'], number> = { band: 0, line: 1, points: 2 };
  const sorted = [...spec.series].sort((a, b) => order[a.kind] - order[b.kind]);
  for (const s of sorted) {
    if (s.points.length === 0) continue;
    if (s.kind === 'band') {
      const gen = area<readonly [number, number, number]>()
        .x((p) => x(p[0]))
        .y0((p) => y(p[1]))
        .y1((p) => y(p[2]));
      parts.push(`<path class="s-${s.style}" d="${roundPath(gen(s.points as Array<readonly [number, number, number]>))}"/>`);
    } else if (s.kind === 'line') {
      const gen = line<readonly [number, number]>()
        .defined((p) => Number.isFinite(p[1]))
        .x((p) => x(p[0]))
        .y((p) => y(p[1]));
      parts.push(`<path class="s-${s.style}" d="${roundPath(gen(s.points as Array<readonly [number, number]>))}"/>`);
    } else {
      const mark = s.style === 'computed' ? diamond : circle;
      const r = s.style === 'computed' ? 3.5 : 3;
      const d = s.points
        .filter((p) => clipX(p[0]) && Number.isFinite(p[1]))
        .map((p) => mark(x(p[0]), y(p[1]), r))
        .join('');
      parts.push(`<path class="s-${s.style}" d="${d}"/>`);
    }
  }
  for (const m of spec.markers ?? []) {
    if (!clipX(m.x)) continue;
    const mx = px(x(m.x));
    parts.push(`<path class="marker" d="M${mx} 0V${px(innerH)}"/><text class="marker-label" x="${mx}" y="10" dx="4">${escapeHtml(m.label)}</text>`);
  }
  parts.push('</g>');

  const legend = spec.series.filter((s) => s.legend !== false && s.points.length > 0);
  let legendHtml = '';
  if (legend.length && above) legendHtml = `<g class="legend" transform="translate(${MARGIN.left},${MARGIN.top})">${legendRow(legend)}</g>`;
  else if (legend.length) {
    const box = legendSize(legend);
    legendHtml = `<g class="legend" transform="translate(${px(MARGIN.left + innerW - box.w - 4)},${px(top + innerH - box.h + 4)})">${legendItems(legend)}</g>`;
  }
  const cls = ['chart', spec.className].filter(Boolean).join(' ');
  return (
    `<svg class="${cls}" role="img" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" xmlns="http://www.w3.org/2000/svg">` +
    `<title>${escapeHtml(spec.title)}</title>${parts.join('')}${legendHtml}</svg>`
  );
}

const ROW_H = 15;
/** Approximate text width at 11 px (no font metrics without a browser; generous so text fits). */
const textWidth = (t: string) => t.length * 6.2;

function glyph(s: ChartSeries, x0: number, y0: number): string {
  if (s.kind === 'points') return `<path class="s-${s.style}" d="${s.style === 'computed' ? diamond(x0 + 9, y0, 3.5) : circle(x0 + 9, y0, 3)}"/>`;
  if (s.kind === 'band') return `<rect class="s-${s.style}" x="${x0}" y="${y0 - 5}" width="18" height="10"/>`;
  return `<path class="s-${s.style}" d="M${x0} ${y0}H${x0 + 18}"/>`;
}

function legendSize(series: readonly ChartSeries[]): { w: number; h: number } {
  return { w: 30 + Math.max(...series.map((s) => textWidth(s.label))), h: series.length * ROW_H + 6 };
}

function legendItems(series: readonly ChartSeries[]): string {
  const items = series.map((s, i) => `${glyph(s, 0, i * ROW_H)}<text x="24" y="${i * ROW_H + 4}">${escapeHtml(s.label)}</text>`);
  const { w, h } = legendSize(series);
  return `<rect class="legend-box" x="-6" y="-10" width="${px(w)}" height="${h}"/>${items.join('')}`;
}

function legendRow(series: readonly ChartSeries[]): string {
  let x0 = 0;
  return series
    .map((s) => {
      const item = `${glyph(s, x0, 0)}<text x="${px(x0 + 24)}" y="4">${escapeHtml(s.label)}</text>`;
      x0 += 36 + textWidth(s.label);
      return item;
    })
    .join('');
}

function extent(values: number[], fallback: [number, number]): [number, number] {
  if (values.length === 0) return fallback;
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/**
 * At most ~2·buckets points of a dense curve that keep its extremes: the first, the minimum, the maximum and
 * the last point of each bucket of equal x width. A residual's worst point is always drawn.
 */
export function decimateEnvelope(points: ReadonlyArray<readonly [number, number]>, buckets: number): Array<readonly [number, number]> {
  if (points.length <= buckets * 2) return [...points];
  const x0 = points[0]![0];
  const span = points[points.length - 1]![0] - x0 || 1;
  const out: Array<readonly [number, number]> = [];
  let bucket = -1;
  let group: Array<readonly [number, number]> = [];
  const flush = () => {
    if (group.length === 0) return;
    let lo = group[0]!;
    let hi = group[0]!;
    for (const p of group) {
      if (p[1] < lo[1]) lo = p;
      if (p[1] > hi[1]) hi = p;
    }
    const keep = new Set([group[0]!, lo, hi, group[group.length - 1]!]);
    out.push(...group.filter((p) => keep.has(p)));
    group = [];
  };
  for (const p of points) {
    const b = Math.min(buckets - 1, Math.floor(((p[0] - x0) / span) * buckets));
    if (b !== bucket) {
      flush();
      bucket = b;
    }
    group.push(p);
  }
  flush();
  return out;
}
