import type { Vehicle } from '../api/build-schema';

/** "1976 pickup, half-ton" style one-liner: year, make and model as the shop says them. */
export function vehicleTitle(vehicle: Pick<Vehicle, 'year' | 'make' | 'model'>): string {
  return [vehicle.year ?? '', vehicle.make, vehicle.model].filter((part) => String(part).trim() !== '').join(' ');
}
