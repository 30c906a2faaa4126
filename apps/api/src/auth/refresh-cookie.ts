import type { CookieOptions, Request, Response } from 'express';

export const REFRESH_COOKIE = 'ls_refresh';
/** The cookie is only ever sent to the auth endpoints. */
const COOKIE_PATH = '/api/auth';

function baseOptions(secure: boolean): CookieOptions {
  return { httpOnly: true, sameSite: 'strict', path: COOKIE_PATH, secure };
}

/** Secure when configured, and always when the request came over HTTPS (directly or via a trusted proxy). */
export function secureCookies(request: Request, configured: boolean): boolean {
  return configured || request.secure;
}

export function setRefreshCookie(response: Response, token: string, expiresAt: Date, secure: boolean): void {
  response.cookie(REFRESH_COOKIE, token, { ...baseOptions(secure), expires: expiresAt });
}

export function clearRefreshCookie(response: Response, secure: boolean): void {
  response.clearCookie(REFRESH_COOKIE, baseOptions(secure));
}

export function readRefreshCookie(request: Request): string | undefined {
  const value = (request.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
  return typeof value === 'string' && value.length > 0 ? value : undefined;
}
