/** Only same-app paths may follow sign-in, so a crafted link cannot send the user elsewhere. */
export function safeReturnPath(next: string | null | undefined, fallback = '/'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  if (next === '/sign-in' || next.startsWith('/sign-in?')) return fallback;
  return next;
}
