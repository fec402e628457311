import type { SolveResult } from '../mechanics/solve-result';
import { aroundPoint, type LabelPlacer } from './label-placer';
import { PALETTE } from './palette';
import { forceText, momentText, STATE_LETTER, turnWord } from './force-words';
import { groundAttachments, jointNormal, loadDirection, partCentroid, partOutline, type DrawingSpec } from './spec-geometry';
import { el, text } from './svg-markup';
import {
  arrow, contactMark, contactPad, coupleArrow, label, memberBar, partShape, pinMark, pinnedSupport, rollerSupport, stateBadge,
} from './symbols';
import type { UnitSystem } from '../units/unit-systems';
import { add, centroid, dot, sub, times, type Vec, type View } from './view-transform';

/** Sizes of one way of drawing the mechanism: the full drawing or the library card. */
export interface SceneStyle {
  partWidth: number;
  memberWidth: number;
  pinRadius: number;
  supportSize: number;
  loadArrow: number;
  arrowWidth: number;
  labels: boolean;
  badges: boolean;
}

export const screenDir = (v: Vec): Vec => ({ x: v.x, y: -v.y });

/**
 * Where an arrow of screen length `len` goes at `p` (screen) along `d` (screen, unit): out of
 * the drawing rather than across it, so its tail sits at the point when the force points away
 * from `centre` (a pull) and its tip sits at the point when it points towards it (a push).
 */
export function arrowEnds(p: Vec, d: Vec, len: number, centre: Vec): { tail: Vec; tip: Vec; free: Vec } {
  const outward = dot(d, sub(p, centre)) >= -1e-9;
  return outward ? { tail: p, tip: add(p, times(d, len)), free: add(p, times(d, len)) } : { tail: sub(p, times(d, len)), tip: p, free: sub(p, times(d, len)) };
}

export interface SceneLayers {
  supports: string[];
  members: string[];
  parts: string[];
  pins: string[];
  /** Loads are finished last, so their labels can keep clear of everything else drawn. */
  finishLoads(placer?: LabelPlacer): string[];
}

interface PendingLoad {
  data: Record<string, string | undefined>;
  children: string[];
  label?: { near: Vec; prefer: Vec; lines: string[] };
}

