// The engine pool's worker when the API runs from its TypeScript sources (Jest, ts tooling): Node 20
// cannot load .ts, so the hooks in ts-hooks.mjs transpile on load (with @swc/core, a dev
// dependency) and resolve the workspace libs to their sources. The built API uses
// evaluation.worker.js directly and needs none of this.
import { register } from 'node:module';

register('./ts-hooks.mjs', import.meta.url);
const worker = await import(new URL('./evaluation.worker.ts', import.meta.url).href);
export default worker.evaluateTask;
