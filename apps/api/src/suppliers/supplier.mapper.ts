import type { SupplierDto } from './dto/supplier.dto.js';
import type { SupplierEntity } from './supplier.entity.js';

export function toSupplierDto(supplier: SupplierEntity): SupplierDto {
  return {
    id: supplier.id,
    name: supplier.name,
    email: supplier.email,
    accountNumber: supplier.accountNumber,
    phone: supplier.phone,
    notes: supplier.notes,
    active: supplier.active,
    version: supplier.version,
    createdAt: supplier.createdAt.toISOString(),
    updatedAt: supplier.updatedAt.toISOString(),
  };
}
