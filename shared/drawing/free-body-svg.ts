import type { SolveResult } from '../mechanics/solve-result';
import { formatNumber, withUnit } from '../units/format';
import { fromDisplay, toDisplay, unitOf, type UnitSystem } from '../units/unit-systems';
import { commonForceScale, LONGEST_ARROW } from './force-scale';
import { forceText, momentText, turnWord } from './force-words';
import { aroundPoint, LabelPlacer } from './label-placer';
import { arrowEnds, screenDir } from './mechanism-scene';
import { FONT_FAMILY, PALETTE } from './palette';
import { partOutline, type DrawingSpec } from './spec-geometry';
import { el, svgDocument, text } from './svg-markup';
import { arrow, coupleArrow, label, partShape, pinMark } from './symbols';
import { add, centroid, fitView, sub, times, unit, type Vec } from './view-transform';

export interface FreeBodySvgOptions {
  unitSystem: UnitSystem;
  width?: number;
  height?: number;
  /** Drawing units per newton; the result's common scale (commonForceScale) unless told. */
  forceScale?: number;
  title?: string;
  idPrefix?: string;
}

/**
 * One part cut free, with every force on it as an arrow to the common force scale, each
 * labelled with its magnitude; a member's pull or push is labelled tension or compression
 * and drawn as one (a tension member pulls away from the part, a compression member pushes
 * on it). Couples are curved arrows with their moment.
 */
export function freeBodySvg(spec: DrawingSpec, result: SolveResult, partId: string, options: FreeBodySvgOptions): string {
  const body = result.freeBodies.find((b) => b.part === partId);
  if (!body) throw new Error(`no free body for part "${partId}" in this result`);
  const system = options.unitSystem;
  const width = options.width ?? 480;
  const height = options.height ?? 360;
  const forceScale = options.forceScale ?? commonForceScale(result);
  const longest = Math.max(0, ...body.forces.map((f) => f.magnitude * forceScale), LONGEST_ARROW * 0.5);

  const outlineModel = partOutline(spec, result, partId);
  const geometry = [...outlineModel, ...body.forces.map((f) => ({ x: f.x, y: f.y }))];
  const pad = Math.min(longest + 30, Math.min(width, height) * 0.4);
  const view = fitView(geometry, width, height - 26, pad);
  const outline = outlineModel.map(view.toSvg);
  const centre = view.toSvg(centroid(outlineModel.length ? outlineModel : geometry));
  const placer = new LabelPlacer({ x0: 6, y0: 6, x1: width - 6, y1: height - 30 });

  const shapes: string[] = [];
  if (outline.length) {
    shapes.push(el('g', { 'data-part': partId }, [el('title', {}, text(body.label)), partShape(outline, 12)]));
    const ring = outline.length > 2 ? [...outline, outline[0]!] : outline;
    for (let i = 1; i < ring.length; i++) placer.addSegment(ring[i - 1]!, ring[i]!, 16);
  }
  const pinned = new Set<string>();
  for (const f of body.forces) {
    if (f.source === 'load' || pinned.has(f.at)) continue;
    pinned.add(f.at);
    const at = view.toSvg({ x: f.x, y: f.y });
    shapes.push(pinMark(at, { 'data-cut': f.at }, 4.6));
    placer.addCircle(at, 6);
  }

  const arrows: { data: Record<string, string>; arrow: string; near: Vec; prefer: Vec; lines: string[] }[] = [];
  body.forces.forEach((f, i) => {
    const at = view.toSvg({ x: f.x, y: f.y });
    const member = f.source === 'member' ? result.members.find((m) => m.id === f.id) : undefined;
    const state = member?.state;
    const valueLine = `${forceText(f.magnitude, system)}${state && state !== 'unloaded' ? ` ${state}` : ''}${f.source === 'load' && result.loads.find((l) => l.id === f.id)?.solved ? ' (solved)' : ''}`;
    const len = f.magnitude * forceScale;
    const d = unit(screenDir({ x: f.fx, y: f.fy }));
    const data = { 'data-force': `${f.source}:${f.id}:${i}`, 'data-magnitude': String(f.magnitude) };
    if (len <= 0 || (d.x === 0 && d.y === 0)) {
      arrows.push({ data, arrow: '', near: at, prefer: sub(at, centre), lines: [f.label, valueLine] });
      return;
    }
    // A tension member pulls the part towards the member's far end: the arrow starts at the pin.
    const ends =
      state === 'tension' ? { tail: at, tip: add(at, times(d, len)), free: add(at, times(d, len)) }
      : state === 'compression' ? { tail: sub(at, times(d, len)), tip: at, free: sub(at, times(d, len)) }
      : arrowEnds(at, d, len, centre);
    placer.addSegment(ends.tail, ends.tip, 4);
    arrows.push({
      data,
      arrow: arrow(ends.tail, ends.tip, { width: 2.4, dashed: f.source === 'load' && result.loads.find((l) => l.id === f.id)?.solved === true }),
      near: ends.free,
      prefer: sub(ends.free, at),
      lines: [f.label, valueLine],
    });
  });

  const couples = body.couples.map((c, i) => {
    const r = 22 + 8 * i;
    placer.addCircle(centre, r + 4);
    const lines = [c.label, `${momentText(c.moment, system)} ${turnWord(c.moment)}`];
    const spot = placer.place(aroundPoint(centre, r + 8, 10.5, 2, { x: 1, y: -1 }), lines, 10.5);
    return el('g', { 'data-couple': c.id, 'data-moment': String(c.moment) }, [
      coupleArrow(centre, r, c.moment >= 0, { width: 2.2 }),
      label(spot.at, lines, { anchor: spot.anchor, size: 10.5, weight: 600, fill: PALETTE.signalStrong }),
    ]);
  });

  const forces = arrows.map((a) => {
    const spot = placer.place(aroundPoint(a.near, 6, 10.5, 2, a.prefer), a.lines, 10.5);
    return el('g', a.data, [a.arrow, label(spot.at, a.lines, { anchor: spot.anchor, size: 10.5, weight: 600, fill: PALETTE.signalStrong })]);
  });

  const description =
    `Free body of ${body.label}. ` +
    body.forces.map((f) => `${f.label}: ${forceText(f.magnitude, system)}`).join('; ') +
    (body.couples.length ? `; ${body.couples.map((c) => `${c.label}: ${momentText(c.moment, system)} ${turnWord(c.moment)}`).join('; ')}` : '') +
    '. Arrows share one force scale across all parts.';

  return svgDocument({
    width,
    height,
    idPrefix: options.idPrefix ?? `pw-${spec.slug}-fb-${partId}`,
    title: options.title ?? `Free body of ${body.label}`,
    desc: description,
    rootAttrs: { 'data-drawing': 'free-body', 'data-part': partId, 'data-scale': String(view.scale), 'data-force-scale': String(forceScale) },
    body: [
      el('rect', { x: 0.5, y: 0.5, width: width - 1, height: height - 1, rx: 6, fill: PALETTE.paper, stroke: PALETTE.paperLine, 'stroke-width': 1 }),
      el('g', { 'data-layer': 'part' }, shapes),
      el('g', { 'data-layer': 'couples' }, couples),
      el('g', { 'data-layer': 'forces' }, forces),
      el('g', { 'data-layer': 'key' }, forceKey(width, height, forceScale, system, body.forces.some((f) => f.source === 'load' && result.loads.find((l) => l.id === f.id)?.solved === true))),
    ],
  });
}

