// CSV import of 10,000 rows end to end: the counter's upload through POST /api/parts/import (parse, validate every
// row, upsert by SKU and set stock in one transaction), first as new parts, then again as updates.
// Needs the test services and a built API: `bash scripts/stack.sh services && source .local/test/env.sh`,
// `npm run build -w api`. Writes BENCH-* parts into the database of DB_NAME. Run: node api/bench/parts-import.bench.js
const { startBenchApp, signInDemo } = require('./bench-app');
const { seedDemo } = require('../dist/database/seed/seed-demo');
const { seedParts } = require('../dist/database/seed/seed-parts');

const ROWS = 10_000;

function supplierFile(priceOffset) {
  const lines = ['sku,description,category,price,cost,supplier,supplierSku,laborHours,location,bin,onHand'];
  for (let i = 0; i < ROWS; i += 1) {
    lines.push(`BENCH-${i},"Bench part ${i}, boxed",hoses,${(i % 500) + priceOffset}.99,${(i % 300) + 1}.10,Brookfield Parts,BF-${i},0.5,Main store,Z-${i % 40},${i % 7}`);
  }
  return Buffer.from(lines.join('\n'));
}

async function main() {
  const { app, base, dataSource } = await startBenchApp();
  await seedDemo(dataSource);
  await seedParts(dataSource);
  const session = await signInDemo(base, 'counter');
  const upload = async (route, file) => {
    const form = new FormData();
    form.append('file', new Blob([file], { type: 'text/csv' }), 'supplier.csv');
    const start = process.hrtime.bigint();
    const res = await fetch(`${base}${route}`, { method: 'POST', headers: { authorization: `Bearer ${session.accessToken}` }, body: form });
    const body = await res.json();
    const ms = Number(process.hrtime.bigint() - start) / 1e6;
    if (res.status !== 200) throw new Error(`${route}: ${res.status} ${JSON.stringify(body).slice(0, 300)}`);
    return { ms, body };
  };
  const first = supplierFile(1);
  const preview = await upload('/parts/import/preview', first);
  const inserted = await upload('/parts/import', first);
  const updated = await upload('/parts/import', supplierFile(2));
  const kb = (first.length / 1024).toFixed(0);
  console.log(`CSV preview, ${ROWS.toLocaleString('en')} rows (${kb} KB): ${(preview.ms / 1000).toFixed(2)} s (${preview.body.errors.length} errors)`);
  console.log(`CSV import, ${ROWS.toLocaleString('en')} rows: ${(inserted.ms / 1000).toFixed(2)} s end to end (${inserted.body.inserted} inserted, ${inserted.body.updated} updated; target < 10 s)`);
  console.log(`CSV import again, ${ROWS.toLocaleString('en')} rows: ${(updated.ms / 1000).toFixed(2)} s end to end (${updated.body.inserted} inserted, ${updated.body.updated} updated)`);
  await app.close();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
