/**
 * Boundary finding for margins that are 1-Lipschitz in a translation (a distance changes by at most the
 * move; an overlap's lift shrinks exactly by the move). If m(z) < 0, no root lies closer than |m(z)|, so
 * stepping by |m| never jumps over the first boundary; once a sign change is bracketed, the Illinois
 * (modified regula falsi) method closes the bracket to `tolerance`. Used by the fit window and by
 * placement remedies ("raise by N mm").
 */
export interface BoundaryOptions {
  /** Stop when the bracket is narrower than this (mm). */
  tolerance?: number;
  /** Give up past this distance from the start (mm). */
  maxTravel?: number;
  maxIterations?: number;
  /**
   * The margin is known to be monotone along `direction` (e.g. a pan over an obstacle below it while
   * rising): secant steps are then allowed, which converge fast on the near-linear margins of clearances.
   */
  monotone?: boolean;
}

const passes = (v: number): boolean => v >= 0;

/** Illinois refinement of a bracket [a, b] with passes(fa) ≠ passes(fb); returns the end on the passing side. */
function refine(m: (z: number) => number, a: number, fa: number, b: number, fb: number, tol: number): number {
  let side = 0;
  for (let k = 0; k < 80 && Math.abs(b - a) > tol; k++) {
    let c = (a * fb - b * fa) / (fb - fa);
    const lo = Math.min(a, b) + tol / 4;
    const hi = Math.max(a, b) - tol / 4;
    if (!(c >= lo)) c = lo;
    if (!(c <= hi)) c = hi;
    if (k % 8 === 7) c = (a + b) / 2; // a bisection now and then guards against slow one-sided convergence
    const fc = m(c);
    if (passes(fc) === passes(fa)) {
      a = c;
      fa = fc;
      if (side === -1) fb /= 2;
      side = -1;
    } else {
      b = c;
      fb = fc;
      if (side === 1) fa /= 2;
      side = 1;
    }
  }
  return passes(fa) ? a : b;
}

/**
 * Starting at z0, walk in `direction` (+1 up, −1 down) to the first z where m(z) ≥ 0 when m(z0) < 0,
 * or to the last z where m(z) ≥ 0 when m(z0) ≥ 0. Returns the z on the passing side of the boundary
 * (m ≥ 0 there, within `tolerance` of it), or null when no boundary is met within maxTravel.
 */
export function findBoundary(m: (z: number) => number, z0: number, direction: 1 | -1, options: BoundaryOptions = {}): number | null {
  const tol = options.tolerance ?? 1e-4;
  const maxTravel = options.maxTravel ?? 5000;
  const maxIterations = options.maxIterations ?? 400;
  let z = z0;
  let mz = m(z);
  const startPassing = passes(mz);
  let prevZ = NaN;
  let prevM = NaN;
  for (let i = 0; i < maxIterations; i++) {
    // The safe step, plus a little so that an exact (slope 1) contact is crossed and bracketed at once.
    let step = Math.abs(mz) + tol / 2;
    if (options.monotone && Number.isFinite(prevM)) {
      const slope = (mz - prevM) / (z - prevZ);
      if (Number.isFinite(slope) && slope !== 0) {
        const secant = Math.abs(mz / slope) * 1.05 + tol / 2;
        if (secant > step) step = Math.min(secant, 50 * step + 1);
      }
    }
    let next = z + direction * step;
    let capped = false;
    if (Math.abs(next - z0) > maxTravel) {
      next = z0 + direction * maxTravel;
      capped = true;
    }
    const mNext = m(next);
    if (passes(mNext) === startPassing) {
      if (capped) return null;
      prevZ = z;
      prevM = mz;
      z = next;
      mz = mNext;
      continue;
    }
    return refine(m, z, mz, next, mNext, tol);
  }
  return null;
}
