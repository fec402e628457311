import type { SolveResult } from '../mechanics/solve-result';
import { drawMechanism, type SceneStyle } from './mechanism-scene';
import { PALETTE } from './palette';
import { allPoints, type DrawingSpec } from './spec-geometry';
import { el, svgDocument } from './svg-markup';
import { fitView } from './view-transform';

const STYLE: SceneStyle = { partWidth: 7, memberWidth: 2.6, pinRadius: 3, supportSize: 0.6, loadArrow: 24, arrowWidth: 1.8, labels: false, badges: false };
export const THUMBNAIL_SIZE = { width: 240, height: 160 } as const;

/** The mechanism small and plain for a library card: shapes only, no words, still to scale. */
export function thumbnailSvg(spec: DrawingSpec, result: SolveResult, options: { idPrefix?: string } = {}): string {
  const { width, height } = THUMBNAIL_SIZE;
  const view = fitView(allPoints(result), width, height, { top: 26, right: 30, bottom: 30, left: 30 });
  const layers = drawMechanism(spec, result, view, STYLE, 'SI');
  return svgDocument({
    width,
    height,
    idPrefix: options.idPrefix ?? `pw-${spec.slug}-thumb`,
    title: `${spec.title}: sketch`,
    desc: `A small sketch of the ${spec.title.toLowerCase()} at its default size: ${spec.parts.map((p) => p.label).join(', ')}.`,
    rootAttrs: { 'data-drawing': 'thumbnail', 'data-scale': String(view.scale) },
    body: [
      el('rect', { x: 0, y: 0, width, height, fill: PALETTE.paper }),
      el('g', {}, layers.supports),
      el('g', {}, layers.members),
      el('g', {}, layers.parts),
      el('g', {}, layers.pins),
      el('g', {}, layers.finishLoads()),
    ],
  });
}
