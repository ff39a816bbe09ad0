import { complex, lusolve, matrix, type Complex, type Matrix } from "mathjs";
import { describe, expect, it } from "vitest";
import { luFactor, luSolve } from "@/lib/antenna/complex-lu";

/** A small deterministic generator, so that a failure can be replayed. */
function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32 - 0.5;
  };
}

function randomSystem(n: number, seed: number): { a: Float64Array; b: Float64Array } {
  const next = generator(seed);
  const a = Float64Array.from({ length: 2 * n * n }, next);
  const b = Float64Array.from({ length: 2 * n }, next);
  return { a, b };
}

function solveWithMathjs(a: Float64Array, b: Float64Array, n: number): Complex[] {
  const am = matrix(Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => complex(a[2 * (i * n + j)], a[2 * (i * n + j) + 1]))));
  const bm = matrix(Array.from({ length: n }, (_, i) => [complex(b[2 * i], b[2 * i + 1])]));
  const x = lusolve(am, bm) as Matrix;
  return Array.from({ length: n }, (_, i) => complex(x.get([i, 0]) as Complex));
}

describe("complex LU with partial pivoting", () => {
  // Source: mathjs 15 `lusolve` on complex matrices (a general-purpose reference library)
  it.each([1, 2, 3, 7, 16, 40])("matches mathjs lusolve on random %i×%i systems", (n) => {
    for (let seed = 1; seed <= 5; seed++) {
      const { a, b } = randomSystem(n, seed * 97 + n);
      const expected = solveWithMathjs(a, b, n);
      const x = luSolve(luFactor(a.slice(), n), b.slice());
      const scale = Math.max(...expected.map((e) => Math.hypot(e.re, e.im)));
      for (let i = 0; i < n; i++) {
        expect(Math.abs(x[2 * i] - expected[i].re)).toBeLessThan(1e-10 * scale);
        expect(Math.abs(x[2 * i + 1] - expected[i].im)).toBeLessThan(1e-10 * scale);
      }
    }
  });

  // Source: mathjs 15 `lusolve` (a zero leading entry needs a row interchange)
  it("pivots past a zero on the diagonal", () => {
    // [[0, 1+j], [2, 3]] x = [1+j, 5]  →  x = [1, 1]
    const a = Float64Array.from([0, 0, 1, 1, 2, 0, 3, 0]);
    const x = luSolve(luFactor(a, 2), Float64Array.from([1, 1, 5, 0]));
    const expected = solveWithMathjs(Float64Array.from([0, 0, 1, 1, 2, 0, 3, 0]), Float64Array.from([1, 1, 5, 0]), 2);
    expected.forEach((e, i) => {
      expect(x[2 * i]).toBeCloseTo(e.re, 12);
      expect(x[2 * i + 1]).toBeCloseTo(e.im, 12);
    });
  });

  it("refuses a singular matrix", () => {
    const a = Float64Array.from([1, 0, 2, 0, 2, 0, 4, 0]);
    expect(() => luFactor(a, 2)).toThrow(/singular/);
  });
});
