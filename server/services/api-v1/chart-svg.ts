import { CHART_INK } from '../../../shared/charts/chart-colours';
import { prepareSweep, type PreparedSweep } from '../../../shared/charts/sweep-rows';
import { prepareTornado, tornadoHeight, type PreparedTornado } from '../../../shared/charts/tornado-rows';
import { el, num, text } from '../../../shared/drawing/svg-markup';
import type { SweepOutput, TornadoOutput } from '../../../shared/mechanics/sensitivity-schema';
import { formatNumber } from '../../../shared/units/format';
import type { UnitSystem } from '../../../shared/units/unit-systems';
import type { ChartWorkerPool } from './chart-worker-pool';

/** What the footer and title say about the answer: which template, which version, which units. */
export interface ChartIdentity {
  title: string;
  slug: string;
  version: string;
  contentHash: string;
  units: UnitSystem;
}

export interface ChartSize {
  width: number;
  height: number;
}

export const DEFAULT_CHART_SIZE: ChartSize = { width: 800, height: 450 };

// A generic stack: the document must not fetch a font, and a quote or a shop page has its own.
const FONT_STACK = "system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif";
const AVERAGE_GLYPH = 0.56;
const PAD = 16;
const CAUTION =
  'A design aid for a qualified person; rated loads and design factors follow ASME B30.20 with ASME BTH-1 or EN 13155.';

/** A unit after a number: a space, except the degree sign, which is written close. */
const spaced = (unit: string) => (!unit ? '' : unit === '°' ? unit : ` ${unit}`);

const widthOf = (words: string, fontSize: number) => words.length * fontSize * AVERAGE_GLYPH;

/** A line of text that fits the width: smaller type first, then cut with an ellipsis. */
function fittedText(words: string, x: number, y: number, maxWidth: number, fontSize: number, attrs: Record<string, string | number> = {}): string {
  let size = fontSize;
  while (size > 11 && widthOf(words, size) > maxWidth) size -= 1;
  let shown = words;
  if (widthOf(shown, size) > maxWidth) {
    const keep = Math.max(1, Math.floor(maxWidth / (size * AVERAGE_GLYPH)) - 1);
    shown = `${shown.slice(0, keep).trimEnd()}…`;
  }
  return el('text', { x, y, 'font-size': size, ...attrs }, text(shown));
}

interface LegendEntry {
  label: string;
  swatch: string;
}

const lineSwatch = (stroke: string, dash: string | undefined, width = 2.25) =>
  el('line', { x1: 0, y1: 0, x2: 24, y2: 0, stroke, 'stroke-width': width, 'stroke-dasharray': dash });
const areaSwatch = (fill: string, edge: string, dash?: string) =>
  el('rect', { x: 0, y: -6, width: 24, height: 12, fill, stroke: edge, 'stroke-dasharray': dash, rx: 2 });

/** Entries laid out left to right, wrapping; returns the markup and the height used. */
function legend(entries: readonly LegendEntry[], top: number, width: number): { markup: string; height: number } {
  const rowHeight = 20;
  let x = PAD;
  let row = 0;
  const items: string[] = [];
  for (const e of entries) {
    const w = 24 + 8 + widthOf(e.label, 12) + 20;
    if (x > PAD && x + w > width - PAD) {
      row += 1;
      x = PAD;
    }
    const y = top + row * rowHeight + 10;
    items.push(
      el('g', { class: 'chart-legend-entry', transform: `translate(${num(x)} ${num(y)})` }, [
        e.swatch,
        el('text', { x: 32, y: 4, 'font-size': 12, fill: CHART_INK.text }, text(e.label)),
      ]),
    );
    x += w;
  }
  return { markup: el('g', { class: 'chart-legend' }, items), height: entries.length ? (row + 1) * rowHeight : 0 };
}

const unitWords = (units: UnitSystem) => (units === 'US' ? 'US customary units' : 'SI units');

