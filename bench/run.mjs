// npm run bench: runs every benchmark module, prints one table and writes bench/results.json.
// Each module exports an async function returning rows { name, median, unit, goal?, ok? }.
// TypeScript modules are loaded through Vite's module runner (no separate TS loader needed); the
// .mjs suites (API, export, web size, editor) are plain Node modules. The API and browser suites
// need the server that scripts/bench.sh starts (LINESMITH_URL).
import { writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import { fileURLToPath } from 'node:url';
import { runnerImport } from 'vite';

const root = fileURLToPath(new URL('..', import.meta.url));
const suites = [
  { file: 'libs/catalog/bench/run.ts', fn: 'benchCatalog' },
  { file: 'libs/routing/bench/run.ts', fn: 'benchRouting' },
  { file: 'bench/check-endpoint.mjs', fn: 'benchCheckEndpoint' },
  { file: 'bench/order-sheet-export.mjs', fn: 'benchOrderSheetExport' },
  { file: 'bench/sign-in-size.mjs', fn: 'benchSignInSize' },
  { file: 'bench/editor-drag.mjs', fn: 'benchEditorDrag' },
];
const load = (file) => (file.endsWith('.ts') ? runnerImport(`${root}${file}`).then((r) => r.module) : import(`${root}${file}`));

const rows = [];
for (const suite of suites) {
  try {
    const module = await load(suite.file);
    rows.push(...(await module[suite.fn]()));
  } catch (error) {
    rows.push({ name: `${suite.file} failed: ${error instanceof Error ? error.message : error}`, median: NaN, unit: '', ok: false });
  }
}

const fmt = (n) => (Number.isFinite(n) ? (Math.abs(n) >= 100 ? n.toFixed(0) : n.toPrecision(3)) : '—');
console.log('\n| benchmark | median | goal | verdict |\n|---|---|---|---|');
for (const r of rows) {
  const goal = r.goal === undefined ? '' : `≤ ${r.goal} ${r.unit}`;
  const verdict = r.ok === undefined ? '' : r.ok ? 'meets goal' : 'MISSES GOAL';
  console.log(`| ${r.name} | ${fmt(r.median)} ${r.unit} | ${goal} | ${verdict} |`);
}
const machine = `${cpus().length} × ${cpus()[0]?.model ?? 'cpu'}, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}`;
writeFileSync(`${root}bench/results.json`, `${JSON.stringify({ date: new Date().toISOString(), machine, rows }, null, 2)}\n`);
console.log(`\n${machine}\nwritten to bench/results.json`);
process.exitCode = rows.some((r) => r.ok === false) ? 1 : 0;
