import { afterEach, describe, expect, it } from 'vitest';
import { createStyleRenderer, pageStyleNonce } from './style-renderer';

describe('style renderer nonce', () => {
  afterEach(() => document.head.querySelectorAll('meta[name="csp-nonce"]').forEach((meta) => meta.remove()));

  function setMeta(content: string) {
    const meta = document.createElement('meta');
    meta.name = 'csp-nonce';
    meta.content = content;
    document.head.append(meta);
  }

  it('reads the nonce the server wrote into the page, ignores the unfilled placeholder', () => {
    expect(pageStyleNonce(document)).toBeUndefined();
    setMeta('__CSP_NONCE__');
    expect(pageStyleNonce(document)).toBeUndefined();
    document.head.querySelector('meta[name="csp-nonce"]')!.setAttribute('content', 'abc123==');
    expect(pageStyleNonce(document)).toBe('abc123==');
  });

  it('puts the nonce on the style elements it creates', () => {
    setMeta('n0nce');
    expect(createStyleRenderer(document).styleElementAttributes).toEqual({ nonce: 'n0nce' });
  });
});