/** A reference arrow of a round force, so the common scale can be read off the sheet. */
function forceKey(width: number, height: number, forceScale: number, system: UnitSystem, solvedLoads: boolean): string[] {
  const out = [el('line', { x1: 10, y1: height - 26, x2: width - 10, y2: height - 26, stroke: PALETTE.paperLine, 'stroke-width': 1 })];
  if (forceScale <= 0) return out;
  const maxLen = 80;
  const maxDisplay = toDisplay(maxLen / forceScale, 'force', system);
  const p = Math.pow(10, Math.floor(Math.log10(maxDisplay)));
  const display = [5, 2, 1].map((k) => k * p).find((v) => v <= maxDisplay) ?? p;
  const len = fromDisplay(display, 'force', system) * forceScale;
  const y = height - 12;
  const x = width - 14 - len;
  out.push(
    arrow({ x, y }, { x: x + len, y }, { colour: PALETTE.ink, width: 1.4, head: 7, data: { 'data-force-key': String(display) } }),
    el('text', { x: x - 6, y: y + 3.5, 'text-anchor': 'end', 'font-family': FONT_FAMILY, 'font-size': 9.5, fill: PALETTE.inkSoft }, text(`force scale ${withUnit(formatNumber(display), unitOf('force', system))}`)),
  );
  if (solvedLoads) out.push(el('text', { x: 14, y: y + 3.5, 'font-family': FONT_FAMILY, 'font-size': 9.5, fill: PALETTE.inkSoft }, text('dashed arrow: solved load')));
  return out;
}
