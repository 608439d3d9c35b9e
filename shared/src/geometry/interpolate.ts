/** Linear interpolation over stations sorted by `key`; clamps to the end stations outside their range. */
export function interpolateStations<T>(stations: readonly T[], key: (s: T) => number, value: (s: T) => number, at: number): number {
  const n = stations.length;
  if (n === 0) return NaN;
  if (at <= key(stations[0])) return value(stations[0]);
  if (at >= key(stations[n - 1])) return value(stations[n - 1]);
  for (let i = 0; i + 1 < n; i++) {
    const k0 = key(stations[i]);
    const k1 = key(stations[i + 1]);
    if (at >= k0 && at <= k1) {
      if (k1 === k0) return Math.min(value(stations[i]), value(stations[i + 1]));
      return value(stations[i]) + ((at - k0) * (value(stations[i + 1]) - value(stations[i]))) / (k1 - k0);
    }
  }
  return value(stations[n - 1]);
}
