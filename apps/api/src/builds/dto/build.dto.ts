import type { CircuitStatus } from '../../circuits/circuit-status.js';
import type { UserRefDto } from '../../users/user-ref.js';
import type { BuildStatus } from '../build-status.js';

export interface VehicleDto {
  year: string;
  make: string;
  model: string;
  engine: string;
  transmission: string;
}

export interface CustomerDto {
  name: string;
  phone: string;
  email: string;
}

export interface CircuitCountsDto {
  total: number;
  byStatus: Record<CircuitStatus, number>;
}

/** The API shape of a build, in lists and alone. */
export interface BuildDto {
  id: string;
  vehicle: VehicleDto;
  customer: CustomerDto;
  notes: string;
  status: BuildStatus;
  createdById: string | null;
  /** Null once the account is gone. */
  createdBy: UserRefDto | null;
  circuitCounts: CircuitCountsDto;
  version: number;
  createdAt: string;
  updatedAt: string;
}