function footer(id: ChartIdentity, notes: readonly string[], size: ChartSize): { markup: string; height: number } {
  const lines: string[] = [];
  let y = size.height - PAD + 2;
  lines.push(
    fittedText(CAUTION, PAD, y, size.width - 2 * PAD, 10, { fill: CHART_INK.label, class: 'chart-caution' }),
  );
  y -= 16;
  const ident = `${id.slug} · version ${id.version} · spec ${id.contentHash.slice(0, 12)} · ${unitWords(id.units)}`;
  lines.push(
    el('text', { x: PAD, y, 'font-size': 11, fill: CHART_INK.label, class: 'chart-footer' }, text(ident)),
    el('text', { x: size.width - PAD, y, 'font-size': 11, fill: CHART_INK.label, 'text-anchor': 'end', 'font-weight': 700 }, text('Pinwork')),
  );
  for (const note of [...notes].reverse()) {
    y -= 16;
    lines.push(fittedText(note, PAD, y, size.width - 2 * PAD, 12, { fill: '#933f14', 'font-weight': 600, class: 'chart-note' }));
  }
  return { markup: el('g', {}, lines), height: size.height - y + 14 };
}

/** The plot's own <svg>, placed at (0, top) in the document, without what a standalone file must not carry. */
function placedPlot(markup: string, top: number, size: ChartSize): string {
  const body = markup
    .replace(/^<svg[^>]*>/, '')
    .replace(/<\/svg>$/, '')
    .replace(/<title><\/title>|<desc><\/desc>/g, '')
    .replace(/\s(?:style|tabindex)="[^"]*"/g, '')
    // An HTML serializer writes a no-break space as an entity XML does not define.
    .replaceAll('&nbsp;', '&#160;');
  return `<svg class="chart-plot" x="0" y="${num(top)}" width="${num(size.width)}" height="${num(size.height)}" viewBox="0 0 ${num(size.width)} ${num(size.height)}" overflow="visible">${body}</svg>`;
}

function documentOf(id: ChartIdentity, size: ChartSize, title: string, subtitle: string, parts: string[], kind: string): string {
  const root = el(
    'svg',
    {
      xmlns: 'http://www.w3.org/2000/svg',
      version: '1.1',
      width: size.width,
      height: size.height,
      viewBox: `0 0 ${num(size.width)} ${num(size.height)}`,
      role: 'img',
      'aria-labelledby': 'chart-title chart-desc',
      'font-family': FONT_STACK,
      'data-chart': kind,
      'data-template': id.slug,
      'data-version': id.version,
    },
    [
      el('title', { id: 'chart-title' }, text(title)),
      el('desc', { id: 'chart-desc' }, text(subtitle)),
      el('rect', { width: size.width, height: size.height, fill: '#ffffff' }),
      fittedText(title, PAD, 28, size.width - 2 * PAD, 17, { 'font-weight': 800, fill: '#0c1e21', class: 'chart-heading' }),
      fittedText(subtitle, PAD, 48, size.width - 2 * PAD, 12, { fill: CHART_INK.label, class: 'chart-subtitle' }),
      ...parts,
    ],
  );
  return `<?xml version="1.0" encoding="UTF-8"?>\n${root}\n`;
}

const HEADER = 58;
const MIN_PLOT = 160;

export function sweepTitle(id: ChartIdentity, chart: PreparedSweep): { title: string; subtitle: string } {
  const series = chart.series.map((s) => s.label);
  const listed = series.length > 1 ? `${series.slice(0, -1).join(', ')} and ${series.at(-1)}` : (series[0] ?? '');
  const first = chart.rows[0]?.x ?? 0;
  const last = chart.rows.at(-1)?.x ?? 0;
  const unit = spaced(chart.input.unit);
  return {
    title: `${id.title}: ${listed} against ${chart.input.label.toLowerCase()}`,
    subtitle: `${chart.input.label} from ${formatNumber(first)} to ${formatNumber(last)}${unit} in ${chart.rows.length} steps, the other inputs as sent.`,
  };
}

