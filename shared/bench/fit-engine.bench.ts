/**
 * Fit engine speed: `npm run bench -w shared`.
 * - the full rule set (runFitCheck: envelope, mounts, transmission mount and SYSTEM_CHECKS) for one placement; target < 1 ms median;
 * - the fit window over 300 mm of setback at 1 mm steps (301 columns, with the best placement); target < 30 ms median;
 * - the tilt-aware placement proposal (tilts −2…6° by 1°, 300 mm of setback at 10 mm, U-joints weighed); target < 150 ms median.
 * Warm-up runs first so the JIT has compiled the hot paths; times are wall-clock per call.
 */
import os from 'node:os';
import { DEMO_CENTER_SUMP_PAN, DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../src/fixtures/demo-fit-spec';
import { runFitCheck } from '../src/fit-report/fit-report';
import { computeFitWindow } from '../src/fit-window/fit-window';
import { proposePlacement } from '../src/fit-window/placement-proposal';

function measure(label: string, runs: number, warmup: number, fn: () => void): { median: number; p95: number } {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    fn();
    times.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  times.sort((a, b) => a - b);
  const q = (p: number): number => times[Math.min(times.length - 1, Math.floor(p * times.length))];
  const result = { median: q(0.5), p95: q(0.95) };
  console.log(`${label.padEnd(62)} median ${result.median.toFixed(3)} ms   p95 ${result.p95.toFixed(3)} ms   (${runs} runs)`);
  return result;
}

const rearSump = { ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN };
// The centre-sump pan fitted, with a pan-left dipstick: the crossmember, pan/pickup/pump and dipstick checks all fail
// and each offers candidate pans judged against every rule below the engine (once per run, shared between them).
const centreSump = {
  ...DEMO_FIT_SPEC,
  oilPan: DEMO_CENTER_SUMP_PAN,
  engine: { ...DEMO_FIT_SPEC.engine, dipstickLocation: 'pan-left' as const },
  candidates: { ...DEMO_FIT_SPEC.candidates, oilPans: [...(DEMO_FIT_SPEC.candidates?.oilPans ?? []), DEMO_CENTER_SUMP_PAN] },
};
console.log(`Swapwright fit engine bench — node ${process.version}, ${os.cpus().length} CPUs (${os.cpus()[0]?.model ?? 'unknown'}), load ${os.loadavg()[0].toFixed(2)}`);

const check = measure('runFitCheck, demo spec (stock pan failing, remedies computed)', 2000, 300, () => runFitCheck(DEMO_FIT_SPEC));
measure('runFitCheck, demo spec with the rear-sump pan', 2000, 300, () => runFitCheck(rearSump));
measure('runFitCheck, centre-sump pan (three checks offer pans)', 2000, 300, () => runFitCheck(centreSump));
const windowRun = () =>
  computeFitWindow(rearSump, { setbackFromMm: DEMO_FIT_SPEC.placement.setbackMm - 150, setbackToMm: DEMO_FIT_SPEC.placement.setbackMm + 150, stepMm: 1 });
const win = measure('fit window, 300 mm of setback at 1 mm steps (rear-sump pan)', 60, 15, windowRun);
measure('fit window, same range, stock pan (infeasible columns)', 60, 15, () =>
  computeFitWindow(DEMO_FIT_SPEC, { setbackFromMm: 510, setbackToMm: 810, stepMm: 1 }),
);

const proposal = measure('placement proposal, tilts -2..6 deg x 300 mm setback (rear-sump pan)', 30, 5, () => proposePlacement(rearSump));

const ok = (v: number, target: number): string => (v < target ? 'meets' : 'MISSES');
console.log(
  `target runFitCheck median < 1 ms: ${ok(check.median, 1)}; fit window median < 30 ms: ${ok(win.median, 30)}; ` +
    `placement proposal median < 150 ms: ${ok(proposal.median, 150)}`,
);
if (os.loadavg()[0] > os.cpus().length) console.log('note: the machine was busy (load above the CPU count), so these times are pessimistic.');
