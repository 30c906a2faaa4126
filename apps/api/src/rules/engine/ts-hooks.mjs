// Module hooks for source-worker.mjs: TypeScript files are transpiled by @swc/core as they load, a
// relative `.js` import finds its `.ts` source, and the workspace libs resolve through their
// `@linesmith/source` export condition (their TypeScript sources), as in Jest and Vite.
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { transformSync } from '@swc/core';

const CONDITION = '@linesmith/source';

export async function resolve(specifier, context, nextResolve) {
  const conditions = context.conditions.includes(CONDITION) ? context.conditions : [CONDITION, ...context.conditions];
  try {
    return await nextResolve(specifier, { ...context, conditions });
  } catch (error) {
    if (specifier.startsWith('.') && specifier.endsWith('.js')) return nextResolve(`${specifier.slice(0, -3)}.ts`, { ...context, conditions });
    throw error;
  }
}

export async function load(url, context, nextLoad) {
  if (!url.startsWith('file:') || !url.endsWith('.ts')) return nextLoad(url, context);
  const filename = fileURLToPath(url);
  const { code } = transformSync(await readFile(filename, 'utf8'), {
    filename,
    jsc: { parser: { syntax: 'typescript' }, target: 'es2022' },
    module: { type: 'es6' },
    sourceMaps: 'inline',
  });
  return { format: 'module', source: code, shortCircuit: true };
}
