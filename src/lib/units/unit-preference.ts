import type { UnitSystem } from '../../../shared/units/unit-systems';

const STORAGE_KEY = 'pinwork.units';

export function isUnitSystem(value: unknown): value is UnitSystem {
  return value === 'SI' || value === 'US';
}

/** The visitor's remembered unit system; SI when nothing (or nothing readable) is stored. */
export function storedUnitSystem(): UnitSystem {
  try {
    const value = window.localStorage.getItem(STORAGE_KEY);
    return isUnitSystem(value) ? value : 'SI';
  } catch {
    // Storage can be switched off (private modes, embedded frames): fall back quietly.
    return 'SI';
  }
}

export function rememberUnitSystem(system: UnitSystem): void {
  try {
    window.localStorage.setItem(STORAGE_KEY, system);
  } catch {
    // Not remembered, but the URL still carries the choice.
  }
}
