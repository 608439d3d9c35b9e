import fc from 'fast-check';
import { DemoRole } from '@swapwright/seed-data';
import { FullShop, loadFullShop } from './fixtures/full-shop.fixture';
import { OpenApiDocument, Operation, openApiPath, requestSchema, resolve, sample, Schema } from './helpers/openapi';
import { RegisteredRoute, registeredRoutes } from './helpers/routes';
import { bearer, Session, startSignedInApp, TestApp } from './helpers/test-app';

/**
 * Fuzzing generated from the app's own OpenAPI document: every route the router registers gets CASES_PER_ROUTE random
 * and malformed requests as the owner (fast-check, fixed seed): bodies near the schema with one field broken, random
 * JSON, malformed JSON text, odd query values, odd path parameters and junk uploads. No answer may be a 5xx, and a
 * refused request (4xx) must leave the row count of every table as it was.
 */
// FUZZ_SEED and FUZZ_CASES widen a local run (e.g. FUZZ_CASES=40); npm test uses the fixed defaults.
const SEED = Number(process.env.FUZZ_SEED ?? 1_010_2026);
const CASES_PER_ROUTE = Number(process.env.FUZZ_CASES ?? 6);

/** Values that break assumptions: wrong types, edges of number ranges, empty and huge text, odd characters. */
const NASTY: unknown[] = [
  null, -1, 0, 1.5, -1e308, 1e308, Number.MAX_SAFE_INTEGER + 2, '', ' ', 'NaN', 'Infinity', '1e999', '-0', 'x'.repeat(5000),
  '\u0000', 'é😀', '<script>alert(1)</script>', "'; DROP TABLE shops; --", '../../etc/passwd', true, [], [null], {}, { $gt: '' },
  { __proto__: { polluted: true } }, [[[[[[]]]]]], '2026-02-30', '00000000-0000-0000-0000-000000000000',
];
const PATH_VALUES = ['0', '-1', 'abc', '%00', '..%2F..', 'x'.repeat(300), '00000000-0000-4000-8000-000000000000', '%F0%9F%98%80', '1e3', ' '];
const BOOKKEEPING = new Set(['refresh_tokens', 'throttle_counters']);
const RAW_BODIES = ['{', '{"a":', 'null', '[]', '"text"', '1', '{"a":1,}', '\u0000', '{"__proto__":{"x":1}}'];

type Kind = 'near-schema' | 'random-json' | 'raw' | 'none';

interface FuzzCase {
  kind: Kind;
  body: unknown;
  raw: string;
  query: Record<string, unknown>;
  pathIndex: number;
  useRealIds: boolean;
  upload: 'junk' | 'empty' | 'wrong-field' | 'none';
}

function mutate(value: unknown, path: string[], replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  const base = value && typeof value === 'object' ? (Array.isArray(value) ? [...value] : { ...(value as object) }) : {};
  (base as Record<string, unknown>)[head] = mutate((base as Record<string, unknown>)[head], rest, replacement);
  return base;
}

/** Field paths of a schema (properties, one level into nested objects and the first array item). */
function fieldPaths(doc: OpenApiDocument, raw: Schema | undefined, prefix: string[] = [], depth = 0): string[][] {
  const schema = resolve(doc, raw);
  if (!schema || depth > 3) return [];
  const out: string[][] = [];
  for (const [name, inner] of Object.entries(schema.properties ?? {})) {
    out.push([...prefix, name]);
    const resolved = resolve(doc, inner);
    if (resolved?.properties) out.push(...fieldPaths(doc, resolved, [...prefix, name], depth + 1));
    if (resolved?.type === 'array') out.push(...fieldPaths(doc, resolved.items, [...prefix, name, '0'], depth + 1));
  }
  return out;
}

function casesFor(doc: OpenApiDocument, operation: Operation | undefined, seed: number): FuzzCase[] {
  const body = requestSchema(doc, operation);
  const paths = fieldPaths(doc, body.schema);
  const queryParams = (operation?.parameters ?? []).filter((p) => p.in === 'query');
  const baseBody = sample(doc, body.schema) ?? {};
  const nearSchema = fc
    .tuple(paths.length > 0 ? fc.constantFrom(...paths) : fc.constant<string[]>([]), fc.constantFrom(...NASTY))
    .map(([path, value]) => mutate(baseBody, path, value));
  const arbitrary: fc.Arbitrary<FuzzCase> = fc.record({
    kind: fc.constantFrom<Kind>('near-schema', 'near-schema', 'random-json', 'raw', 'none'),
    body: fc.oneof(nearSchema, fc.jsonValue({ maxDepth: 3 })),
    raw: fc.constantFrom(...RAW_BODIES),
    query:
      queryParams.length > 0
        ? fc.dictionary(fc.constantFrom(...queryParams.map((p) => p.name), 'unknownParam'), fc.oneof(fc.constantFrom(...NASTY.filter((v) => typeof v !== 'object' || v === null)), fc.array(fc.string(), { maxLength: 3 })), { maxKeys: 3 })
        : fc.dictionary(fc.constantFrom('page', 'unknownParam'), fc.string(), { maxKeys: 1 }),
    pathIndex: fc.nat(PATH_VALUES.length - 1),
    useRealIds: fc.boolean(),
    upload: body.type === 'multipart' ? fc.constantFrom<FuzzCase['upload']>('junk', 'empty', 'wrong-field', 'none') : fc.constant<FuzzCase['upload']>('none'),
  });
  return fc.sample(arbitrary, { seed, numRuns: CASES_PER_ROUTE });
}

