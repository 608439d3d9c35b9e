// Upload time of a 10 MB phone-sized JPEG through POST /api/projects/:id/measurement-sheet/photos.
// Needs the test services and a built API: `bash scripts/stack.sh services && source .local/test/env.sh`,
// `npm run build -w api`, demo data loaded (the test suites or `npm run seed -w api`). Run: node api/bench/photo-upload.bench.js
const { startBenchApp, signInDemo } = require('./bench-app');
const { seedDemo } = require('../dist/database/seed/seed-demo');
const { seedCatalog } = require('../dist/database/seed/seed-catalog');
const { DEMO_PROJECT_IDS } = require('@swapwright/seed-data');

function segment(marker, data) {
  const head = Buffer.from([0xff, marker, 0, 0]);
  head.writeUInt16BE(data.length + 2, 2);
  return Buffer.concat([head, data]);
}

/** A 4000 × 3000 baseline JPEG padded with APP2 segments to `bytes` (a phone photo's size and pixel count). */
function bigJpeg(bytes) {
  const w = 4000, h = 3000;
  const sof = Buffer.from([8, h >> 8, h & 255, w >> 8, w & 255, 1, 1, 0x11, 0]);
  const bits = Buffer.alloc(16); bits[0] = 1;
  const blocks = Math.ceil(w / 8) * Math.ceil(h / 8);
  const data = Buffer.alloc(Math.ceil((blocks * 2) / 8), 0);
  const parts = [Buffer.from([0xff, 0xd8]), segment(0xe0, Buffer.from('JFIF\0\x01\x01\0\0\x01\0\x01\0\0', 'latin1'))];
  let size = 2 + 18 + 69 + 11 + 21 * 2 + 10 + data.length + 2;
  while (size + 65537 < bytes) { parts.push(segment(0xe2, Buffer.alloc(65533, 0x20))); size += 65537; }
  parts.push(segment(0xdb, Buffer.concat([Buffer.from([0]), Buffer.alloc(64, 1)])), segment(0xc0, sof),
    segment(0xc4, Buffer.concat([Buffer.from([0x00]), bits, Buffer.from([0])])), segment(0xc4, Buffer.concat([Buffer.from([0x10]), bits, Buffer.from([0])])),
    segment(0xda, Buffer.from([1, 1, 0, 0, 63, 0])), data, Buffer.from([0xff, 0xd9]));
  return Buffer.concat(parts);
}

async function main() {
  const { app, base, dataSource } = await startBenchApp();
  await seedDemo(dataSource); await seedCatalog(dataSource);
  const session = await signInDemo(base, 'fabricator');
  const photo = bigJpeg(10 * 1024 * 1024);
  const times = [];
  for (let i = 0; i < 6; i += 1) {
    const form = new FormData();
    form.append('photos', new Blob([photo], { type: 'image/jpeg' }), 'bay.jpg');
    const start = process.hrtime.bigint();
    const res = await fetch(`${base}/projects/${DEMO_PROJECT_IDS.ridgeback}/measurement-sheet/photos`, { method: 'POST', headers: { authorization: `Bearer ${session.accessToken}` }, body: form });
    const ms = Number(process.hrtime.bigint() - start) / 1e6;
    const body = await res.json();
    if (res.status !== 201) throw new Error(`${res.status} ${JSON.stringify(body)}`);
    await fetch(`${base}/measurement-photos/${body[0].id}`, { method: 'DELETE', headers: { authorization: `Bearer ${session.accessToken}` } });
    if (i > 0) times.push(ms); // the first run warms up
  }
  times.sort((a, b) => a - b);
  console.log(`10 MB JPEG (${photo.length} bytes, 4000x3000) upload over loopback, ${times.length} runs: median ${times[Math.floor(times.length / 2)].toFixed(0)} ms, min ${times[0].toFixed(0)} ms, max ${times[times.length - 1].toFixed(0)} ms`);
  await app.close();
}
main().catch((e) => { console.error(e); process.exit(1); });
