// Runs the catalogue benchmark without a TypeScript loader: Vite's module runner transpiles run.ts.
// Usage (from the repository root): node libs/catalog/bench/cli.mjs
import { runnerImport } from 'vite';

const { module } = await runnerImport(new URL('./run.ts', import.meta.url).pathname);
for (const r of await module.benchCatalog()) {
  const verdict = r.ok === undefined ? '' : r.ok ? `  ok (goal ≤ ${r.goal} ${r.unit})` : `  OVER GOAL (≤ ${r.goal} ${r.unit})`;
  console.log(`${r.name}: median ${r.median.toFixed(4)} ${r.unit}${verdict}`);
}
