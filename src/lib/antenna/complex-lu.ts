/**
 * Dense complex LU factorisation with partial pivoting (Doolittle, row
 * interchanges), on interleaved Float64Arrays: element (i, j) of an n×n matrix
 * is at 2·(i·n + j) (real part) and 2·(i·n + j) + 1 (imaginary part).
 */

export interface ComplexLU {
  n: number;
  /** L (unit diagonal, below) and U (on and above the diagonal), interleaved, row-major. */
  lu: Float64Array;
  /** Row interchanged with row k at step k. */
  pivot: Int32Array;
}

/** Factor the n×n interleaved matrix `a` in place (a becomes L and U). Throws on a singular matrix. */
export function luFactor(a: Float64Array, n: number): ComplexLU {
  if (a.length !== 2 * n * n) throw new RangeError(`matrix storage holds ${a.length} numbers, not 2·${n}²`);
  const pivot = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    const rowK = 2 * k * n;
    let best = -1;
    let bestRow = k;
    for (let i = k; i < n; i++) {
      const re = a[2 * (i * n + k)];
      const im = a[2 * (i * n + k) + 1];
      const size = re * re + im * im;
      if (size > best) {
        best = size;
        bestRow = i;
      }
    }
    if (!(best > 0)) throw new RangeError(`matrix is singular (column ${k} has no usable pivot)`);
    pivot[k] = bestRow;
    if (bestRow !== k) {
      const rowP = 2 * bestRow * n;
      for (let j = 0; j < 2 * n; j++) {
        const tmp = a[rowK + j];
        a[rowK + j] = a[rowP + j];
        a[rowP + j] = tmp;
      }
    }
    const pr = a[rowK + 2 * k];
    const pi = a[rowK + 2 * k + 1];
    const invR = pr / best;
    const invI = -pi / best;
    for (let i = k + 1; i < n; i++) {
      const rowI = 2 * i * n;
      const xr = a[rowI + 2 * k];
      const xi = a[rowI + 2 * k + 1];
      const lr = xr * invR - xi * invI;
      const li = xr * invI + xi * invR;
      a[rowI + 2 * k] = lr;
      a[rowI + 2 * k + 1] = li;
      if (lr === 0 && li === 0) continue;
      for (let j = 2 * (k + 1); j < 2 * n; j += 2) {
        const ur = a[rowK + j];
        const ui = a[rowK + j + 1];
        a[rowI + j] -= lr * ur - li * ui;
        a[rowI + j + 1] -= lr * ui + li * ur;
      }
    }
  }
  return { n, lu: a, pivot };
}

/** Solve A·x = b for an interleaved right-hand side b (length 2n), in place; returns b holding x. */
export function luSolve(factors: ComplexLU, b: Float64Array): Float64Array {
  const { n, lu, pivot } = factors;
  if (b.length !== 2 * n) throw new RangeError(`right-hand side holds ${b.length} numbers, not 2·${n}`);
  for (let k = 0; k < n; k++) {
    const p = pivot[k];
    if (p !== k) {
      const tr = b[2 * k];
      const ti = b[2 * k + 1];
      b[2 * k] = b[2 * p];
      b[2 * k + 1] = b[2 * p + 1];
      b[2 * p] = tr;
      b[2 * p + 1] = ti;
    }
  }
  for (let i = 1; i < n; i++) {
    const row = 2 * i * n;
    let sr = b[2 * i];
    let si = b[2 * i + 1];
    for (let j = 0; j < i; j++) {
      const lr = lu[row + 2 * j];
      const li = lu[row + 2 * j + 1];
      sr -= lr * b[2 * j] - li * b[2 * j + 1];
      si -= lr * b[2 * j + 1] + li * b[2 * j];
    }
    b[2 * i] = sr;
    b[2 * i + 1] = si;
  }
  for (let i = n - 1; i >= 0; i--) {
    const row = 2 * i * n;
    let sr = b[2 * i];
    let si = b[2 * i + 1];
    for (let j = i + 1; j < n; j++) {
      const ur = lu[row + 2 * j];
      const ui = lu[row + 2 * j + 1];
      sr -= ur * b[2 * j] - ui * b[2 * j + 1];
      si -= ur * b[2 * j + 1] + ui * b[2 * j];
    }
    const dr = lu[row + 2 * i];
    const di = lu[row + 2 * i + 1];
    const den = dr * dr + di * di;
    b[2 * i] = (sr * dr + si * di) / den;
    b[2 * i + 1] = (si * dr - sr * di) / den;
  }
  return b;
}
