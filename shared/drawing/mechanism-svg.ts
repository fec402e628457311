import type { SolveResult } from '../mechanics/solve-result';
import { formatQuantity } from '../units/format';
import type { UnitSystem } from '../units/unit-systems';
import { dimensionLine } from './dimension-line';
import { forcesTextAlternative } from './forces-text';
import { drawMechanism, type SceneStyle } from './mechanism-scene';
import { FONT_FAMILY, PALETTE } from './palette';
import { scaleBar } from './scale-bar';
import { allPoints, type DrawingSpec } from './spec-geometry';
import { el, svgDocument, text } from './svg-markup';
import { aroundPoint, LabelPlacer } from './label-placer';
import { label } from './symbols';
import { add, centroid, dot, fitView, perp, sub, times, unit, type Vec, type View } from './view-transform';

export interface MechanismSvgOptions {
  unitSystem: UnitSystem;
  /** Drawing units (px at 100 %); 640 × 420 unless told. */
  width?: number;
  height?: number;
  /** Point names beside the points; on unless told. */
  showLabels?: boolean;
  /** The input being varied: its dimension line is drawn heavier, in bold. */
  highlightInput?: string;
  /** The drawing's accessible title; the template's title unless told. */
  title?: string;
  /** Prefix for ids inside the drawing, unique on the page; from the slug unless told. */
  idPrefix?: string;
}

const STYLE: SceneStyle = { partWidth: 12, memberWidth: 5, pinRadius: 5.2, supportSize: 1, loadArrow: 46, arrowWidth: 2.4, labels: true, badges: true };
// Room around the geometry for supports, load arrows with their labels and dimension lines.
const MARGIN = { top: 64, right: 92, bottom: 100, left: 92 };
const KEY_STRIP = 26;

/** The placement the drawing uses: its `scale` is drawing units per model millimetre. */
export function mechanismView(result: SolveResult, options: Pick<MechanismSvgOptions, 'width' | 'height'> = {}): View {
  return fitView(allPoints(result), options.width ?? 640, options.height ?? 420, MARGIN);
}

/**
 * The solved mechanism to scale, y up: parts, two-force members with their state, pins,
 * supports, loads (solved ones dashed and marked so), dimension lines of the spec's
 * dimensioned inputs, a scale bar and a key. A pure function: same inputs, same markup.
 */
