// Sign-in route JS gzip size: every JS file the sign-in page loads before it renders — the module
// scripts and modulepreload links of dist/index.html, plus the sign-in route's lazy chunk and its
// static imports as apps/web/scripts/route-size.mjs lists them from the Vite manifest.
// Goal: ≤ 250 KB gzip (level 9, as route-size.mjs measures).
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { row } from './lib/stats.mjs';

const GOAL_KB = 250;
const web = fileURLToPath(new URL('../apps/web/', import.meta.url));
const dist = join(web, 'dist');
const SIGN_IN_ROUTE = 'src/features/auth/components/SignInPage.tsx';

/** `assets/x.js` paths referenced by module scripts and modulepreload links. */
function indexHtmlScripts() {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const files = new Set();
  for (const tag of html.match(/<(script|link)\b[^>]*>/g) ?? []) {
    const isModule = /type="module"/.test(tag) || /rel="modulepreload"/.test(tag);
    const url = /(?:src|href)="\/?([^"]+\.js)"/.exec(tag)?.[1];
    if (isModule && url) files.add(url);
  }
  return files;
}

/** The route's chunk and what it imports, from route-size.mjs's listing (one `N kB  file` per line). */
function routeChunks() {
  const out = execFileSync(process.execPath, [join(web, 'scripts/route-size.mjs'), SIGN_IN_ROUTE], { encoding: 'utf8' });
  return new Set([...out.matchAll(/kB\s+(assets\/\S+\.js)$/gm)].map((m) => m[1]));
}

export async function benchSignInSize() {
  const files = new Set([...indexHtmlScripts(), ...routeChunks()]);
  const bytes = [...files].reduce((sum, file) => sum + gzipSync(readFileSync(join(dist, file)), { level: 9 }).length, 0);
  return [row(`web: sign-in route JS, gzip (${files.size} files)`, bytes / 1024, 'KB', GOAL_KB)];
}
