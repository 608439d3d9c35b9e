/**
 * Boundary finding for margins that are 1-Lipschitz in a translation (a distance changes by at most the
 * move). If m(z) < 0, no root lies closer than |m(z)|, so stepping by |m| never jumps over the first
 * boundary; once a sign change is bracketed, bisection finishes it. Used by the fit window and by
 * placement remedies ("raise by N mm").
 */
export interface BoundaryOptions {
  /** Stop when the bracket is narrower than this (mm). */
  tolerance?: number;
  /** Give up past this distance from the start (mm). */
  maxTravel?: number;
  maxIterations?: number;
}

/**
 * Starting at z0, walk in `direction` (+1 up, −1 down) to the first z where m(z) ≥ 0 when m(z0) < 0,
 * or to the last z where m(z) ≥ 0 when m(z0) ≥ 0. Returns the z on the passing side of the boundary
 * (m ≥ 0 there), or null when no boundary is met within maxTravel.
 */
export function findBoundary(m: (z: number) => number, z0: number, direction: 1 | -1, options: BoundaryOptions = {}): number | null {
  const tol = options.tolerance ?? 1e-4;
  const maxTravel = options.maxTravel ?? 5000;
  const maxIterations = options.maxIterations ?? 200;
  let z = z0;
  let mz = m(z);
  const startPassing = mz >= 0;
  let lastOnStartSide = z;
  for (let i = 0; i < maxIterations; i++) {
    const step = Math.max(Math.abs(mz), tol / 2);
    const next = z + direction * step;
    if (Math.abs(next - z0) > maxTravel) return null;
    const mNext = m(next);
    if (mNext >= 0 === startPassing) {
      lastOnStartSide = next;
      z = next;
      mz = mNext;
      continue;
    }
    // Bracketed between lastOnStartSide and next.
    let a = lastOnStartSide;
    let b = next;
    for (let k = 0; k < 60 && Math.abs(b - a) > tol; k++) {
      const mid = (a + b) / 2;
      if (m(mid) >= 0 === startPassing) a = mid;
      else b = mid;
    }
    return startPassing ? a : b;
  }
  return startPassing ? lastOnStartSide : null;
}
