import highsLoader from 'highs';
import type { FabricationRemedy } from '../types/finding';
import { renderText, textParts } from '../units/unit-format';
import { combineFabricationRemedies } from './fabrication-operations';
import { buildPlanModel } from './plan-model';
import { planParts, type MipSolve } from './plan-parts';
import type { PlanInput, PlanShortfall } from './plan-types';

let solve: MipSolve;
beforeAll(async () => {
  const highs = await highsLoader();
  solve = (lp, options) => highs.solve(lp, options) as ReturnType<MipSolve>;
});

const RATE = 13_500; // cents per hour

const fab = (operation: string, laborHours: number, operationCode?: FabricationRemedy['operationCode']): FabricationRemedy => ({
  kind: 'fabrication',
  operation,
  laborHours,
  note: '',
  ...(operationCode && { operationCode }),
});

// The two remedies the transmission mount checks give when the mount lands behind the crossmember's adjustment and
// below its pad (the demo work order's figures).
const RELOCATE = fab('Relocate the transmission crossmember 72.3 mm (2.85 in) rearward', 4, 'transmission-crossmember');
const DROP = fab('Drop the transmission crossmember 8.7 mm (0.34 in), or fit a drop crossmember', 4, 'transmission-crossmember');
const MERGED = 'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and drop it 8.7 mm (0.34 in), or fit a drop crossmember';

const shortfall = (checkId: string, title: string, remedies: FabricationRemedy[]): PlanShortfall => ({ checkId, title, status: 'fails', message: '', remedies });
const POSITION = shortfall('drivetrain.transmission-mount-position', 'Transmission mount over the crossmember (fore-aft)', [RELOCATE]);
const HEIGHT = shortfall('drivetrain.transmission-mount-height', 'Transmission mount to crossmember height', [DROP]);

function input(shortfalls: PlanShortfall[]): PlanInput {
  return {
    engine: { name: 'Test engine', railPattern: 'R1', bellPattern: 'B1', crankSignal: '36-1', camSignal: '1x', throttle: 'cable', cylinders: 8, dipstickLocation: 'pan' },
    fitted: {},
    shortfalls,
    parts: [],
    laborRateCents: RATE,
    objective: 'lowest-cost',
  };
}

describe('combineFabricationRemedies', () => {
  // Common practice (no published source): a shop reworks a member once, so the moves several shortfalls ask of
  // the same member are one operation in one labor line, not one line per shortfall.
  it('one operation code from two shortfalls: one operation covering both, every move in one sentence, the larger hours', () => {
    const { operations, coveredBy } = combineFabricationRemedies([[RELOCATE], [{ ...DROP, laborHours: 3.5 }]]);
    expect(operations).toEqual([{ operation: MERGED, laborHours: 4, operationCode: 'transmission-crossmember', covers: [0, 1] }]);
    expect(coveredBy).toEqual([[0], [0]]);
  });

  it('a single shortfall keeps its remedy as it is', () => {
    expect(combineFabricationRemedies([[DROP]]).operations).toEqual([{ operation: DROP.operation, laborHours: 4, operationCode: 'transmission-crossmember', covers: [0] }]);
  });

  it('remedies without a code stay keyed by their words: the same words once, different words apart', () => {
    const notch = fab('Notch the tunnel', 2);
    const { operations, coveredBy } = combineFabricationRemedies([[notch, fab('Shim the pinion', 1)], [notch]]);
    expect(operations).toEqual([
      { operation: 'Notch the tunnel', laborHours: 2, covers: [0, 1] },
      { operation: 'Shim the pinion', laborHours: 1, covers: [0] },
    ]);
    expect(coveredBy).toEqual([[0, 1], [0]]);
  });

  it('raising the pad reads as the member\'s own pad; three moves are listed with semicolons', () => {
    const raise = fab("Raise the transmission crossmember's mount pad", 4, 'transmission-crossmember');
    const angle = fab('Raise or lower the transmission crossmember to even out the U-joint angles', 2, 'transmission-crossmember');
    expect(combineFabricationRemedies([[RELOCATE], [raise]]).operations[0].operation).toBe(
      'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and raise its mount pad',
    );
    expect(combineFabricationRemedies([[RELOCATE], [DROP], [angle]]).operations[0]).toMatchObject({
      operation: `${MERGED.replace(' rearward and', ' rearward;')}; and set the new height to even out the U-joint angles`,
      laborHours: 4,
    });
    expect(combineFabricationRemedies([[raise], [angle]]).operations[0].operation).toBe(
      'Rework the transmission crossmember: raise its mount pad and set the new height to even out the U-joint angles',
    );
  });

  it('without a height move of its own, the U-joint move keeps its either-way words', () => {
    const angle = fab('Raise or lower the transmission crossmember to even out the U-joint angles', 2, 'transmission-crossmember');
    expect(combineFabricationRemedies([[RELOCATE], [angle]]).operations[0].operation).toBe(
      'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and raise or lower it to even out the U-joint angles',
    );
  });

  it('the longest crossmember rework, every move at its widest figures, still fits one quote line (200 characters)', () => {
    const far = fab('Relocate the transmission crossmember 188.8 mm (7.43 in) rearward', 4, 'transmission-crossmember');
    const deep = fab('Drop the transmission crossmember 188.8 mm (7.43 in), or fit a drop crossmember', 4, 'transmission-crossmember');
    const angle = fab('Raise or lower the transmission crossmember to even out the U-joint angles', 2, 'transmission-crossmember');
    const { operation } = combineFabricationRemedies([[far], [deep], [angle]]).operations[0];
    expect(operation.length).toBeLessThanOrEqual(200);
  });

  it('brackets made for each side are one line with their hours added', () => {
    const left = fab('Fabricate and weld left engine mount brackets', 3, 'mount-adapters');
    const right = fab('Fabricate and weld right engine mount brackets', 3, 'mount-adapters');
    expect(combineFabricationRemedies([[left], [right]]).operations).toEqual([
      {
        operation: 'Fabricate and weld left and right engine mount brackets',
        laborHours: 6,
        operationCode: 'mount-adapters',
        covers: [0, 1],
      },
    ]);
  });

  it('pieces whose words differ in more than one place keep the heading and each piece as a clause', () => {
    const left = fab('Fabricate and weld left engine mount brackets', 3, 'mount-adapters');
    const plate = fab('Cut and plate the right frame rail', 2, 'mount-adapters');
    expect(combineFabricationRemedies([[left], [plate]]).operations[0].operation).toBe(
      'Make the engine mount brackets: fabricate and weld left engine mount brackets and cut and plate the right frame rail',
    );
  });

  it('is the same whichever run builds it (deterministic)', () => {
    const shortfalls = [[RELOCATE, fab('Shim the pinion', 1)], [DROP]];
    expect(combineFabricationRemedies(shortfalls)).toEqual(combineFabricationRemedies(shortfalls));
  });
});