/** A sweep as a standalone SVG document: title, legend, the shared plot, gap notes, footer. */
export async function sweepSvg(pool: ChartWorkerPool, id: ChartIdentity, sweep: SweepOutput, size: ChartSize = DEFAULT_CHART_SIZE): Promise<string> {
  const chart = prepareSweep(sweep, id.units, id.units);
  const { title, subtitle } = sweepTitle(id, chart);
  const entries: LegendEntry[] = chart.series.map((s) => ({ label: s.name, swatch: lineSwatch(s.look.stroke, s.look.dash) }));
  if (chart.gaps.length) entries.push({ label: 'Cannot be built (shaded)', swatch: areaSwatch(CHART_INK.gapFill, CHART_INK.gapEdge, '3 3') });
  const leg = legend(entries, HEADER + 4, size.width);
  const unit = spaced(chart.input.unit);
  const notes = chart.gaps.map((g) =>
    g.from === g.to ? `Gap at ${formatNumber(g.from)}${unit}: ${g.message}` : `Gap from ${formatNumber(g.from)} to ${formatNumber(g.to)}${unit}: ${g.message}`,
  );
  const foot = footer(id, notes, size);
  const top = HEADER + 8 + leg.height;
  const plotSize = { width: size.width, height: Math.max(MIN_PLOT, size.height - top - foot.height) };
  const plot = await pool.render({ kind: 'sweep', chart, ...plotSize });
  return documentOf(id, size, title, subtitle, [leg.markup, placedPlot(plot, top, plotSize), foot.markup], 'sweep');
}

export function tornadoTitle(id: ChartIdentity, chart: PreparedTornado): { title: string; subtitle: string } {
  const unit = spaced(chart.result.unit);
  return {
    title: `${id.title}: what moves ${chart.result.label.toLowerCase()} most`,
    subtitle: `Each input moved ${formatNumber(chart.percent)} % down and up, the others held; ${chart.result.label} is ${formatNumber(chart.base)}${unit} as set.`,
  };
}

/** Default size of a tornado document: the app's bar spacing, never shorter than the default. */
export const tornadoDocumentHeight = (bars: number) => Math.max(DEFAULT_CHART_SIZE.height, tornadoHeight(bars) + 24 + HEADER + 28 + 56);

/** A tornado as a standalone SVG document: one bar per input, the value as set, footer. */
export async function tornadoSvg(pool: ChartWorkerPool, id: ChartIdentity, tornado: TornadoOutput, size?: ChartSize): Promise<string> {
  const chart = prepareTornado(tornado, id.units, id.units);
  const docSize = size ?? { width: DEFAULT_CHART_SIZE.width, height: tornadoDocumentHeight(chart.rows.length) };
  const { title, subtitle } = tornadoTitle(id, chart);
  const unit = spaced(chart.result.unit);
  const entries: LegendEntry[] = [
    { label: `${chart.result.label} with one input moved ±${formatNumber(chart.percent)} % (label: half the swing)`, swatch: areaSwatch(CHART_INK.bar, CHART_INK.bar) },
    { label: `As set: ${formatNumber(chart.base)}${unit}`, swatch: lineSwatch(CHART_INK.baseLine, '4 3', 2) },
  ];
  const leg = legend(entries, HEADER + 4, docSize.width);
  const notes = chart.rows.flatMap((r) => [r.bar.low.note, r.bar.high.note].filter((n): n is string => Boolean(n)).map((n) => `${r.label}: ${n}`));
  const foot = footer(id, [...new Set(notes)].slice(0, 4), docSize);
  const top = HEADER + 8 + leg.height;
  const plotSize = { width: docSize.width, height: Math.max(MIN_PLOT, docSize.height - top - foot.height) };
  const plot = await pool.render({ kind: 'tornado', chart, ...plotSize });
  return documentOf(id, docSize, title, subtitle, [leg.markup, placedPlot(plot, top, plotSize), foot.markup], 'tornado');
}
