// Reports the gzip size of the JavaScript a route needs before it can render: the entry chunk,
// the route's lazy chunk and every chunk they import statically. Run after `vite build`.
// Usage: node scripts/route-size.mjs [src/features/auth/components/SignInPage.tsx]
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { join } from 'node:path';

const dist = new URL('../dist/', import.meta.url).pathname;
const manifest = JSON.parse(readFileSync(join(dist, '.vite/manifest.json'), 'utf8'));
const route = process.argv[2] ?? 'src/features/auth/components/SignInPage.tsx';
const entryKey = Object.keys(manifest).find((key) => manifest[key].isEntry);
if (!manifest[route]) throw new Error(`No chunk for ${route} in the manifest`);

const seen = new Set();
function visit(key) {
  if (seen.has(key)) return;
  seen.add(key);
  for (const imported of manifest[key].imports ?? []) visit(imported);
}
visit(entryKey);
visit(route);

let total = 0;
for (const key of seen) {
  const file = manifest[key].file;
  const gz = gzipSync(readFileSync(join(dist, file)), { level: 9 }).length;
  total += gz;
  console.log(`${(gz / 1024).toFixed(1).padStart(8)} kB  ${file}`);
}
console.log(`${(total / 1024).toFixed(1).padStart(8)} kB  total gzip for ${route}`);