export function mechanismSvg(spec: DrawingSpec, result: SolveResult, options: MechanismSvgOptions): string {
  const system = options.unitSystem;
  const view = mechanismView(result, options);
  const placer = new LabelPlacer({ x0: 6, y0: 6, x1: view.width - 6, y1: view.height - KEY_STRIP - 4 });
  const layers = drawMechanism(spec, result, view, STYLE, system, placer);
  const centre = view.toSvg(centroid(allPoints(result)));

  const dims: string[] = [];
  (spec.dimensions ?? []).forEach((d) => {
    const a = result.points[d.between[0]];
    const b = result.points[d.between[1]];
    const input = spec.inputs.find((x) => x.key === d.input);
    const value = result.inputs[d.input];
    if (!a || !b || !input || value === undefined) return;
    const p = view.toSvg(a);
    const q = view.toSvg(b);
    const normal = unit(perp(sub(q, p)));
    const outward = dot(normal, sub(p, centre)) + dot(normal, sub(q, centre)) >= 0 ? normal : { x: -normal.x, y: -normal.y };
    const shown = formatQuantity(value, input.quantity, system);
    const half = { w: shown.length * 3.6 + 6, h: 9 };
    const horizontal = Math.abs(q.x - p.x) >= Math.abs(q.y - p.y);
    const fractions = [0.5, 0.4, 0.6, 0.3, 0.7, 0.22, 0.78];
    // Try both sides at a few stand-offs and the value at a few places along the line; keep the
    // arrangement that hides least, preferring the outer side, a short stand-off and the middle.
    let best = { score: Infinity, side: outward, offset: 40, t: 0.5 };
    for (const [side, sideCost] of [[outward, 0], [{ x: -outward.x, y: -outward.y }, 60]] as const) {
      for (const [k, offset] of [34, 52, 70, 88].entries()) {
        const a0 = add(p, times(side, offset));
        const b0 = add(q, times(side, offset));
        const lineBox = { x0: Math.min(a0.x, b0.x), y0: Math.min(a0.y, b0.y), x1: Math.max(a0.x, b0.x), y1: Math.max(a0.y, b0.y) };
        const base = sideCost + k * 25 + placer.score({ x0: lineBox.x0 - 2, y0: lineBox.y0 - 2, x1: lineBox.x1 + 2, y1: lineBox.y1 + 2 }, 2);
        for (const t of fractions) {
          const c = add(a0, times(sub(b0, a0), t));
          const [hw, hh] = horizontal ? [half.w, half.h] : [half.h, half.w];
          const score = base + Math.abs(t - 0.5) * 40 + placer.score({ x0: c.x - hw, y0: c.y - hh, x1: c.x + hw, y1: c.y + hh });
          if (score < best.score) best = { score, side, offset, t };
        }
      }
    }
    const { side, offset, t } = best;
    const a0 = add(p, times(side, offset));
    const b0 = add(q, times(side, offset));
    const chip = add(a0, times(sub(b0, a0), t));
    const [hw, hh] = horizontal ? [half.w, half.h] : [half.h, half.w];
    dims.push(dimensionLine(p, q, shown, {
      side, offset, highlighted: options.highlightInput === d.input, title: `${input.label}: ${shown}`, input: d.input, at: t,
    }));
    placer.addSegment(a0, b0, 2);
    placer.addSegment(p, a0, 1);
    placer.addSegment(q, b0, 1);
    placer.addBox({ x0: chip.x - hw, y0: chip.y - hh, x1: chip.x + hw, y1: chip.y + hh });
  });

  const loads = layers.finishLoads(placer);

  const names: string[] = [];
  if (options.showLabels !== false) {
    // Several names can share a place (a tie meeting the boom tip): one label lists them.
    const groups = new Map<string, { at: Vec; names: string[] }>();
    for (const [name, pt] of Object.entries(result.points)) {
      const at = view.toSvg(pt);
      const k = `${Math.round(at.x)}:${Math.round(at.y)}`;
      const g = groups.get(k) ?? { at, names: [] };
      g.names.push(name);
      groups.set(k, g);
    }
    for (const g of groups.values()) {
      const line = g.names.join(' = ');
      const away = sub(g.at, centre);
      const c = placer.place(aroundPoint(g.at, 9, 10, 1, away.x === 0 && away.y === 0 ? { x: 1, y: -1 } : away), [line], 10);
      names.push(label(c.at, [line], { anchor: c.anchor, size: 10, weight: 700, fill: PALETTE.inkSoft, data: { 'data-point': line } }));
    }
  }

  const key: string[] = [];
  const keyParts: string[] = [];
  if ((spec.members ?? []).length) keyParts.push('T tension · C compression');
  if (result.loads.some((l) => l.solved)) keyParts.push('dashed arrow: solved load');
  key.push(el('line', { x1: 10, y1: view.height - KEY_STRIP, x2: view.width - 10, y2: view.height - KEY_STRIP, stroke: PALETTE.paperLine, 'stroke-width': 1 }));
  if (keyParts.length) {
    key.push(el('text', { x: 14, y: view.height - 9, 'font-family': FONT_FAMILY, 'font-size': 9.5, fill: PALETTE.inkSoft }, text(keyParts.join('   ·   '))));
  }
  const bar = scaleBar({ x: view.width - 14 - Math.min(140, view.width / 4), y: view.height - 9 }, view.scale, Math.min(140, view.width / 4), system);

  const words = forcesTextAlternative(spec, result, system);
  return svgDocument({
    width: view.width,
    height: view.height,
    idPrefix: options.idPrefix ?? `pw-${spec.slug}-mechanism`,
    title: options.title ?? `${spec.title}: mechanism drawn to scale`,
    desc: words.lines.join(' '),
    rootAttrs: { 'data-scale': String(view.scale), 'data-drawing': 'mechanism' },
    body: [
      el('rect', { x: 0.5, y: 0.5, width: view.width - 1, height: view.height - 1, rx: 6, fill: PALETTE.paper, stroke: PALETTE.paperLine, 'stroke-width': 1 }),
      el('g', { 'data-layer': 'supports' }, layers.supports),
      el('g', { 'data-layer': 'members' }, layers.members),
      el('g', { 'data-layer': 'parts' }, layers.parts),
      el('g', { 'data-layer': 'pins' }, layers.pins),
      el('g', { 'data-layer': 'dimensions' }, dims),
      el('g', { 'data-layer': 'loads' }, loads),
      el('g', { 'data-layer': 'labels' }, names),
      el('g', { 'data-layer': 'key' }, [...key, bar]),
    ],
  });
}
