/**
 * The root of a continuous, non-increasing function of one variable, by a bracketed search that
 * always converges: grow a bracket until the sign changes, then the Illinois variant of false
 * position (superlinear near the root) with a bisection step whenever it stalls. Every zone's net
 * inflow falls as its own pressure rises, which is exactly this shape.
 */

export interface RootOptions {
  /** Stop when |f(x)| is at most this. */
  toleranceY: number;
  /** First half-width of the bracket around 0. */
  startHalfWidth?: number;
  maxIterations?: number;
}

/**
 * @example
 * findRootDecreasing((x) => 4 - x * x * Math.sign(x), { toleranceY: 1e-12 }) // 2
 */
export function findRootDecreasing(f: (x: number) => number, options: RootOptions): number {
  const tol = options.toleranceY;
  let lo = -(options.startHalfWidth ?? 1);
  let hi = options.startHalfWidth ?? 1;
  let fLo = f(lo);
  let fHi = f(hi);
  // Grow the bracket (×4 a step): f(lo) ≥ 0 ≥ f(hi) for a non-increasing f.
  for (let i = 0; fLo < 0 && i < 60; i += 1) {
    hi = lo;
    fHi = fLo;
    lo *= 4;
    fLo = f(lo);
  }
  for (let i = 0; fHi > 0 && i < 60; i += 1) {
    lo = hi;
    fLo = fHi;
    hi *= 4;
    fHi = f(hi);
  }
  if (Math.abs(fLo) <= tol) return lo;
  if (Math.abs(fHi) <= tol) return hi;
  if (fLo < 0 || fHi > 0) return Math.abs(fLo) < Math.abs(fHi) ? lo : hi; // no sign change within ±4⁶⁰: unreachable for finite inputs
  let side = 0;
  const maxIterations = options.maxIterations ?? 1200;
  for (let i = 0; i < maxIterations; i += 1) {
    // False position; every eighth step (or when it leaves the bracket), bisect instead.
    let x = (lo * fHi - hi * fLo) / (fHi - fLo);
    if (!(x > lo && x < hi) || i % 8 === 7) x = (lo + hi) / 2;
    const fx = f(x);
    // Stop at the tolerance, or when no double lies between the ends (a root at a √ corner near 0 Pa
    // behind a huge opening can need bracket widths far below any absolute figure).
    if (Math.abs(fx) <= tol || hi - lo <= 2 * Number.EPSILON * Math.max(Math.abs(lo), Math.abs(hi))) return x;
    if (fx > 0) {
      lo = x;
      fLo = fx;
      if (side === -1) fHi /= 2; // Illinois: halve the stale end so it cannot pin the estimate
      side = -1;
    } else {
      hi = x;
      fHi = fx;
      if (side === 1) fLo /= 2;
      side = 1;
    }
  }
  return Math.abs(fLo) < Math.abs(fHi) ? lo : hi;
}
