import type { Quantity } from './quantities';

export type UnitSystem = 'SI' | 'US';

interface UnitDef {
  /** Symbol shown beside the number. */
  unit: string;
  /** Displayed value = internal value × factor. */
  factor: number;
}

// Exact conversion factors: 1 in = 25.4 mm (exact by definition, 1959 international yard);
// 1 lb = 0.45359237 kg (exact, same agreement); 1 lbf = 0.45359237 kg × 9.80665 m/s²
// = 4.4482216152605 N (standard gravity, CGPM 1901). NIST SP 811 (2008), appendix B.
const MM_PER_IN = 25.4;
const KG_PER_LB = 0.45359237;
const N_PER_LBF = KG_PER_LB * 9.80665;
const MPA_PER_PSI = N_PER_LBF / (MM_PER_IN * MM_PER_IN);

const SI: Record<Quantity, UnitDef> = {
  length: { unit: 'mm', factor: 1 },
  force: { unit: 'N', factor: 1 },
  mass: { unit: 'kg', factor: 1 },
  angle: { unit: '°', factor: 1 },
  moment: { unit: 'N·mm', factor: 1 },
  stress: { unit: 'MPa', factor: 1 },
  ratio: { unit: '', factor: 1 },
  coefficient: { unit: '', factor: 1 },
  percent: { unit: '%', factor: 1 },
  count: { unit: '', factor: 1 },
};

const US: Record<Quantity, UnitDef> = {
  ...SI,
  length: { unit: 'in', factor: 1 / MM_PER_IN },
  force: { unit: 'lbf', factor: 1 / N_PER_LBF },
  mass: { unit: 'lb', factor: 1 / KG_PER_LB },
  moment: { unit: 'lbf·in', factor: 1 / (N_PER_LBF * MM_PER_IN) },
  stress: { unit: 'psi', factor: 1 / MPA_PER_PSI },
};

export const UNIT_TABLE: Record<UnitSystem, Record<Quantity, UnitDef>> = { SI, US };

export function unitOf(quantity: Quantity, system: UnitSystem): string {
  return UNIT_TABLE[system][quantity].unit;
}

/** Internal (SI-mm) value → value in the chosen system. */
export function toDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  const { factor } = UNIT_TABLE[system][quantity];
  if (factor === 1) return value;
  // 15 significant digits: what a double holds for certain. Without it an input sent as 59 in
  // comes back from the round trip through mm as 58.99999999999999.
  return Number((value * factor).toPrecision(15));
}

/** Value in the chosen system → internal (SI-mm) value. */
export function fromDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  return value / UNIT_TABLE[system][quantity].factor;
}

export const STANDARD_GRAVITY = 9.80665; // m/s², CGPM 1901 (exact by definition)
