import { describe, expect, it } from 'vitest';
import type { ChassisInput } from '../../types';
import { sourcesByCheck, sourceTotals } from '../report-sources';

const input = (pointId: string, checks: string[], fields: Partial<ChassisInput>): ChassisInput => ({
  pointId,
  label: pointId,
  field: 'x',
  unit: 'mm',
  catalogValue: 100,
  measuredValue: null,
  deviation: null,
  flagged: false,
  source: { kind: 'catalog' },
  checks,
  ...fields,
});

describe('where a report took its chassis figures', () => {
  const sheet = { kind: 'sheet' as const, measuredBy: 'Sefa Lindqvist-Moro', measuredAt: '2026-11-30T08:10:00.000Z' };
  const inputs = [
    input('top', ['envelope.sump-crossmember'], { measuredValue: 335, deviation: -20, flagged: true, source: sheet }),
    input('face', ['envelope.sump-crossmember', 'envelope.heads-firewall'], {}),
    input('angle', ['drivetrain.u-joint-angles'], { unit: 'deg', measuredValue: 3, deviation: 0, source: sheet }),
    input('added', ['envelope.sump-crossmember'], { catalogValue: null }),
  ];
  const checks = [
    { checkId: 'envelope.sump-crossmember', title: 'Sump to crossmember' },
    { checkId: 'envelope.hood', title: 'Hood' },
    { checkId: 'drivetrain.u-joint-angles', title: 'U-joint angles' },
  ];

  it('groups the inputs check by check, flagged and measured first, leaving out checks without chassis inputs', () => {
    const groups = sourcesByCheck(inputs, checks);
    expect(groups.map((g) => g.checkId)).toEqual(['envelope.sump-crossmember', 'drivetrain.u-joint-angles']);
    expect(groups[0]).toMatchObject({ fromSheet: 1, fromCatalog: 1, flagged: 1 });
    expect(groups[0].inputs.map((i) => i.pointId)).toEqual(['top', 'face']);
  });

  it('counts what came from the sheet and the catalog, and names the flagged figures', () => {
    const totals = sourceTotals(inputs);
    expect(totals.fromSheet).toBe(2);
    expect(totals.fromCatalog).toBe(1);
    expect(totals.flagged.map((i) => i.pointId)).toEqual(['top']);
  });
});
