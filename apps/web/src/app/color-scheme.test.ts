import { afterEach, describe, expect, it, vi } from 'vitest';
import { readColorScheme, saveColorScheme } from './color-scheme';

// Expected behaviour: the web brief (toggle persisted in localStorage, default from the OS
// preference, i.e. the CSS `prefers-color-scheme` media feature of Media Queries Level 5).
function preferDark(dark: boolean) {
  vi.stubGlobal('matchMedia', (query: string) => ({ matches: dark && query === '(prefers-color-scheme: dark)' }));
}

describe('colour scheme preference', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('follows the operating system until the user chooses', () => {
    preferDark(true);
    expect(readColorScheme()).toBe('dark');
    preferDark(false);
    expect(readColorScheme()).toBe('light');
  });

  it("keeps the user's choice over the operating system's", () => {
    preferDark(true);
    saveColorScheme('light');
    expect(readColorScheme()).toBe('light');
  });
});
