/**
 * Dense LU factorisation with partial (row) pivoting, in place on a row-major Float64Array.
 * The statics systems are small (3 equations per part, tens of unknowns), where a plain
 * Doolittle loop on a typed array beats any general matrix library by a wide margin.
 */
export interface LuFactor {
  n: number;
  lu: Float64Array;
  perm: Int32Array;
  /** Smallest and largest |U_kk|: their ratio is a cheap reciprocal-condition estimate. */
  minPivot: number;
  maxPivot: number;
}

/** Factorises `a` (n×n, row-major) in place. Never throws: a zero pivot shows as minPivot 0. */
export function luFactor(a: Float64Array, n: number): LuFactor {
  const perm = new Int32Array(n);
  for (let i = 0; i < n; i++) perm[i] = i;
  let minPivot = Infinity;
  let maxPivot = 0;
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(a[k * n + k]!);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]!);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j]!;
        a[k * n + j] = a[p * n + j]!;
        a[p * n + j] = t;
      }
      const t = perm[k]!;
      perm[k] = perm[p]!;
      perm[p] = t;
    }
    if (best < minPivot) minPivot = best;
    if (best > maxPivot) maxPivot = best;
    if (best === 0) continue;
    const pivot = a[k * n + k]!;
    for (let i = k + 1; i < n; i++) {
      const f = a[i * n + k]! / pivot;
      if (f === 0) continue;
      a[i * n + k] = f;
      for (let j = k + 1; j < n; j++) a[i * n + j] = a[i * n + j]! - f * a[k * n + j]!;
    }
  }
  if (n === 0) minPivot = 0;
  return { n, lu: a, perm, minPivot, maxPivot };
}

/** Solves L U x = P b for x. Call only when every pivot is non-zero. */
export function luSolve(f: LuFactor, b: Float64Array, out = new Float64Array(f.n)): Float64Array {
  const { n, lu, perm } = f;
  for (let i = 0; i < n; i++) {
    let s = b[perm[i]!]!;
    for (let j = 0; j < i; j++) s -= lu[i * n + j]! * out[j]!;
    out[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = out[i]!;
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j]! * out[j]!;
    out[i] = s / lu[i * n + i]!;
  }
  return out;
}
