import { DEMO_PROJECT_IDS } from '@swapwright/seed-data';
import Papa from 'papaparse';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { seedParts } from '../src/database/seed/seed-parts';
import { bearer, countRows, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

const ridgeback = DEMO_PROJECT_IDS.ridgeback;

interface Pick {
  sku: string;
  resolves: Array<{ checkId: string }>;
  broughtInBy: string[];
  rejected: Array<{ sku: string; reason: string }>;
  explanation: string;
}

describe('parts catalog, plans and counter', () => {
  let t: TestApp;
  let demo: Record<'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer', Session>;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    await seedCatalog(t.dataSource);
    await seedParts(t.dataSource);
    demo = await signInAllRoles(t.http);
  });

  afterAll(() => t.close());

  it('seeds the demo parts idempotently', async () => {
    expect(await seedParts(t.dataSource)).toEqual({ inserted: 0 });
  });

  it('lists parts with search and category filter, with stock and bins', async () => {
    const res = await t.http.get('/api/parts?category=oil-pickup&search=rear').set(...bearer(demo.counter));
    expect(res.status).toBe(200);
    expect(res.body.items.map((p: { sku: string }) => p.sku).sort()).toEqual(['BR-220', 'TR-4411']);
    const pickup = res.body.items.find((p: { sku: string }) => p.sku === 'TR-4411');
    expect(pickup.stock[0]).toMatchObject({ location: 'Main store', bin: 'A-02-2', onHand: 1, available: 1 });
    const bad = await t.http.get('/api/parts?category=spoiler').set(...bearer(demo.counter));
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/category must be one of/);
  });

  it('refuses a second part with the same SKU with a clear 409', async () => {
    const res = await t.http.post('/api/parts').set(...bearer(demo.counter)).send({ sku: 'TR-4411', description: 'Copy', category: 'oil-pickup', priceCents: 100 });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/SKU TR-4411 is already in your catalog/);
  });

  it("builds the demo project's plan: the rear-sump pan with its matching pickup, each pick explained, re-checked by the fit check", async () => {
    const res = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({ objective: 'lowest-cost' });
    expect(res.status).toBe(201);
    const picks = res.body.result.picks as Pick[];
    const skus = picks.map((p) => p.sku);
    expect(skus).toEqual(expect.arrayContaining(['TR-4410', 'TR-4411']));
    expect(skus).not.toContain('BR-220');
    const pan = picks.find((p) => p.sku === 'TR-4410')!;
    expect(pan.resolves.map((r) => r.checkId)).toContain('envelope.sump-crossmember');
    const pickup = picks.find((p) => p.sku === 'TR-4411')!;
    expect(pickup.broughtInBy.join(' ')).toMatch(/agrees with the chosen oil pan TR-4410/);
    expect(pickup.rejected.find((r) => r.sku === 'BR-220')?.reason).toMatch(/does not agree/);
    expect(res.body.recheck.resolved).toContain('envelope.sump-crossmember');
    expect(res.body.version).toBe(1);
    // The plan names the stored fit report it answers, and a plan can be built again from that same report.
    const report = await t.http.get(`/api/fit-reports/${res.body.fitReportId}`).set(...bearer(demo.estimator));
    expect(report.status).toBe(200);
    expect(report.body.projectId).toBe(ridgeback);
    const again = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({ fitReportId: res.body.fitReportId });
    expect(again.status).toBe(201);
    expect(again.body).toMatchObject({ fitReportId: res.body.fitReportId, version: 2, totalCents: res.body.totalCents });
    const otherReport = await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.stag}/fit-reports`).set(...bearer(demo.estimator)).send({});
    const mixed = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({ fitReportId: otherReport.body.id });
    expect(mixed.status).toBe(400);
    expect(mixed.body.message).toMatch(/fitReportId must be a fit report of this project/);
    const customer = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.customer)).send({});
    expect(customer.status).toBe(403);
  });

  it('locks a plan version; a locked plan cannot be locked again', async () => {
    const plans = await t.http.get(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.counter));
    const id = plans.body[0].id;
    expect((await t.http.post(`/api/parts-plans/${id}/lock`).set(...bearer(demo.estimator))).body.status).toBe('locked');
    const again = await t.http.post(`/api/parts-plans/${id}/lock`).set(...bearer(demo.estimator));
    expect(again.status).toBe(409);
  });

  it("the counter's work list names each job's customer and stage, so two trucks of one model read apart and a built job can be set aside", async () => {
    const listed = await t.http.get('/api/parts-plans').set(...bearer(demo.counter)).expect(200);
    const project = (await t.http.get(`/api/projects/${ridgeback}`).set(...bearer(demo.counter)).expect(200)).body as { status: string; customer: { name: string } };
    expect(listed.body.find((plan: { projectId: string }) => plan.projectId === ridgeback)).toMatchObject({ projectStatus: project.status, customerName: project.customer.name });
  });

  it('two clerks reserving the last unit at once: exactly one succeeds, the other gets a 409', async () => {
    const a = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({});
    const b = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({});
    const lineOf = async (planId: string) => {
      const lines = await t.http.get(`/api/parts-plans/${planId}/counter-lines`).set(...bearer(demo.counter));
      return lines.body.find((l: { sku: string }) => l.sku === 'TR-4411');
    };
    const [la, lb] = [await lineOf(a.body.id), await lineOf(b.body.id)];
    expect(la.available).toBe(1);
    const results = await Promise.all([
      t.http.post(`/api/counter-lines/${la.id}/reserve`).set(...bearer(demo.counter)).send({}),
      t.http.post(`/api/counter-lines/${lb.id}/reserve`).set(...bearer(demo.owner)).send({}),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const refused = results.find((r) => r.status === 409)!;
    expect(refused.body.message).toMatch(/No TR-4411 is left to reserve: another job took the last one/);
    const [stock] = await t.dataSource.query("SELECT s.onHand, s.reserved FROM part_stock s JOIN parts p ON p.id = s.partId WHERE p.sku = 'TR-4411'");
    expect(Number(stock.reserved)).toBe(1);
  });

  it('many concurrent reservations against the database never oversell', async () => {
    const part = (await t.http.get('/api/parts?search=TR-4410').set(...bearer(demo.counter))).body.items[0];
    expect((await t.http.put(`/api/parts/${part.id}/stock`).set(...bearer(demo.counter)).send({ location: 'Main store', bin: 'A-01-2', onHand: 3 })).status).toBe(200);
    // Twenty plans, each with its own counter line for the pan: twenty clerks reserve it at once, three units on the shelf.
    const plans: Array<{ status: number; body: { id: string } }> = [];
    for (let i = 0; i < 20; i += 1) plans.push(await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({}));
    expect(plans.every((p) => p.status === 201)).toBe(true);
    const lines = await Promise.all(
      plans.map(async (p) => (await t.http.get(`/api/parts-plans/${p.body.id}/counter-lines`).set(...bearer(demo.counter))).body.find((l: { sku: string }) => l.sku === 'TR-4410')),
    );
    const results = await Promise.all(lines.map((l) => t.http.post(`/api/counter-lines/${l.id}/reserve`).set(...bearer(demo.counter)).send({})));
    expect(results.filter((r) => r.status === 200)).toHaveLength(3);
    expect(results.filter((r) => r.status === 409)).toHaveLength(17);
    const [stock] = await t.dataSource.query("SELECT s.onHand, s.reserved FROM part_stock s JOIN parts p ON p.id = s.partId WHERE p.sku = 'TR-4410'");
    expect(Number(stock.reserved)).toBe(3);
    // Count what was reserved row by row, not only the stock counter.
    const [reservedLines] = await t.dataSource.query("SELECT COUNT(*) AS n FROM counter_lines WHERE sku = 'TR-4410' AND status = 'reserved'");
    expect(Number(reservedLines.n)).toBe(3);
    expect(Number(stock.reserved)).toBeLessThanOrEqual(Number(stock.onHand));
    // Release one and it can be reserved again; mark another to order, then receive it.
    const reserved = results.findIndex((r) => r.status === 200);
    expect((await t.http.post(`/api/counter-lines/${lines[reserved].id}/release`).set(...bearer(demo.counter))).body.status).toBe('open');
    const waiting = results.findIndex((r) => r.status === 409);
    expect((await t.http.post(`/api/counter-lines/${lines[waiting].id}/mark`).set(...bearer(demo.counter)).send({ status: 'ordered' })).body.status).toBe('ordered');
    const received = await t.http.post(`/api/counter-lines/${lines[waiting].id}/receive`).set(...bearer(demo.counter)).send({ location: 'Main store' });
    expect(received.body.status).toBe('received');
    const pickList = await t.http.get(`/api/parts-plans/${plans[0].body.id}/pick-list.csv`).set(...bearer(demo.counter));
    expect(pickList.status).toBe(200);
    expect(pickList.text.split(/\r?\n/)[0]).toBe('sku,description,quantity,location,bin,status');
  }, 120_000);

  it("the exported pick list writes each line's state in the counter's words, never the stored code, and keeps formula cells escaped", async () => {
    const plan = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({});
    expect(plan.status).toBe(201);
    const lines = (await t.http.get(`/api/parts-plans/${plan.body.id}/counter-lines`).set(...bearer(demo.counter))).body as Array<{ id: string; sku: string; quantity: number; available: number }>;
    const [toOrder, ordered, ...rest] = lines;
    expect((await t.http.post(`/api/counter-lines/${toOrder.id}/mark`).set(...bearer(demo.counter)).send({ status: 'to-order' })).body.status).toBe('to-order');
    expect((await t.http.post(`/api/counter-lines/${ordered.id}/mark`).set(...bearer(demo.counter)).send({ status: 'ordered' })).body.status).toBe('ordered');
    const coverable = rest.find((l) => l.available >= l.quantity)!;
    expect((await t.http.post(`/api/counter-lines/${coverable.id}/reserve`).set(...bearer(demo.counter)).send({})).body.status).toBe('reserved');
    // A description a spreadsheet would run as a formula.
    await t.dataSource.query('UPDATE counter_lines SET description = ? WHERE id = ?', ['=HYPERLINK("http://example.invalid","pan")', ordered.id]);

    const res = await t.http.get(`/api/parts-plans/${plan.body.id}/pick-list.csv`).set(...bearer(demo.counter));
    expect(res.status).toBe(200);
    const parsed = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toEqual(['sku', 'description', 'quantity', 'location', 'bin', 'status']);
    const bySku = new Map(parsed.data.map((row) => [row.sku, row]));
    expect(bySku.get(toOrder.sku)!.status).toBe('To order');
    expect(bySku.get(ordered.sku)!.status).toBe('Ordered');
    expect(bySku.get(coverable.sku)!.status).toBe('Set aside');
    // Source: OWASP "CSV Injection" — a cell starting with = + - @ is prefixed with an apostrophe.
    expect(bySku.get(ordered.sku)!.description).toBe('\'=HYPERLINK("http://example.invalid","pan")');
    // The other lines read "Not set aside" or "Short by N", as on the counter screen; no stored code reaches the file.
    for (const row of parsed.data) expect(row.status).toMatch(/^(Not set aside|Set aside|To order|Ordered|Arrived, set aside|Short by \d+)$/);
  });

  it('a quote drafted from the plan does not also charge the fabrication for a shortfall the plan resolves with a part', async () => {
    const plan = await t.http.post(`/api/projects/${ridgeback}/parts-plans`).set(...bearer(demo.estimator)).send({ objective: 'lowest-cost' });
    expect(plan.status).toBe(201);
    const resolved = new Set((plan.body.result.picks as Pick[]).flatMap((pick) => pick.resolves.map((r) => r.checkId)));
    expect(resolved).toContain('envelope.sump-crossmember');
    const quote = await t.http.post(`/api/projects/${ridgeback}/quotes`).set(...bearer(demo.estimator)).send({});
    expect(quote.status).toBe(201);
    expect(quote.body.revision.partsPlanVersion).not.toBeNull();
    const descriptions = (quote.body.revision.lines as { description: string }[]).map((line) => line.description);
    expect(descriptions).toContain('Rear-sump swap pan, Kestrel rail');
    expect(descriptions.filter((description) => /crossmember/i.test(description))).toEqual([]);
  });

  describe('CSV import', () => {
    const upload = (path: string, csv: string, mapping?: Record<string, string>) => {
      const req = t.http.post(path).set(...bearer(demo.counter)).attach('file', Buffer.from(csv), 'parts.csv');
      return mapping ? req.field('mapping', JSON.stringify(mapping)) : req;
    };

    it('reports every bad row (missing SKU, bad number, unknown category, duplicated SKU) and writes nothing', async () => {
      const before = await countRows(t.dataSource, 'parts');
      const csv = [
        'sku,description,category,price,cost',
        ',No sku here,oil-pan,10.00,5.00',
        'CSV-2,Bad price,oil-pan,ten,5.00',
        'CSV-3,Unknown category,spoiler,10.00,5.00',
        'CSV-4,First,fan,10.00,5.00',
        'CSV-4,Again,fan,10.00,5.00',
        'CSV-6,"=cmd|\' /C calc\'!A0",fan,10.00,5.00',
      ].join('\n');
      const preview = await upload('/api/parts/import/preview', csv);
      expect(preview.status).toBe(200);
      expect(preview.body.errors.map((e: { row: number; field: string }) => `${e.row}:${e.field}`)).toEqual(['2:sku', '3:price', '4:category', '6:sku']);
      expect(preview.body.warnings.map((w: { row: number }) => w.row)).toEqual([7]);
      expect(preview.body.rejected).toHaveLength(4);
      const imported = await upload('/api/parts/import', csv);
      expect(imported.status).toBe(400);
      expect(imported.body.message).toMatch(/4 of 6 rows have errors; nothing was imported/);
      expect(await countRows(t.dataSource, 'parts')).toBe(before);
    });

    it("reads a category by its name as people write it (any case, spaces around it) as well as its short form", async () => {
      const csv = [
        'sku,description,category,price',
        'CSV-20,Named category,Oil pan,10.00',
        'CSV-21,Shouted with spaces,"  FUEL PRESSURE REGULATOR ",11.00',
        'CSV-22,Short form still read,oil-pickup,12.00',
      ].join('\n');
      const imported = await upload('/api/parts/import', csv);
      expect(imported.status).toBe(200);
      expect(imported.body).toMatchObject({ inserted: 3, errors: [] });
      const rows = await t.dataSource.query("SELECT sku, category FROM parts WHERE sku IN ('CSV-20', 'CSV-21', 'CSV-22') ORDER BY sku");
      expect(rows).toEqual([
        { sku: 'CSV-20', category: 'oil-pan' },
        { sku: 'CSV-21', category: 'fuel-regulator' },
        { sku: 'CSV-22', category: 'oil-pickup' },
      ]);
    });

    it('an unknown or missing category says which line and lists the names it accepts', async () => {
      const csv = ['sku,description,category,price', 'CSV-30,Good,Radiator,10.00', 'CSV-31,Made-up category,Spoilers,10.00', 'CSV-32,No category,,10.00'].join('\n');
      const preview = await upload('/api/parts/import/preview', csv);
      expect(preview.status).toBe(200);
      const [unknown, missing] = preview.body.errors as Array<{ row: number; field: string; message: string }>;
      expect(unknown).toMatchObject({ row: 3, field: 'category' });
      expect(unknown.message).toMatch(/^line 3: category "Spoilers" is not one we know; write one of: Engine, Transmission, Oil pan, /);
      expect(unknown.message).toContain('Fuel pressure regulator');
      expect(missing).toMatchObject({ row: 4, field: 'category' });
      expect(missing.message).toMatch(/^line 4: category is missing; write one of: Engine, /);
      expect(preview.body.rejected.map((r: { row: number }) => r.row)).toEqual([3, 4]);
    });

    it('asks for a column mapping when headers differ, then imports; a formula-looking cell is stored as text and exported escaped', async () => {
      const csv = ['Item Code,Title,Kind,Retail,Vendor,Shelf Qty,Where', "CSV-10,=cmd|' /C calc'!A0,fan,12.50,Brookfield Parts,4,Main store"].join('\n');
      const first = await upload('/api/parts/import/preview', csv);
      // Title is a known spelling of the description; the item code and the kind are not.
      expect(first.body.unmapped).toEqual(['sku', 'category']);
      const mapping = { sku: 'Item Code', description: 'Title', category: 'Kind', price: 'Retail', supplier: 'Vendor', onHand: 'Shelf Qty', location: 'Where' };
      const imported = await upload('/api/parts/import', csv, mapping);
      expect(imported.status).toBe(200);
      expect(imported.body).toMatchObject({ inserted: 1, updated: 0 });
      const [row] = await t.dataSource.query("SELECT description, priceCents FROM parts WHERE sku = 'CSV-10'");
      expect(row).toEqual({ description: "=cmd|' /C calc'!A0", priceCents: 1250 });
      const exported = await t.http.get('/api/parts/export.csv').set(...bearer(demo.counter));
      // Source: OWASP, "CSV Injection": prefix cells starting with = + - @ with a single quote.
      expect(exported.text).toContain(`CSV-10,'=cmd|' /C calc'!A0,fan,12.50,`);
    });

    it('imports a good 10,000-row file in one transaction, upserting by SKU', async () => {
      const lines = ['sku,description,category,price,cost,supplier,supplierSku,laborHours,location,bin,onHand'];
      for (let i = 0; i < 10_000; i += 1) lines.push(`BULK-${i},"Bulk part ${i}, boxed",hoses,${(i % 500) + 1}.99,${(i % 300) + 1}.10,Brookfield Parts,BF-${i},0.5,Main store,Z-${i % 40},${i % 7}`);
      const res = await upload('/api/parts/import', lines.join('\n'));
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ inserted: 10_000, updated: 0 });
      const again = await upload('/api/parts/import', lines.join('\n').replace('BULK-0,"Bulk part 0, boxed",hoses,1.99', 'BULK-0,"Bulk part 0, boxed",hoses,2.49'));
      expect(again.body).toMatchObject({ inserted: 0, updated: 10_000 });
      const [row] = await t.dataSource.query("SELECT priceCents FROM parts WHERE sku = 'BULK-0'");
      expect(row.priceCents).toBe(249);
    }, 120_000);
  });
});
