import express, { type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The placeholder in the web app's index.html that each page view replaces with its nonce. */
export const CSP_NONCE_PLACEHOLDER = '__CSP_NONCE__';

/** A fresh nonce per response, for the Content-Security-Policy and the page's style elements. */
export function cspNonce(_request: Request, response: Response, next: NextFunction): void {
  response.locals.cspNonce = randomBytes(16).toString('base64');
  next();
}

export function nonceOf(response: Response): string {
  return String(response.locals.cspNonce);
}

/**
 * Serves the built web app: its hashed assets as static files, and index.html for every other
 * non-API page (the client-side router's paths) with this response's nonce written in, so the
 * styles Fluent inserts at run time can be allowed by nonce instead of 'unsafe-inline'.
 */
export function serveWebApp(webDistDir: string): RequestHandler[] {
  const indexHtml = readFileSync(join(webDistDir, 'index.html'), 'utf8');
  const assets = express.static(webDistDir, { index: false, fallthrough: true });
  const page: RequestHandler = (request, response, next) => {
    if ((request.method !== 'GET' && request.method !== 'HEAD') || /^\/api(\/|$)/.test(request.path)) return next();
    response
      .status(200)
      .type('html')
      .setHeader('Cache-Control', 'no-store')
      .send(indexHtml.replaceAll(CSP_NONCE_PLACEHOLDER, nonceOf(response)));
  };
  return [
    (request, response, next) => (/^\/api(\/|$)/.test(request.path) ? next() : assets(request, response, next)),
    page,
  ];
}
