import { DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { bearer, Session, startSignedInApp, TestApp } from './helpers/test-app';

/**
 * Generated from the app's own OpenAPI document: every PATCH and PUT route, every field of its body that is
 * not documented as nullable, at the top level and one level down in nested objects. Each gets `null` and
 * must answer 400 naming the field, and leave the record exactly as it was.
 */
interface Schema {
  $ref?: string;
  type?: string;
  nullable?: boolean;
  properties?: Record<string, Schema>;
  items?: Schema;
  allOf?: Schema[];
}
interface OpenApiDocument {
  paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: Schema }> } }>>;
  components: { schemas: Record<string, Schema> };
}
interface NullCase {
  method: 'patch' | 'put';
  template: string;
  field: string;
  body: Record<string, unknown>;
}

describe('null on update routes, generated over every update body', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;
  let doc: OpenApiDocument;
  const firstIds = new Map<string, string>();

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    await seedCatalog(t.dataSource);
    doc = (await t.http.get('/api/docs-json').expect(200)).body as OpenApiDocument;
  });

  afterAll(() => t.close());

  function resolve(schema: Schema | undefined): Schema | undefined {
    if (!schema) return undefined;
    if (schema.$ref) return resolve(doc.components.schemas[schema.$ref.replace('#/components/schemas/', '')]);
    if (schema.allOf?.length === 1) return { ...resolve(schema.allOf[0]), nullable: schema.nullable };
    return schema;
  }

  /**
   * The route with `{id}` filled by the first record the list before it answers (e.g. /api/projects for
   * /api/projects/{id}); null when that list is empty or another path parameter remains (no generic way to
   * pick one), in which case only the top-level fields are checked.
   */
  async function fill(template: string): Promise<string | null> {
    const match = /^(.*?)\/\{id\}/.exec(template);
    let path = template;
    if (match) {
      const list = match[1];
      if (!firstIds.has(list)) {
        const response = await t.http.get(list).set(...bearer(s.owner)).expect(200);
        const items = (Array.isArray(response.body) ? response.body : response.body.items) as Array<{ id: string }>;
        if (items.length === 0) return null;
        firstIds.set(list, items[0].id);
      }
      path = template.replace('{id}', firstIds.get(list)!);
    }
    return path.includes('{') ? null : path;
  }

  /** What the record looks like: the nearest route at or above the updated one that can be read. */
  async function snapshot(template: string, path: string): Promise<unknown> {
    const templateParts = template.split('/');
    const pathParts = path.split('/');
    for (let length = templateParts.length; length > 2; length--) {
      if (doc.paths[templateParts.slice(0, length).join('/')]?.get) {
        const readable = pathParts.slice(0, length).join('/');
        return (await t.http.get(readable).set(...bearer(s.owner)).expect(200)).body;
      }
    }
    throw new Error(`No readable route above ${template}`);
  }

  function currentValue(record: unknown, field: string): unknown {
    const body = record as Record<string, unknown> & { spec?: Record<string, unknown> };
    return body?.[field] ?? body?.spec?.[field];
  }

  async function casesFor(method: 'patch' | 'put', template: string, schema: Schema): Promise<NullCase[]> {
    const cases: NullCase[] = [];
    const path = await fill(template);
    if (!path) {
      // No demo record to change: the top-level fields are still checked (the body is refused before any lookup).
      for (const [field, raw] of Object.entries(schema.properties ?? {})) {
        if (!raw.nullable && !resolve(raw)?.nullable) cases.push({ method, template, field, body: { [field]: null } });
      }
      return cases;
    }
    const record = await snapshot(template, path);
    for (const [field, raw] of Object.entries(schema.properties ?? {})) {
      const property = resolve(raw);
      if (!property) continue;
      if (!raw.nullable && !property.nullable) cases.push({ method, template, field, body: { [field]: null } });
      const current = currentValue(record, field);
      if (property.type === 'object' || property.properties) {
        if (typeof current !== 'object' || current === null || Array.isArray(current)) continue;
        for (const [inner, innerRaw] of Object.entries(property.properties ?? {})) {
          if (innerRaw.nullable || resolve(innerRaw)?.nullable) continue;
          cases.push({ method, template, field: `${field}.${inner}`, body: { [field]: { ...current, [inner]: null } } });
        }
      }
    }
    return cases;
  }

  async function allCases(): Promise<NullCase[]> {
    const cases: NullCase[] = [];
    for (const [template, operations] of Object.entries(doc.paths)) {
      for (const method of ['patch', 'put'] as const) {
        const schema = resolve(operations[method]?.requestBody?.content['application/json']?.schema);
        if (schema) cases.push(...(await casesFor(method, template, schema)));
      }
    }
    return cases;
  }

  it('covers every update route that has required fields, with a case per field', async () => {
    const cases = await allCases();
    const routes = new Set(cases.map((c) => `${c.method.toUpperCase()} ${c.template}`));
    for (const route of [
      'PATCH /api/shops/current',
      'PUT /api/fit-settings',
      'PATCH /api/customers/{id}',
      'PATCH /api/projects/{id}',
      'PATCH /api/memberships/{id}',
      'PATCH /api/catalog/engines/{id}',
      'PATCH /api/catalog/oil-pans/{id}',
      'PATCH /api/catalog/chassis/{id}',
    ]) {
      expect([...routes]).toContain(route);
    }
    expect(cases.map((c) => `${c.template} ${c.field}`)).toEqual(
      expect.arrayContaining([
        '/api/catalog/engines/{id} name',
        '/api/catalog/engines/{id} cam.recommendedTotalDeg',
        '/api/shops/current name',
        '/api/shops/current laborRatePerHour',
        '/api/fit-settings overrides.minGroundClearanceMm',
        '/api/projects/{id} goals.use',
      ]),
    );
    expect(cases.length).toBeGreaterThan(100);
  });

  it('answers 400 naming the field for each null and leaves the record unchanged', async () => {
    const failures: string[] = [];
    const byRoute = new Map<string, NullCase[]>();
    for (const nullCase of await allCases()) {
      const route = `${nullCase.method} ${nullCase.template}`;
      byRoute.set(route, [...(byRoute.get(route) ?? []), nullCase]);
    }
    for (const [route, cases] of byRoute) {
      const { template, method } = cases[0];
      const filled = await fill(template);
      const path = filled ?? template.replace(/\{[^}]+\}/g, '00000000-0000-4000-8000-000000000000');
      const before = filled ? await snapshot(template, path) : null;
      for (const nullCase of cases) {
        const response = await t.http[method](path).set(...bearer(s.owner)).send(nullCase.body);
        const named = (response.body.details ?? []).some((detail: string) => detail.startsWith(`${nullCase.field} must not be null`));
        if (response.status !== 400 || !named) {
          failures.push(`${route} ${JSON.stringify(nullCase.body).slice(0, 80)} → ${response.status} ${response.body.message}`);
        }
      }
      // Every null of the route was sent; the record must be exactly as before.
      if (filled && JSON.stringify(await snapshot(template, path)) !== JSON.stringify(before)) failures.push(`${route} changed the record`);
    }
    expect(failures).toEqual([]);
  }, 180_000);

  it('still accepts null where the contract says nullable (clearing an optional value)', async () => {
    const path = await fill('/api/customers/{id}');
    const response = await t.http.patch(path!).set(...bearer(s.owner)).send({ phone: null }).expect(200);
    expect(response.body.phone).toBeNull();
  });

  it('keeps fit runs working on a part after a refused null', async () => {
    const project = (await t.http.get(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}`).set(...bearer(s.owner)).expect(200)).body;
    await t.http.patch(`/api/catalog/engines/${project.engineProfileId}`).set(...bearer(s.owner)).send({ topProfile: null }).expect(400);
    await t.http.patch(`/api/catalog/engines/${project.engineProfileId}`).set(...bearer(s.owner)).send({ name: null }).expect(400);
    await t.http.post(`/api/projects/${DEMO_PROJECT_IDS.ridgeback}/fit-reports`).set(...bearer(s.owner)).send({}).expect(201);
  });
});
