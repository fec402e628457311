import type { Quantity } from './quantities';
import { toDisplay, unitOf, type UnitSystem } from './unit-systems';

/**
 * Numbers as an engineer reads them on a sheet: a few significant figures (the inputs are
 * rarely known better), trailing zeros dropped, thousands grouped by a thin space once the
 * whole part has five digits or more (SI brochure 5.4.4: a space, never a comma or point, so
 * the grouping cannot be mistaken for a decimal sign), and a true minus sign.
 */
export const THIN_SPACE = '\u202f'; // narrow no-break space: thin, and never breaks a number across lines
export const MINUS = '\u2212';

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
};

export interface FormatOptions {
  /** Significant figures, 1–10; 4 unless told. */
  significant?: number;
}

export function formatNumber(value: number, options: FormatOptions = {}): string {
  if (Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : `${MINUS}∞`;
  const sig = Math.min(10, Math.max(1, Math.round(options.significant ?? 4)));
  const rounded = Number(value.toPrecision(sig));
  if (rounded === 0) return '0';
  const negative = rounded < 0;
  const abs = Math.abs(rounded);
  const exponent = Math.floor(Math.log10(abs));
  let body: string;
  if (exponent >= 9 || exponent <= -5) {
    const [mantissa, exp] = abs.toExponential(sig - 1).split('e') as [string, string];
    const m = stripZeros(mantissa);
    const e = String(Number(exp)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
    body = `${m}×10${e}`;
  } else {
    const decimals = Math.max(0, sig - 1 - exponent);
    const [whole, frac] = abs.toFixed(decimals).split('.') as [string, string | undefined];
    const fracPart = frac ? stripZeros(`0.${frac}`).slice(1) : '';
    body = groupThousands(whole) + fracPart;
  }
  return negative ? MINUS + body : body;
}

function stripZeros(s: string): string {
  return s.includes('.') ? s.replace(/0+$/, '').replace(/\.$/, '') : s;
}

function groupThousands(whole: string): string {
  if (whole.length < 5) return whole;
  return whole.replace(/\B(?=(\d{3})+(?!\d))/g, THIN_SPACE);
}

/** Value and unit symbol: "51 670 N", "4000 mm", "100 %", "12°". */
export function withUnit(display: string, unit: string): string {
  if (!unit) return display;
  return unit === '°' ? `${display}°` : `${display} ${unit}`;
}

/** An internal (SI-mm) value converted to the chosen system and formatted with its unit. */
export function formatQuantity(value: number, quantity: Quantity, system: UnitSystem, options: FormatOptions = {}): string {
  return withUnit(formatNumber(toDisplay(value, quantity, system), options), unitOf(quantity, system));
}
