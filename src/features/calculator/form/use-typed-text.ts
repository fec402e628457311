import { useState } from 'react';
import { formatInputValue } from '../../../lib/units/format-number';

/** Whether what was typed still means the form's current value. */
function stillMeans(typed: string, value: unknown): boolean {
  if (value === undefined) return typed.trim() === '';
  if (typeof value !== 'number') return typed.trim() === String(value);
  const n = Number(typed);
  return typed.trim() !== '' && Number.isFinite(n) && Math.abs(n - value) <= 1e-9 * Math.max(1, Math.abs(value));
}

/**
 * The text in a number field. While what was typed still means the form's value it is kept as
 * typed ("12." or "4000.50"); when the value changes from elsewhere (a slider, a unit switch,
 * a reset) the field shows the new value, rounded for reading.
 */
export function useTypedText(value: unknown): [string, (text: string) => void] {
  const [typed, setTyped] = useState<string | null>(null);
  if (typed !== null && stillMeans(typed, value)) return [typed, setTyped];
  return [typeof value === 'number' ? formatInputValue(value) : String(value ?? ''), setTyped];
}
