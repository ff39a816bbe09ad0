/** Gauss–Legendre rules on [-1, 1], computed once by Newton's method on the Legendre polynomials. */

export interface GaussRule {
  nodes: Float64Array;
  weights: Float64Array;
}

function gaussLegendre(n: number): GaussRule {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let derivative = 0;
    for (let iteration = 0; iteration < 100; iteration++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      // p1 = P_n(x), p0 = P_(n−1)(x)
      derivative = (n * (x * p1 - p0)) / (x * x - 1);
      const step = p1 / derivative;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  return { nodes, weights };
}

const rules = new Map<number, GaussRule>();

/** The n-point Gauss–Legendre rule on [-1, 1]. */
export function gaussRule(n: number): GaussRule {
  let rule = rules.get(n);
  if (rule === undefined) {
    rule = gaussLegendre(n);
    rules.set(n, rule);
  }
  return rule;
}
