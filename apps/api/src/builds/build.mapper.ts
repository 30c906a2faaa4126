import { CIRCUIT_STATUSES, type CircuitStatus } from '../circuits/circuit-status.js';
import { toUserRef } from '../users/user-ref.js';
import type { BuildEntity } from './build.entity.js';
import type { BuildDto, CircuitCountsDto } from './dto/build.dto.js';

export function emptyCircuitCounts(): CircuitCountsDto {
  return {
    total: 0,
    byStatus: Object.fromEntries(CIRCUIT_STATUSES.map((status) => [status, 0])) as Record<CircuitStatus, number>,
  };
}

/** Needs `createdBy` joined to name the creator. */
export function toBuildDto(build: BuildEntity, circuitCounts: CircuitCountsDto = emptyCircuitCounts()): BuildDto {
  return {
    id: build.id,
    vehicle: {
      year: build.vehicleYear,
      make: build.vehicleMake,
      model: build.vehicleModel,
      engine: build.vehicleEngine,
      transmission: build.vehicleTransmission,
    },
    customer: { name: build.customerName, phone: build.customerPhone, email: build.customerEmail },
    notes: build.notes,
    status: build.status,
    createdById: build.createdById,
    createdBy: toUserRef(build.createdBy),
    circuitCounts,
    version: build.version,
    createdAt: build.createdAt.toISOString(),
    updatedAt: build.updatedAt.toISOString(),
  };
}
