/**
 * The baseline: a textbook LU with partial pivoting on a Float64Array, written plainly and
 * separately from the engine's, so the benchmark can say how close the engine's solve is.
 */
export function plainLuSolve(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(m[i * n + k]!) > Math.abs(m[p * n + k]!)) p = i;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = m[k * n + j]!;
        m[k * n + j] = m[p * n + j]!;
        m[p * n + j] = t;
      }
      const t = x[k]!;
      x[k] = x[p]!;
      x[p] = t;
    }
    for (let i = k + 1; i < n; i++) {
      const f = m[i * n + k]! / m[k * n + k]!;
      for (let j = k; j < n; j++) m[i * n + j] = m[i * n + j]! - f * m[k * n + j]!;
      x[i] = x[i]! - f * x[k]!;
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i]!;
    for (let j = i + 1; j < n; j++) s -= m[i * n + j]! * x[j]!;
    x[i] = s / m[i * n + i]!;
  }
  return x;
}
