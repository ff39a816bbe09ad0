/**
 * sin and cos of one angle together, about twice as fast as Math.sin plus
 * Math.cos: the matrix fill spends most of its time on e^(−jkR). Cody–Waite
 * reduction by π/2 and the fdlibm kernel polynomials on [−π/4, π/4]; accurate
 * to about 1e−16 for |x| up to 1e5, beyond which it defers to Math.
 */

/** Writes [sin x, cos x] into out[0], out[1]. */
export function sincos(x: number, out: Float64Array): void {
  if (!(Math.abs(x) < 1e5)) {
    out[0] = Math.sin(x);
    out[1] = Math.cos(x);
    return;
  }
  const q = Math.round(x * 0.6366197723675814);
  const r = x - q * 1.5707963267341256 - q * 6.077100506506192e-11;
  const z = r * r;
  const s =
    r +
    r *
      z *
      (-1.6666666666666632e-1 +
        z * (8.333333333322118e-3 + z * (-1.984126982958954e-4 + z * (2.7557313621385722e-6 + z * (-2.5050747762857807e-8 + z * 1.5896230157221844e-10)))));
  const c =
    1 -
    0.5 * z +
    z *
      z *
      (4.16666666666666019037e-2 +
        z * (-1.38888888888741095749e-3 + z * (2.48015872894767294178e-5 + z * (-2.75573143513906633035e-7 + z * (2.0875723212981748279e-9 + z * -1.13596475577881948265e-11)))));
  const odd = (q & 1) === 1;
  out[0] = (q & 2) === 0 ? (odd ? c : s) : odd ? -c : -s;
  out[1] = ((q + 1) & 2) === 0 ? (odd ? s : c) : odd ? -s : -c;
}
