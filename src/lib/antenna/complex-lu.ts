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

/** Real part of the multiplier a[at]·(1/pivot), with 1/pivot = (invR, invI). */
function multiplierRe(a: Float64Array, at: number, invR: number, invI: number): number {
  return a[at] * invR - a[at + 1] * invI;
}

/** Imaginary part of the multiplier a[at]·(1/pivot). */
function multiplierIm(a: Float64Array, at: number, invR: number, invI: number): number {
  return a[at] * invI + a[at + 1] * invR;
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
    // Rows below are eliminated four at a time, so that each element of the pivot row is loaded once for four rows.
    let i = k + 1;
    for (; i + 3 < n; i += 4) {
      const r1 = 2 * i * n;
      const r2 = r1 + 2 * n;
      const r3 = r2 + 2 * n;
      const r4 = r3 + 2 * n;
      const l1r = multiplierRe(a, r1 + 2 * k, invR, invI);
      const l1i = multiplierIm(a, r1 + 2 * k, invR, invI);
      const l2r = multiplierRe(a, r2 + 2 * k, invR, invI);
      const l2i = multiplierIm(a, r2 + 2 * k, invR, invI);
      const l3r = multiplierRe(a, r3 + 2 * k, invR, invI);
      const l3i = multiplierIm(a, r3 + 2 * k, invR, invI);
      const l4r = multiplierRe(a, r4 + 2 * k, invR, invI);
      const l4i = multiplierIm(a, r4 + 2 * k, invR, invI);
      a[r1 + 2 * k] = l1r;
      a[r1 + 2 * k + 1] = l1i;
      a[r2 + 2 * k] = l2r;
      a[r2 + 2 * k + 1] = l2i;
      a[r3 + 2 * k] = l3r;
      a[r3 + 2 * k + 1] = l3i;
      a[r4 + 2 * k] = l4r;
      a[r4 + 2 * k + 1] = l4i;
      for (let j = 2 * (k + 1); j < 2 * n; j += 2) {
        const ur = a[rowK + j];
        const ui = a[rowK + j + 1];
        a[r1 + j] -= l1r * ur - l1i * ui;
        a[r1 + j + 1] -= l1r * ui + l1i * ur;
        a[r2 + j] -= l2r * ur - l2i * ui;
        a[r2 + j + 1] -= l2r * ui + l2i * ur;
        a[r3 + j] -= l3r * ur - l3i * ui;
        a[r3 + j + 1] -= l3r * ui + l3i * ur;
        a[r4 + j] -= l4r * ur - l4i * ui;
        a[r4 + j + 1] -= l4r * ui + l4i * ur;
      }
    }
    for (; i < n; i++) {
      const r1 = 2 * i * n;
      const lr = multiplierRe(a, r1 + 2 * k, invR, invI);
      const li = multiplierIm(a, r1 + 2 * k, invR, invI);
      a[r1 + 2 * k] = lr;
      a[r1 + 2 * k + 1] = li;
      for (let j = 2 * (k + 1); j < 2 * n; j += 2) {
        const ur = a[rowK + j];
        const ui = a[rowK + j + 1];
        a[r1 + j] -= lr * ur - li * ui;
        a[r1 + j + 1] -= lr * ui + li * ur;
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
