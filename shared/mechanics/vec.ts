/** Length of (x, y). Math.hypot guards against overflow we never meet and is several times slower. */
export function len(x: number, y: number): number {
  return Math.sqrt(x * x + y * y);
}
