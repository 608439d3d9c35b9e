import { FIT_REPORT_SAFETY } from '../fit-report/fit-report';
import type { WorkHazard } from '../types/value-lists';

/** The usual caution for each hazard, in the fit report's words; each defers to licensed practice and local codes. */
export const HAZARD_CAUTIONS: Record<WorkHazard, string> = {
  lifting: FIT_REPORT_SAFETY[0],
  support: FIT_REPORT_SAFETY[1],
  fuel: FIT_REPORT_SAFETY[2],
  welding: FIT_REPORT_SAFETY[3],
  steering: FIT_REPORT_SAFETY[4],
  brakes: FIT_REPORT_SAFETY[4],
};

/** Every work order carries these four, whatever its steps. */
export const ALWAYS_SHOWN_HAZARDS: readonly WorkHazard[] = ['lifting', 'support', 'fuel', 'welding'];

export const WORK_ORDER_DEFERENCE =
  'These steps and figures are the shop\'s planning aid: follow the part makers\' instructions where they differ, ' +
  'local codes, emissions and registration rules, and licensed practice.';

/** The cautions a work order prints: the four always shown, then any other hazard its steps carry. */
export function workOrderCautions(hazards: Iterable<WorkHazard>): { hazard: WorkHazard; caution: string }[] {
  const all = new Set<WorkHazard>([...ALWAYS_SHOWN_HAZARDS, ...hazards]);
  const seen = new Set<string>();
  const out: { hazard: WorkHazard; caution: string }[] = [];
  for (const hazard of all) {
    if (seen.has(HAZARD_CAUTIONS[hazard])) continue;
    seen.add(HAZARD_CAUTIONS[hazard]);
    out.push({ hazard, caution: HAZARD_CAUTIONS[hazard] });
  }
  return out;
}
