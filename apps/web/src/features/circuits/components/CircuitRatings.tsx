import { formatPressure, formatTemperature } from '@linesmith/routing';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';

export interface CircuitRatingsProps {
  maxPressurePsi: number;
  maxTempF: number;
}

/** "150 psi · 250 °F" in the user's units. */
export function CircuitRatings({ maxPressurePsi, maxTempF }: CircuitRatingsProps) {
  const { units } = useUnitPreferences();
  return (
    <>
      {formatPressure(maxPressurePsi, units.pressure)} · {formatTemperature(maxTempF, units.temperature)}
    </>
  );
}
