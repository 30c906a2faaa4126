import { vi } from 'vitest';

export interface MockRequest {
  method: string;
  url: URL;
  headers: Headers;
  body: unknown;
}

type Handler = (request: MockRequest) => Response | Promise<Response>;

export function jsonResponse(status: number, body?: unknown): Response {
  if (body === undefined) return new Response(null, { status });
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** The API's error shape (API contract: `{ statusCode, code, message, issues }`). */
export function errorResponse(status: number, code: string, message: string, extra: Record<string, unknown> = {}) {
  return jsonResponse(status, { statusCode: status, code, message, issues: [], ...extra });
}

/**
 * A fake `fetch` that routes by method and path. Handlers registered later win, so a test can
 * override a default. Unrouted calls answer 404 so a missing handler fails loudly.
 */
export function createFetchMock() {
  const routes: { method: string; path: string | RegExp; handler: Handler }[] = [];
  const requests: MockRequest[] = [];

  const fetchFn = vi.fn(async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = new URL(String(input), 'http://linesmith.test');
    const method = (init?.method ?? 'GET').toUpperCase();
    const body = typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    const request: MockRequest = { method, url, headers: new Headers(init?.headers), body };
    requests.push(request);
    for (let i = routes.length - 1; i >= 0; i -= 1) {
      const route = routes[i];
      const matches = typeof route.path === 'string' ? route.path === url.pathname : route.path.test(url.pathname);
      if (route.method === method && matches) return route.handler(request);
    }
    return errorResponse(404, 'not_found', `No mock for ${method} ${url.pathname}`);
  });

  return {
    fetchFn: fetchFn as unknown as typeof fetch,
    requests,
    on(method: string, path: string | RegExp, handler: Handler) {
      routes.push({ method, path, handler });
      return this;
    },
    /** Registers a default that any handler registered earlier or later overrides. */
    fallback(method: string, path: string | RegExp, handler: Handler) {
      routes.unshift({ method, path, handler });
      return this;
    },
    callsTo(method: string, path: string) {
      return requests.filter((r) => r.method === method && r.url.pathname === path);
    },
  };
}

export type FetchMock = ReturnType<typeof createFetchMock>;
