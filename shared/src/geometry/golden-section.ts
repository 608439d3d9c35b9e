/**
 * Golden-section search for the largest value of `f` on [lo, hi] (unimodal in practice: a minimum of rising and
 * falling margins); the ends and the middle are kept as fall-backs.
 */
export function goldenSectionMax(f: (z: number) => number, lo: number, hi: number): { z: number; score: number } {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let a = lo;
  let b = hi;
  let c = b - ratio * (b - a);
  let d = a + ratio * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < 30 && b - a > 1e-2; i++) {
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - ratio * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + ratio * (b - a);
      fd = f(d);
    }
  }
  let best = { z: (a + b) / 2, score: f((a + b) / 2) };
  for (const z of [lo, hi, (lo + hi) / 2]) {
    const score = f(z);
    if (score > best.score) best = { z, score };
  }
  return best;
}
