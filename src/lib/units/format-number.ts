/** An input value as it is typed back into a field: no grouping, up to six significant figures. */
export function formatInputValue(value: number): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return '0';
  return String(Number(value.toPrecision(6)));
}

/** A value for a machine-readable place (a URL, a CSV cell): exact enough, without float noise. */
export function formatPlain(value: number): string {
  return String(Number(value.toPrecision(12)));
}

/** A small relative residual in words: 3e-16 rather than 0.0000000000000003. */
export function formatTiny(value: number): string {
  if (!Number.isFinite(value)) return 'not finite';
  if (value === 0) return '0';
  return value.toExponential(0).replace('e+', 'e');
}
