import { formatNumber, withUnit } from '../units/format';
import { fromDisplay, unitOf, type UnitSystem } from '../units/unit-systems';
import { FONT_FAMILY, PALETTE } from './palette';
import { el, text } from './svg-markup';
import type { Vec } from './view-transform';

/** The roundest length (1, 2 or 5 × a power of ten, in display units) whose bar is at most `maxWidth` long. */
export function niceLength(scale: number, maxWidth: number, system: UnitSystem): { display: number; mm: number } {
  const maxDisplay = maxWidth / scale / fromDisplay(1, 'length', system);
  const p = Math.pow(10, Math.floor(Math.log10(maxDisplay)));
  const display = [5, 2, 1].map((k) => k * p).find((v) => v <= maxDisplay) ?? p;
  return { display, mm: fromDisplay(display, 'length', system) };
}

/** A scale bar, alternately filled in halves, with its length: the drawing is to scale, and says so. */
export function scaleBar(at: Vec, scale: number, maxWidth: number, system: UnitSystem): string {
  const { display, mm } = niceLength(scale, maxWidth, system);
  const w = mm * scale;
  return el('g', { 'data-scale-bar': withUnit(formatNumber(display), unitOf('length', system)) }, [
    el('rect', { x: at.x, y: at.y, width: w / 2, height: 4, fill: PALETTE.ink }),
    el('rect', { x: at.x + w / 2, y: at.y, width: w / 2, height: 4, fill: PALETTE.paper, stroke: PALETTE.ink, 'stroke-width': 0.8 }),
    el('rect', { x: at.x, y: at.y, width: w, height: 4, fill: 'none', stroke: PALETTE.ink, 'stroke-width': 0.8 }),
    el('text', { x: at.x + w, y: at.y - 4, 'text-anchor': 'end', 'font-family': FONT_FAMILY, 'font-size': 9.5, fill: PALETTE.inkSoft }, text(withUnit(formatNumber(display), unitOf('length', system)))),
    el('text', { x: at.x, y: at.y - 4, 'text-anchor': 'start', 'font-family': FONT_FAMILY, 'font-size': 9.5, fill: PALETTE.inkSoft }, text('0')),
  ]);
}
