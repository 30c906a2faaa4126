import { defaultUnitPreferences, unitPreferencesSchema, type UnitPreferences } from './unit-preferences-schema';

export const unitPreferencesStorageKey = 'linesmith.units';

const listeners = new Set<() => void>();
let cached: { raw: string | null; value: UnitPreferences } | null = null;

function readRaw(): string | null {
  try {
    return window.localStorage.getItem(unitPreferencesStorageKey);
  } catch {
    return null; // storage blocked (private mode, policy): fall back to the defaults
  }
}

function parse(raw: string | null): UnitPreferences {
  if (raw === null) return defaultUnitPreferences;
  try {
    const parsed = unitPreferencesSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : defaultUnitPreferences;
  } catch {
    return defaultUnitPreferences;
  }
}

/** The stored preference; the same object while the stored text is unchanged (useSyncExternalStore needs that). */
export function readUnitPreferences(): UnitPreferences {
  const raw = readRaw();
  if (!cached || cached.raw !== raw) cached = { raw, value: parse(raw) };
  return cached.value;
}

export function writeUnitPreferences(next: UnitPreferences): void {
  try {
    window.localStorage.setItem(unitPreferencesStorageKey, JSON.stringify(next));
  } catch {
    cached = { raw: null, value: next }; // not persisted, but this tab still follows the choice
  }
  for (const listener of listeners) listener();
}

/** Follows changes made in this tab and, through the `storage` event, in other tabs. */
export function subscribeUnitPreferences(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (event: StorageEvent) => {
    if (event.key === null || event.key === unitPreferencesStorageKey) listener();
  };
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}
