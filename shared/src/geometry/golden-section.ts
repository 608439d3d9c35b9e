/**
 * Golden-section search for the largest value of `objective` on [from, to] (unimodal in practice: a minimum of
 * rising and falling margins); the ends and the middle are kept as fall-backs. Answers where (`at`) and how
 * large (`score`).
 */
export function goldenSectionMax(objective: (at: number) => number, from: number, to: number): { at: number; score: number } {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let low = from;
  let high = to;
  let lowerProbe = high - ratio * (high - low);
  let upperProbe = low + ratio * (high - low);
  let lowerScore = objective(lowerProbe);
  let upperScore = objective(upperProbe);
  for (let step = 0; step < 30 && high - low > 1e-2; step++) {
    if (lowerScore >= upperScore) {
      high = upperProbe;
      upperProbe = lowerProbe;
      upperScore = lowerScore;
      lowerProbe = high - ratio * (high - low);
      lowerScore = objective(lowerProbe);
    } else {
      low = lowerProbe;
      lowerProbe = upperProbe;
      lowerScore = upperScore;
      upperProbe = low + ratio * (high - low);
      upperScore = objective(upperProbe);
    }
  }
  let best = { at: (low + high) / 2, score: objective((low + high) / 2) };
  for (const at of [from, to, (from + to) / 2]) {
    const score = objective(at);
    if (score > best.score) best = { at, score };
  }
  return best;
}