describe('the parts plan with both transmission mount shortfalls', () => {
  it('has one fabrication column that both shortfalls are resolved by', () => {
    const model = buildPlanModel(input([POSITION, HEIGHT]));
    const fabrication = model.columns.map((column, index) => ({ column, index })).filter(({ column }) => column.kind === 'fabrication');
    expect(fabrication).toHaveLength(1);
    expect(fabrication[0].column.operation).toEqual({ operation: MERGED, laborHours: 4, operationCode: 'transmission-crossmember' });
    expect(model.shortfalls.map((s) => s.resolvers)).toEqual([[fabrication[0].index], [fabrication[0].index]]);
  });

  it('plans one crossmember operation of 4 h that resolves both, read in inches by an inch reader', async () => {
    const plan = await planParts(input([POSITION, HEIGHT]), solve);
    expect(plan.operations).toHaveLength(1);
    const [operation] = plan.operations;
    expect(operation).toMatchObject({ operation: MERGED, laborHours: 4, laborCents: 4 * RATE, operationCode: 'transmission-crossmember' });
    expect(operation.resolves.map((r) => r.checkId)).toEqual([POSITION.checkId, HEIGHT.checkId]);
    expect(plan.unresolved.map((u) => u.checkId)).not.toContain(POSITION.checkId);
    expect(plan.unresolved.map((u) => u.checkId)).not.toContain(HEIGHT.checkId);
    expect(plan.totals).toMatchObject({ laborHours: 4, fabricationHours: 4, laborCents: 4 * RATE });
    expect(renderText(textParts(operation.operation), 'in')).toBe(
      'Rework the transmission crossmember: relocate it 2.85 in rearward and drop it 0.34 in, or fit a drop crossmember',
    );
    expect(renderText(textParts(operation.operation), 'mm')).toBe(
      'Rework the transmission crossmember: relocate it 72.3 mm rearward and drop it 8.7 mm, or fit a drop crossmember',
    );
  });

  it('one shortfall alone keeps its own operation and words', async () => {
    const plan = await planParts(input([HEIGHT]), solve);
    expect(plan.operations.map((o) => [o.operation, o.laborHours, o.resolves.map((r) => r.checkId)])).toEqual([[DROP.operation, 4, [HEIGHT.checkId]]]);
  });

  it('only the shortfalls the shop wants resolved are combined', async () => {
    const plan = await planParts({ ...input([POSITION, HEIGHT]), resolve: [HEIGHT.checkId] }, solve);
    expect(plan.operations.map((o) => o.operation)).toEqual([DROP.operation]);
  });
});
