// Runs bench/run.ts as plain JavaScript: rolldown (Vite's bundler) bundles it with the workspace
// libs from source (@linesmith/source condition) into one ES module in a temporary folder, so the
// timings are those of native code, not of a transforming loader.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { build } from 'rolldown';

const outDir = mkdtempSync(join(tmpdir(), 'linesmith-routing-bench-'));
try {
  const file = join(outDir, 'run.mjs');
  await build({
    input: fileURLToPath(new URL('./run.ts', import.meta.url)),
    platform: 'node',
    logLevel: 'silent',
    resolve: { conditionNames: ['@linesmith/source', 'import', 'module', 'node', 'default'] },
    output: { file, format: 'esm' },
  });
  const { benchRouting } = await import(pathToFileURL(file).href);
  const rows = await benchRouting();
  console.table(rows.map((r) => ({ ...r, median: Number(r.median.toFixed(3)) })));
  process.exitCode = rows.every((r) => r.ok !== false) ? 0 : 1;
} finally {
  rmSync(outDir, { recursive: true, force: true });
}
