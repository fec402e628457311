import type { SolveResult } from '../mechanics/solve-result';
import { formatNumber, formatQuantity } from '../units/format';
import type { UnitSystem } from '../units/unit-systems';
import type { DrawingSpec } from './spec-geometry';

/** Words and numbers shared by the drawings' labels and their text alternative. */

export const forceText = (newtons: number, system: UnitSystem) => formatQuantity(Math.abs(newtons), 'force', system);
export const momentText = (nmm: number, system: UnitSystem) => formatQuantity(Math.abs(nmm), 'moment', system);

export type MemberState = SolveResult['members'][number]['state'];
export const STATE_LETTER: Record<MemberState, string> = { tension: 'T', compression: 'C', unloaded: '0' };

export function partName(spec: DrawingSpec, id: string): string {
  if (id === 'ground') return 'ground';
  return spec.parts.find((p) => p.id === id)?.label ?? id;
}

const SECTORS = ['right', 'up and right', 'up', 'up and left', 'left', 'down and left', 'down', 'down and right'];

/** A direction (model, y up) as an angle from +x and in words. */
export function directionWords(fx: number, fy: number): string {
  if (fx === 0 && fy === 0) return 'no direction';
  const deg = (Math.atan2(fy, fx) * 180) / Math.PI;
  const sector = SECTORS[((Math.round(deg / 45) % 8) + 8) % 8]!;
  return `pointing ${sector} (${formatNumber(deg, { significant: 3 })}° from +x)`;
}

export const turnWord = (moment: number) => (moment >= 0 ? 'anticlockwise' : 'clockwise');
