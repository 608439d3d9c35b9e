import { mkdirSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import { WEB_DIST_DIR } from '../src/web-static/web-static.module';
import { createTestApp, TestApp } from './helpers/test-app';

/** Size on disk of the copy the answer should be: the client decodes the body, Content-Length tells what was sent. */
function sizeOf(path: string): number {
  return statSync(path).size;
}

const INDEX_HTML = '<!doctype html><html><head><title>Swapwright</title></head><body><div id="root">web delivery check</div></body></html>';
const HASHED_SCRIPT = 'app-3f9a1c2b.js';
const SCRIPT = `export const answer = ${JSON.stringify('x'.repeat(4000))};\n`;

/**
 * The built web app as the API serves it: a stand-in build folder with the shape Vite writes (index.html at the top,
 * content-hashed files under assets/, a .br and a .gz copy beside each text file), so the headers are checked without
 * depending on a web build.
 * Source: RFC 9110 §8.4 and §12.5.3 (Content-Encoding chosen from Accept-Encoding), §12.5.5 (Vary);
 * RFC 9111 §5.2.2.4 (no-cache) and RFC 8246 (immutable).
 */
describe('the built web app: precompressed answers and cache headers', () => {
  let t: TestApp;
  let dist: string;

  beforeAll(async () => {
    dist = mkdtempSync(join(tmpdir(), 'swapwright-dist-'));
    mkdirSync(join(dist, 'assets'));
    for (const [name, text] of [
      ['index.html', INDEX_HTML],
      [`assets/${HASHED_SCRIPT}`, SCRIPT],
    ]) {
      writeFileSync(join(dist, name), text);
      writeFileSync(join(dist, `${name}.br`), brotliCompressSync(text));
      writeFileSync(join(dist, `${name}.gz`), gzipSync(text));
    }
    writeFileSync(join(dist, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
    t = await createTestApp((builder) => builder.overrideProvider(WEB_DIST_DIR).useValue(dist));
  });

  afterAll(async () => {
    await t.close();
    rmSync(dist, { recursive: true, force: true });
  });

  it('sends the brotli copy of an app route to a browser that accepts it, not cached, under the security policy', async () => {
    const res = await t.http.get('/projects/some-id').set('Accept-Encoding', 'gzip, deflate, br').expect(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    expect(Number(res.headers['content-length'])).toBe(sizeOf(join(dist, 'index.html.br')));
    expect(res.text).toBe(INDEX_HTML);
  });

  it('sends the gzip copy when brotli is not accepted, and the plain file when nothing is', async () => {
    const gz = await t.http.get('/sign-in').set('Accept-Encoding', 'gzip').expect(200);
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(Number(gz.headers['content-length'])).toBe(sizeOf(join(dist, 'index.html.gz')));
    expect(gz.text).toBe(INDEX_HTML);

    const plain = await t.http.get('/sign-in').set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(INDEX_HTML);
    expect(plain.headers['cache-control']).toBe('no-cache');
  });

  it('caches content-hashed assets for a year as immutable, with the type of the original file', async () => {
    const res = await t.http.get(`/assets/${HASHED_SCRIPT}`).set('Accept-Encoding', 'br').expect(200);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(Number(res.headers['content-length'])).toBe(sizeOf(join(dist, 'assets', `${HASHED_SCRIPT}.br`)));
    expect(Number(res.headers['content-length'])).toBeLessThan(SCRIPT.length / 10);
  });

  it('does not cache unhashed files at the top of the build for long', async () => {
    const res = await t.http.get('/favicon.svg').expect(200);
    expect(res.headers['cache-control']).toBe('no-cache');
  });

  it('answers a missing asset with 404, never with the app page', async () => {
    const res = await t.http.get('/assets/app-00000000.js').set('Accept-Encoding', 'br');
    expect(res.status).toBe(404);
    expect(res.headers['content-type'] ?? '').not.toMatch(/text\/html/);
  });

  it('leaves the API alone: unknown API paths are a JSON 404 and API answers are not stored', async () => {
    const missing = await t.http.get('/api/no-such-route').expect(404);
    expect(missing.body).toMatchObject({ statusCode: 404, code: 'not_found' });
    const health = await t.http.get('/api/health').expect(200);
    expect(health.headers['cache-control']).toBe('no-store');
  });
});
