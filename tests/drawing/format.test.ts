import { describe, expect, it } from 'vitest';
import { formatNumber, formatQuantity, MINUS, THIN_SPACE } from '../../shared/units/format';

// Expectations follow the rule written in shared/units/format.ts: four significant figures,
// trailing zeros dropped, a thin space between thousands from five digits up, a true minus.
describe('formatNumber', () => {
  it.each([
    [51669.3, `51${THIN_SPACE}670`],
    [19613.3, `19${THIN_SPACE}610`],
    [1961.33, '1961'],
    [425.346, '425.3'],
    [75, '75'],
    [0.5, '0.5'],
    [0.012345, '0.01235'],
    [1234567, `1${THIN_SPACE}235${THIN_SPACE}000`],
    [-48379.47, `${MINUS}48${THIN_SPACE}380`],
    [1.2e-12, `1.2×10⁻¹²`],
    [0, '0'],
    [-0, '0'],
  ])('%s → %s', (v, s) => {
    expect(formatNumber(v)).toBe(s);
  });

  it('takes the number of significant figures and names non-numbers', () => {
    expect(formatNumber(3.14159, { significant: 3 })).toBe('3.14');
    expect(formatNumber(Number.NaN)).toBe('—');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('∞');
  });

  it('converts before formatting', () => {
    expect(formatQuantity(4000, 'length', 'SI')).toBe('4000 mm');
    expect(formatQuantity(254, 'length', 'US')).toBe('10 in'); // 25.4 mm to the inch, exact
    expect(formatQuantity(4.4482216152605 * 1000, 'force', 'US')).toBe('1000 lbf');
    expect(formatQuantity(30, 'angle', 'SI')).toBe('30°');
    expect(formatQuantity(87.5, 'percent', 'SI')).toBe('87.5 %');
  });
});
