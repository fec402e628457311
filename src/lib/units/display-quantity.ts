import type { Quantity } from '../../../shared/units/quantities';
import { fromDisplay, toDisplay, unitOf, type UnitSystem } from '../../../shared/units/unit-systems';

export interface InputBounds {
  quantity: Quantity;
  min: number;
  max: number;
  step?: number | undefined;
}

/** Bounds and step of an input in the chosen system; the step is rounded to a 1-2-5 value. */
export function displayBounds(input: InputBounds, system: UnitSystem) {
  const min = toDisplay(input.min, input.quantity, system);
  const max = toDisplay(input.max, input.quantity, system);
  const rawStep = input.step === undefined ? (max - min) / 100 : toDisplay(input.step, input.quantity, system);
  return { min, max, step: niceStep(rawStep), unit: unitOf(input.quantity, system) };
}

function niceStep(step: number): number {
  if (!(step > 0) || !Number.isFinite(step)) return 1;
  const power = 10 ** Math.floor(Math.log10(step));
  const scaled = step / power;
  const nice = scaled < 1.5 ? 1 : scaled < 3.5 ? 2 : scaled < 7.5 ? 5 : 10;
  return Number((nice * power).toPrecision(6));
}

/**
 * A displayed value back in engine units. A value within a billionth of a bound is put on the
 * bound: the largest value a US slider offers (12000 mm shown as 472.44… in) must not come
 * back as 12000.000000000002 and fail the range check it was drawn from.
 */
export function engineValue(display: number, input: InputBounds, system: UnitSystem): number {
  const value = fromDisplay(display, input.quantity, system);
  const tolerance = 1e-9 * Math.max(Math.abs(input.min), Math.abs(input.max), 1);
  if (Math.abs(value - input.min) <= tolerance) return input.min;
  if (Math.abs(value - input.max) <= tolerance) return input.max;
  return value;
}
