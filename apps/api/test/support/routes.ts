import type { TestApp } from './test-app.js';

interface ExpressLayer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
}

/** Every route the running app answers, as `METHOD /path`, read from Express's router. */
export function registeredRoutes(testApp: TestApp): string[] {
  const express = testApp.app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } };
  const keys = new Set<string>();
  for (const layer of express.router.stack) {
    if (!layer.route) continue;
    const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
    const methods = Object.keys(layer.route.methods).filter((name) => name !== '_all');
    // A route registered for every method (app.all) is one entry, `ALL <path>`.
    const names = layer.route.methods._all || methods.length > 20 ? ['all'] : methods;
    for (const method of names) for (const path of paths) keys.add(`${method.toUpperCase()} ${path}`);
  }
  return [...keys];
}
