import { MeasurementsService } from '../measurements/measurements.service';
import { accessoryDriveBeltLayout, beltLengthWindow, type AccessoryDriveSpec, type EngineSpec, type SerpentineBeltSpec } from '@swapwright/shared';
import { DEMO_CATALOG, DEMO_CATALOG_IDS } from '@swapwright/seed-data';
import { Repository } from 'typeorm';
import { CatalogService } from '../catalog/catalog.service';
import { chosenAccessoryDrive, FitSpecBuilderService, stockBeltLengthsFor } from './fit-spec-builder.service';
import { ProjectFitSelection } from './project-fit-selection.entity';

function beltFixture(id: string, ribs: number, effectiveLengthMm: number): SerpentineBeltSpec {
  return { id, name: `Bench belt ${ribs}PK${effectiveLengthMm}`, ribs, profile: 'PK', effectiveLengthMm, designation: `${ribs}PK${effectiveLengthMm}` };
}

const sixRibDrive = { ribs: 6 } satisfies Pick<AccessoryDriveSpec, 'ribs'>;
const eightRibDrive = { ribs: 8 } satisfies Pick<AccessoryDriveSpec, 'ribs'>;

const mixedBelts: SerpentineBeltSpec[] = [
  beltFixture('six-1240', 6, 1240),
  beltFixture('five-1223', 5, 1223),
  beltFixture('six-1225', 6, 1225),
  beltFixture('eight-1225', 8, 1225),
  beltFixture('six-1225-second-shelf', 6, 1225),
];

const kestrelTruck = DEMO_CATALOG.engines.find((engine) => engine.id === DEMO_CATALOG_IDS.engines.kestrel53)!;

describe('stockBeltLengthsFor', () => {
  // Common practice (no published source): a belt with a different rib count does not sit in the pulley grooves.
  it('keeps only belts with the drive’s rib count', () => {
    expect(stockBeltLengthsFor(sixRibDrive, mixedBelts)).toEqual([1225, 1240]);
    expect(stockBeltLengthsFor(eightRibDrive, mixedBelts)).toEqual([1225]);
  });

  it('is empty when no belt has the drive’s rib count', () => {
    expect(stockBeltLengthsFor({ ribs: 4 }, mixedBelts)).toEqual([]);
  });
});

describe('chosenAccessoryDrive', () => {
  it('picks the selected drive, else the engine’s first, and none for an unknown id', () => {
    const [truck, compact] = kestrelTruck.accessoryDrives;
    expect(chosenAccessoryDrive(kestrelTruck, compact.id)).toBe(compact);
    expect(chosenAccessoryDrive(kestrelTruck)).toBe(truck);
    expect(chosenAccessoryDrive(kestrelTruck, 'drive-gone')).toBeNull();
    expect(chosenAccessoryDrive({ accessoryDrives: [] })).toBeNull();
  });
});

describe('FitSpecBuilderService.candidates', () => {
  function builderWith(belts: SerpentineBeltSpec[]) {
    const candidateSpecs = jest.fn(async (kind: string, _user: unknown, where: Record<string, string | number> = {}) =>
      kind === 'belts' ? belts.filter((belt) => where.ribs === undefined || belt.ribs === where.ribs) : [],
    );
    const catalog = { candidateSpecs } as unknown as CatalogService;
    const builder = new FitSpecBuilderService(catalog, {} as MeasurementsService, {} as Repository<ProjectFitSelection>);
    return { builder, candidateSpecs };
  }

  it('asks the catalog for belts with the chosen drive’s ribs and fills the stock lengths', async () => {
    const { builder, candidateSpecs } = builderWith(mixedBelts);
    const candidates = await builder.candidates({ shopId: 'shop-a' }, kestrelTruck, kestrelTruck.accessoryDrives[0].id);
    expect(candidateSpecs).toHaveBeenCalledWith('belts', { shopId: 'shop-a' }, { ribs: 6 });
    expect(candidates.stockBeltLengthsMm).toEqual([1225, 1240]);
  });

  it('leaves the stock lengths out when the shop has no belt of that width', async () => {
    const { builder } = builderWith([beltFixture('five-1223', 5, 1223)]);
    const candidates = await builder.candidates({ shopId: 'shop-a' }, kestrelTruck);
    expect(candidates.stockBeltLengthsMm).toBeUndefined();
  });

  it('does not ask for belts when the engine has no such drive', async () => {
    const { builder, candidateSpecs } = builderWith(mixedBelts);
    const engine: EngineSpec = { ...kestrelTruck, accessoryDrives: [] };
    const candidates = await builder.candidates({ shopId: 'shop-a' }, engine);
    expect(candidateSpecs).not.toHaveBeenCalledWith('belts', expect.anything(), expect.anything());
    expect(candidates.stockBeltLengthsMm).toBeUndefined();
  });
});

describe('demo belt stock', () => {
  // Source: ISO 155 (centre-distance allowance taken up by the tensioner); ISO 9982:2019 (effective length).
  it.each(DEMO_CATALOG.engines.flatMap((engine) => engine.accessoryDrives.map((drive) => ({ engine: engine.name, drive }))))(
    'has a belt inside the take-up of the $engine $drive.name',
    ({ drive }) => {
      const layout = accessoryDriveBeltLayout(drive);
      if (!layout.ok) throw new Error(`the ${drive.name} layout is refused: ${layout.code}`);
      const window = beltLengthWindow(layout.length, drive.tensionerTakeUpMm);
      const fitting = stockBeltLengthsFor(drive, DEMO_CATALOG.belts).filter((length) => length >= window.minMm && length <= window.maxMm);
      expect(fitting.length).toBeGreaterThan(0);
    },
  );
});
