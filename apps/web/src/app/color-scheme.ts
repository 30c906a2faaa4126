export type ColorScheme = 'light' | 'dark';

const storageKey = 'linesmith.colorScheme';

/** The saved choice, else the operating system's preference. */
export function readColorScheme(): ColorScheme {
  const saved = safeStorage()?.getItem(storageKey);
  if (saved === 'light' || saved === 'dark') return saved;
  const prefersDark = typeof window.matchMedia === 'function' && window.matchMedia('(prefers-color-scheme: dark)').matches;
  return prefersDark ? 'dark' : 'light';
}

export function saveColorScheme(scheme: ColorScheme): void {
  safeStorage()?.setItem(storageKey, scheme);
}

// Storage can be disabled (private modes, strict policies); the toggle then lasts for the session.
function safeStorage(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}
