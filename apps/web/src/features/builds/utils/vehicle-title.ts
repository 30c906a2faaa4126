import type { Vehicle } from '../api/build-schema';

/** "1976 Harlan Half-ton pickup": year, make and model as the shop typed them. */
export function vehicleTitle(vehicle: Pick<Vehicle, 'year' | 'make' | 'model'>): string {
  return [vehicle.year, vehicle.make, vehicle.model].filter((part) => part.trim() !== '').join(' ');
}