/** Parts, members, pins, supports and loads of a solved mechanism, placed by `view`. */
export function drawMechanism(spec: DrawingSpec, result: SolveResult, view: View, style: SceneStyle, system: UnitSystem, placer?: LabelPlacer): SceneLayers {
  const P = (name: string) => {
    const p = result.points[name];
    return p ? view.toSvg(p) : undefined;
  };
  const centre = view.toSvg(centroid(Object.values(result.points)));
  const pending: PendingLoad[] = [];
  const layers: SceneLayers = {
    supports: [], members: [], parts: [], pins: [],
    finishLoads: (p) =>
      pending.map((l) => {
        const children = [...l.children];
        if (l.label && p) {
          const size = 10.5;
          const c = p.place(aroundPoint(l.label.near, 6, size, l.label.lines.length, l.label.prefer), l.label.lines, size);
          children.push(label(c.at, l.label.lines, { anchor: c.anchor, fill: PALETTE.signalStrong, size, weight: 600 }));
        }
        return el('g', l.data, children);
      }),
  };

  for (const g of groundAttachments(spec, result)) {
    const at = P(g.point)!;
    const side = screenDir(g.groundSide);
    const data = { 'data-support': g.id, 'data-support-kind': g.kind };
    const draw = g.kind === 'pin' ? pinnedSupport : g.kind === 'roller' ? rollerSupport : contactPad;
    layers.supports.push(draw(at, side, data, style.supportSize));
    placer?.addCircle(add(at, times(side, 12 * style.supportSize)), 18 * style.supportSize);
  }

  for (const m of spec.members ?? []) {
    const a = P(m.ends[0]);
    const b = P(m.ends[1]);
    if (!a || !b) continue;
    const solved = result.members.find((x) => x.id === m.id);
    const state = solved?.state ?? 'unloaded';
    const children = [
      el('title', {}, text(`${m.label}: ${state === 'unloaded' ? 'unloaded' : `${forceText(solved!.axial, system)} ${state}`}`)),
      memberBar(a, b, style.memberWidth),
    ];
    if (style.badges) children.push(stateBadge(times(add(a, b), 0.5), STATE_LETTER[state]));
    layers.members.push(el('g', { 'data-member': m.id, 'data-state': state }, children));
    placer?.addSegment(a, b, style.memberWidth + 3);
    if (style.badges) placer?.addCircle(times(add(a, b), 0.5), 8);
    for (const [i, end] of [a, b].entries()) {
      layers.pins.push(pinMark(end, { 'data-member-end': `${m.id}:${m.ends[i]}` }, style.pinRadius * 0.85));
    }
  }

  for (const part of spec.parts) {
    const outline = partOutline(spec, result, part.id).map(view.toSvg);
    if (!outline.length) continue;
    layers.parts.push(el('g', { 'data-part': part.id }, [el('title', {}, text(part.label)), partShape(outline, style.partWidth)]));
    const ring = outline.length > 2 ? [...outline, outline[0]!] : outline;
    for (let i = 1; i < ring.length; i++) placer?.addSegment(ring[i - 1]!, ring[i]!, style.partWidth + 4);
    if (outline.length === 1) placer?.addCircle(outline[0]!, style.partWidth);
  }

  for (const j of spec.joints ?? []) {
    const at = P(j.at);
    if (!at) continue;
    const data = { 'data-joint': j.id, 'data-joint-kind': j.kind };
    placer?.addCircle(at, style.pinRadius + 1);
    if (j.kind === 'contact' && !j.between.includes('ground')) {
      const n = jointNormal(j, result);
      layers.pins.push(contactMark(at, n ? screenDir(n) : { x: 0, y: 1 }, data));
    } else if (j.kind === 'contact') {
      layers.pins.push(el('g', data, [el('circle', { cx: at.x, cy: at.y, r: style.pinRadius * 0.6, fill: PALETTE.inkStrong })]));
    } else {
      layers.pins.push(pinMark(at, data, style.pinRadius));
    }
  }

  for (const l of spec.loads) {
    const solved = result.loads.find((x) => x.id === l.id);
    if (!solved) continue;
    const unknown = solved.solved;
    const words = unknown ? 'solved' : 'given';
    if (l.kind === 'couple') {
      const c = partCentroid(spec, result, l.on);
      if (!c) continue;
      const at = view.toSvg(c);
      const r = style.loadArrow * 0.36;
      const children = [
        el('title', {}, text(`${l.label}: ${momentText(solved.magnitude, system)} ${turnWord(solved.magnitude)} (${words})`)),
        coupleArrow(at, r, solved.magnitude >= 0, { dashed: unknown, width: style.arrowWidth, head: style.loadArrow * 0.22 }),
      ];
      placer?.addCircle(at, r + 3);
      pending.push({
        data: { 'data-load': l.id, 'data-solved': unknown ? 'true' : undefined },
        children,
        label: style.labels ? { near: at, prefer: { x: 1, y: -1 }, lines: [l.label, `${momentText(solved.magnitude, system)} ${turnWord(solved.magnitude)}${unknown ? ' (solved)' : ''}`] } : undefined,
      });
      continue;
    }
    const at = l.at ? P(l.at) : undefined;
    const dir = loadDirection(spec, result, l.id);
    if (!at || !dir) continue;
    const d = screenDir(dir);
    const ends = arrowEnds(at, d, style.loadArrow, centre);
    const magnitude = forceText(Math.hypot(solved.fx, solved.fy), system);
    const children = [
      el('title', {}, text(`${l.label}: ${magnitude} (${words})`)),
      arrow(ends.tail, ends.tip, { dashed: unknown, width: style.arrowWidth, head: Math.min(11, style.loadArrow * 0.3) }),
    ];
    placer?.addSegment(ends.tail, ends.tip, 4);
    pending.push({
      data: { 'data-load': l.id, 'data-solved': unknown ? 'true' : undefined },
      children,
      label: style.labels ? { near: ends.free, prefer: sub(ends.free, at), lines: [l.label, unknown ? `${magnitude} (solved)` : magnitude] } : undefined,
    });
  }
  return layers;
}
