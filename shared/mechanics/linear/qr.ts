/**
 * Householder QR with column pivoting (Businger–Golub 1965; Golub & Van Loan, Matrix
 * Computations, 4th ed., §5.4.2). Used only off the fast path, to explain a system that LU
 * found singular or that is not square: its rank, the redundant unknowns (null space of A)
 * and the free motions (null space of Aᵀ).
 */
export interface PivotedQr {
  m: number;
  n: number;
  /** R above the diagonal, Householder vectors below it (row-major m×n). */
  qr: Float64Array;
  tau: Float64Array;
  /** Column j of Q R is column perm[j] of A. */
  perm: Int32Array;
  rank: number;
  /** |R_jj| in order; the rank is the count above tol × |R_00|. */
  diag: Float64Array;
}

export function pivotedQr(source: Float64Array, m: number, n: number, relTol = 1e-10): PivotedQr {
  const a = Float64Array.from(source);
  const perm = new Int32Array(n);
  for (let j = 0; j < n; j++) perm[j] = j;
  const k = Math.min(m, n);
  const tau = new Float64Array(k);
  const diag = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    // Pivot on the remaining column of largest norm (recomputed: the systems are small).
    let p = j;
    let best = -1;
    for (let c = j; c < n; c++) {
      let s = 0;
      for (let i = j; i < m; i++) s += a[i * n + c]! ** 2;
      if (s > best) {
        best = s;
        p = c;
      }
    }
    if (p !== j) {
      for (let i = 0; i < m; i++) {
        const t = a[i * n + j]!;
        a[i * n + j] = a[i * n + p]!;
        a[i * n + p] = t;
      }
      const t = perm[j]!;
      perm[j] = perm[p]!;
      perm[p] = t;
    }
    const norm = Math.sqrt(best);
    if (norm === 0) {
      tau[j] = 0;
      diag[j] = 0;
      continue;
    }
    const ajj = a[j * n + j]!;
    const beta = ajj >= 0 ? -norm : norm;
    tau[j] = (beta - ajj) / beta;
    const scale = 1 / (ajj - beta);
    for (let i = j + 1; i < m; i++) a[i * n + j] = a[i * n + j]! * scale;
    a[j * n + j] = beta;
    diag[j] = Math.abs(beta);
    for (let c = j + 1; c < n; c++) {
      let w = a[j * n + c]!;
      for (let i = j + 1; i < m; i++) w += a[i * n + j]! * a[i * n + c]!;
      w *= tau[j]!;
      a[j * n + c] = a[j * n + c]! - w;
      for (let i = j + 1; i < m; i++) a[i * n + c] = a[i * n + c]! - w * a[i * n + j]!;
    }
  }
  const top = k > 0 ? diag[0]! : 0;
  let rank = 0;
  while (rank < k && diag[rank]! > relTol * top && top > 0) rank++;
  return { m, n, qr: a, tau, perm, rank, diag };
}

/** A basis (not orthonormalised; each vector of unit length) of { x : A x = 0 }. */
export function nullSpace(f: PivotedQr): Float64Array[] {
  const { n, qr, perm, rank } = f;
  const basis: Float64Array[] = [];
  for (let free = rank; free < n; free++) {
    const z = new Float64Array(n);
    z[free] = 1;
    for (let i = rank - 1; i >= 0; i--) {
      let s = -qr[i * n + free]!;
      for (let j = i + 1; j < rank; j++) s -= qr[i * n + j]! * z[j]!;
      z[i] = s / qr[i * n + i]!;
    }
    const x = new Float64Array(n);
    let norm = 0;
    for (let i = 0; i < n; i++) {
      x[perm[i]!] = z[i]!;
      norm += z[i]! ** 2;
    }
    norm = Math.sqrt(norm);
    for (let i = 0; i < n; i++) x[i] = x[i]! / norm;
    basis.push(x);
  }
  return basis;
}

/** Least-squares solution for a full-column-rank factor; also returns the residual norm. */
export function leastSquares(f: PivotedQr, b: Float64Array): { x: Float64Array; residual: number } {
  const { m, n, qr, tau, perm, rank } = f;
  const y = Float64Array.from(b);
  for (let j = 0; j < Math.min(m, n); j++) {
    if (tau[j] === 0) continue;
    let w = y[j]!;
    for (let i = j + 1; i < m; i++) w += qr[i * n + j]! * y[i]!;
    w *= tau[j]!;
    y[j] = y[j]! - w;
    for (let i = j + 1; i < m; i++) y[i] = y[i]! - w * qr[i * n + j]!;
  }
  const z = new Float64Array(n);
  for (let i = rank - 1; i >= 0; i--) {
    let s = y[i]!;
    for (let j = i + 1; j < rank; j++) s -= qr[i * n + j]! * z[j]!;
    z[i] = s / qr[i * n + i]!;
  }
  let residual = 0;
  for (let i = rank; i < m; i++) residual += y[i]! ** 2;
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[perm[i]!] = z[i]!;
  return { x, residual: Math.sqrt(residual) };
}

export function transpose(a: Float64Array, m: number, n: number): Float64Array {
  const t = new Float64Array(m * n);
  for (let i = 0; i < m; i++) for (let j = 0; j < n; j++) t[j * m + i] = a[i * n + j]!;
  return t;
}
