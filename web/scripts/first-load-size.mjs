// Sums the gzip size of what the browser fetches before the first route chunk: the entry script,
// its modulepreload links and the entry stylesheet, as listed in dist/index.html.
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { join } from 'node:path';

const dist = new URL('../dist/', import.meta.url).pathname;
const html = readFileSync(join(dist, 'index.html'), 'utf8');
const files = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.(?:js|css))"/g)].map((m) => m[1]);
let total = 0;
for (const f of files) {
  const gz = gzipSync(readFileSync(join(dist, f)), { level: 9 }).length;
  total += gz;
  console.log(`${(gz / 1024).toFixed(1).padStart(7)} kB  ${f}`);
}
console.log(`${(total / 1024).toFixed(1).padStart(7)} kB  first load (gzip, ${files.length} files)`);
