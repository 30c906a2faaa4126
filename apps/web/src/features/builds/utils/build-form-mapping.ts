import type { CreateBuildInput } from '../api/build-input';
import type { Build } from '../api/build-schema';
import type { BuildFormInput, BuildFormValues } from './build-form-schema';

/** The form's text fields for an existing build. */
export function buildToFormInput(build: Build): BuildFormInput {
  return {
    year: build.vehicle.year,
    make: build.vehicle.make,
    model: build.vehicle.model,
    engine: build.vehicle.engine,
    transmission: build.vehicle.transmission,
    customerName: build.customer.name,
    customerPhone: build.customer.phone,
    customerEmail: build.customer.email,
    notes: build.notes,
    status: build.status,
  };
}

export function formValuesToInput(values: BuildFormValues): CreateBuildInput {
  return {
    vehicle: {
      year: values.year,
      make: values.make,
      model: values.model,
      engine: values.engine,
      transmission: values.transmission,
    },
    customer: { name: values.customerName, phone: values.customerPhone, email: values.customerEmail },
    notes: values.notes,
    status: values.status,
  };
}

const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * Only the groups (vehicle, customer, notes, status) the user changed, so a retry after a
 * conflict does not overwrite what someone else changed in the others meanwhile.
 */
export function changedBuildFields(original: Build, edited: CreateBuildInput): Partial<CreateBuildInput> {
  const before: CreateBuildInput = {
    vehicle: { ...original.vehicle },
    customer: { ...original.customer },
    notes: original.notes,
    status: original.status,
  };
  const changes: Partial<CreateBuildInput> = {};
  if (!sameJson(before.vehicle, edited.vehicle)) changes.vehicle = edited.vehicle;
  if (!sameJson(before.customer, edited.customer)) changes.customer = edited.customer;
  if (before.notes !== edited.notes) changes.notes = edited.notes;
  if (before.status !== edited.status) changes.status = edited.status;
  return changes;
}
