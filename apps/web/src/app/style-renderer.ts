import { createDOMRenderer, type GriffelRenderer } from '@fluentui/react-components';

/**
 * Fluent UI writes its styles into <style> elements at run time. The server allows them by a
 * per-page nonce (Content-Security-Policy `style-src 'nonce-…'`, no 'unsafe-inline') and writes
 * that nonce into the page's `csp-nonce` meta element; the placeholder left in place means no
 * server filled it in (the Vite dev server), where no policy applies.
 */
export function pageStyleNonce(doc: Document): string | undefined {
  const nonce = doc.querySelector<HTMLMetaElement>('meta[name="csp-nonce"]')?.content;
  return nonce && nonce !== '__CSP_NONCE__' ? nonce : undefined;
}

export function createStyleRenderer(doc: Document): GriffelRenderer {
  const nonce = pageStyleNonce(doc);
  return createDOMRenderer(doc, nonce ? { styleElementAttributes: { nonce } } : {});
}
