import type { OilPanSpec } from '@swapwright/shared';
import { DEMO_REAR_SUMP_PAN } from '@swapwright/shared/fixtures';
import { DEMO_SHOP_ID } from '@swapwright/seed-data';
import { OTHER_SHOP } from '../../test/fixtures/other-shop.fixture';
import { createTestApp, resetData, TestApp } from '../../test/helpers/test-app';
import { CatalogService } from './catalog.service';

const OURS = { shopId: DEMO_SHOP_ID };
const THEIRS = { shopId: OTHER_SHOP.id };

/** A pan body as the validation pipe hands it over: a class instance, with a field left undefined. */
class PanBody {
  constructor(values: Partial<OilPanSpec>) {
    Object.assign(this, { ...DEMO_REAR_SUMP_PAN, id: undefined }, values);
  }
}

// Against the real test database: the catalog's rules are about what is stored and whose it is.
describe('CatalogService', () => {
  let t: TestApp;
  let catalog: CatalogService;

  beforeAll(async () => {
    t = await createTestApp();
    catalog = t.app.get(CatalogService);
  });

  beforeEach(() => resetData(t.dataSource));

  afterAll(() => t.close());

  it('stores the spec as plain JSON under its own id, the name trimmed, undefined fields left out', async () => {
    const row = await catalog.create('oil-pans', OURS, new PanBody({ name: '  Deep rear pan  ' }));
    const spec = row.spec as OilPanSpec & Record<string, unknown>;
    expect(spec.id).toBe(row.id);
    expect(spec.name).toBe('Deep rear pan');
    expect(row.name).toBe('Deep rear pan');
    expect(spec.bottomProfile).toEqual(DEMO_REAR_SUMP_PAN.bottomProfile);
    expect(Object.values(spec)).not.toContain(undefined);
  });

  it('refuses a blank name on create and on update', async () => {
    await expect(catalog.create('oil-pans', OURS, new PanBody({ name: '   ' }))).rejects.toMatchObject({ status: 400, message: 'name must not be empty' });
    const row = await catalog.create('oil-pans', OURS, new PanBody({ name: 'Pan' }));
    await expect(catalog.update('oil-pans', OURS, row.id, { name: ' ' })).rejects.toMatchObject({ status: 400 });
  });

  it('update merges the fields given into the stored spec and keeps the row id', async () => {
    const row = await catalog.create('oil-pans', OURS, new PanBody({ name: 'Pan' }));
    const updated = await catalog.update('oil-pans', OURS, row.id, { id: 'something-else', name: 'Renamed pan', sumpPosition: 'center' });
    const spec = updated.spec as OilPanSpec;
    expect(spec).toMatchObject({ id: row.id, name: 'Renamed pan', sumpPosition: 'center', railPattern: DEMO_REAR_SUMP_PAN.railPattern });
    expect(spec.bottomProfile).toEqual(DEMO_REAR_SUMP_PAN.bottomProfile);
  });

  it("answers only for the caller's shop: another shop's rows are not found and not listed as existing", async () => {
    const ours = await catalog.create('oil-pans', OURS, new PanBody({ name: 'Ours' }));
    const theirs = await catalog.create('oil-pans', THEIRS, new PanBody({ name: 'Theirs' }));
    await expect(catalog.get('oil-pans', OURS, theirs.id)).rejects.toMatchObject({ status: 404 });
    expect(await catalog.existing('oil-pans', OURS, [ours.id, theirs.id])).toEqual(new Set([ours.id]));
    expect([...(await catalog.specsByIds('oil-pans', OURS, [ours.id, theirs.id])).keys()]).toEqual([ours.id]);
    expect(await catalog.findSpec('oil-pans', OURS, theirs.id)).toBeNull();
    expect(await catalog.findSpec('oil-pans', OURS, null)).toBeNull();
  });

  it('gives candidates of one kind filtered by their columns, in name order', async () => {
    await catalog.create('oil-pans', THEIRS, new PanBody({ name: 'A pan of another shop' }));
    await catalog.create('oil-pans', THEIRS, new PanBody({ name: 'Zed rear pan' }));
    await catalog.create('oil-pans', THEIRS, new PanBody({ name: 'Mid rear pan' }));
    await catalog.create('oil-pans', THEIRS, new PanBody({ name: 'Front pan', sumpPosition: 'front' }));
    const rear = await catalog.candidateSpecs<OilPanSpec>('oil-pans', THEIRS, { sumpPosition: 'rear' });
    expect(rear.map((pan) => pan.name)).toEqual(['A pan of another shop', 'Mid rear pan', 'Zed rear pan']);
  });
});