describe('fuzzing every route from the OpenAPI document', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;
  let shop: FullShop;
  let doc: OpenApiDocument;
  let tables: string[];

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    shop = await loadFullShop(t, s);
    doc = (await t.http.get('/api/docs-json').expect(200)).body as OpenApiDocument;
    tables = t.dataSource.entityMetadatas.map((entity) => entity.tableName);
  });

  afterAll(() => t.close());

  async function rowCounts(): Promise<Record<string, number>> {
    const [row] = await t.dataSource.query(`SELECT ${tables.map((table) => `(SELECT COUNT(*) FROM \`${table}\`) AS \`${table}\``).join(', ')}`);
    return Object.fromEntries(Object.entries(row as Record<string, unknown>).map(([table, n]) => [table, Number(n)]));
  }

  function realId(name: string, path: string): string {
    if (name === 'token') return 'not-a-link-token';
    if (name === 'pointId') return 'pinion.height';
    if (name === 'chassisId') return shop.chassisId;
    if (name === 'projectId') return shop.projectId;
    const segment = path.split('/:')[0].split('/').pop() ?? '';
    const ids: Record<string, string> = {
      memberships: shop.membershipId, customers: shop.customerId, projects: shop.projectId, 'fit-reports': shop.fitReportId,
      'measurement-photos': shop.photoId, parts: shop.partId, suppliers: shop.supplierId, 'parts-plans': shop.partsPlanId,
      'counter-lines': shop.counterLineId, 'labor-operations': shop.laborOperationId, quotes: shop.quoteId,
    };
    return ids[segment] ?? shop.catalogIds[segment] ?? PATH_VALUES[6];
  }

  function concretePath(route: RegisteredRoute, fuzz: FuzzCase): string {
    let path = route.path;
    for (const name of route.params) {
      const prefix = path.slice(0, path.indexOf(`:${name}`));
      path = path.replace(`:${name}`, fuzz.useRealIds ? realId(name, `${prefix}:${name}`) : PATH_VALUES[fuzz.pathIndex]);
    }
    return path;
  }

  it(`sends ${CASES_PER_ROUTE} random and malformed requests to every route: never a 5xx, never a partial write`, async () => {
    // Deletes last, so records stay for the other routes' cases; the owner's own session is not signed out.
    const routes = registeredRoutes(t.app)
      .filter((route) => !route.path.startsWith('/api/docs'))
      .sort((a, b) => Number(a.method === 'delete') - Number(b.method === 'delete'));
    expect(routes.length).toBeGreaterThan(120);
    const serverErrors: string[] = [];
    const partialWrites: string[] = [];
    let sent = 0;
    for (const [index, route] of routes.entries()) {
      const operation = doc.paths[openApiPath(route.path)]?.[route.method];
      for (const fuzz of casesFor(doc, operation, SEED + index)) {
        const path = concretePath(route, fuzz);
        const before = await rowCounts();
        const query = Object.fromEntries(Object.entries(fuzz.query).map(([k, v]) => [k, Array.isArray(v) ? v.map(String) : String(v)]));
        let call = t.http[route.method](path).query(query).set(...bearer(s.owner));
        if (fuzz.upload === 'junk') call = call.attach('photos', Buffer.from(fc.sample(fc.string({ maxLength: 64 }), { seed: SEED + index, numRuns: 1 })[0] + 'junk'), 'junk.jpg');
        else if (fuzz.upload === 'empty') call = call.attach('photos', Buffer.alloc(0), 'empty.jpg');
        else if (fuzz.upload === 'wrong-field') call = call.attach('file', Buffer.from('not a photo'), 'x.png');
        else if (route.method !== 'get' && fuzz.kind === 'raw') call = call.set('Content-Type', 'application/json').send(fuzz.raw);
        else if (route.method !== 'get' && fuzz.kind !== 'none') {
          // Primitives and top-level arrays go as JSON text, exactly as a client could send them.
          call = fuzz.body !== null && typeof fuzz.body === 'object' && !Array.isArray(fuzz.body) ? call.send(fuzz.body as object) : call.set('Content-Type', 'application/json').send(JSON.stringify(fuzz.body) ?? 'null');
        }
        const response = await call;
        sent += 1;
        const label = `${route.key} ${path} ${JSON.stringify(fuzz.kind === 'raw' ? fuzz.raw : fuzz.body)?.slice(0, 160)} query=${JSON.stringify(fuzz.query).slice(0, 80)} upload=${fuzz.upload}`;
        if (response.status >= 500) serverErrors.push(`${response.status} ${label}`);
        else if (response.status >= 400) {
          const after = await rowCounts();
          // Attempts on the sign-in routes are counted (rate limits) even when refused: bookkeeping, not a record.
          const changed = tables.filter((table) => after[table] !== before[table] && !BOOKKEEPING.has(table));
          if (changed.length > 0) partialWrites.push(`${response.status} ${label}: ${changed.join(', ')}`);
        }
      }
    }
    expect({ serverErrors, partialWrites }).toEqual({ serverErrors: [], partialWrites: [] });
    expect(sent).toBe(routes.length * CASES_PER_ROUTE);
  }, 300_000);
});
