import { useCallback, useSyncExternalStore } from 'react';
import type { UnitPreferences } from '../utils/unit-preferences-schema';
import { readUnitPreferences, subscribeUnitPreferences, writeUnitPreferences } from '../utils/unit-preferences-store';

export interface UseUnitPreferences {
  units: UnitPreferences;
  setUnits(change: Partial<UnitPreferences>): void;
}

/** The one place the app reads and changes the user's display units (kept in localStorage). */
export function useUnitPreferences(): UseUnitPreferences {
  const units = useSyncExternalStore(subscribeUnitPreferences, readUnitPreferences, readUnitPreferences);
  const setUnits = useCallback((change: Partial<UnitPreferences>) => {
    writeUnitPreferences({ ...readUnitPreferences(), ...change });
  }, []);
  return { units, setUnits };
}
