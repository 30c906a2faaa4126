import type { ShopProfileFieldId, ShopProfileFormValues } from './shop-profile-form-schema';

const fieldIds: readonly ShopProfileFieldId[] = ['name', 'timezone', 'taxRatePercent'];

/** The fields the admin changed from the profile they started editing (compared as typed, trimmed). */
export function changedProfileFields(original: ShopProfileFormValues, edited: ShopProfileFormValues): ShopProfileFieldId[] {
  return fieldIds.filter((id) => original[id].trim() !== edited[id].trim());
}
