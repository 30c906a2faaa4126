import { Button, Field, Input, MessageBar, MessageBarBody, Select, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { SaveRegular } from '@fluentui/react-icons';
import { useMemo, useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { fieldErrors } from '../../../lib/field-errors';
import { formatDateTime } from '../../users/utils/format-date-time';
import { conflictCurrentShopProfile } from '../api/conflict-current-shop-profile';
import type { SaveShopProfileInput, ShopProfile } from '../api/shop-profile-schema';
import { useSaveShopProfile } from '../hooks/useSaveShopProfile';
import { changedProfileFields } from '../utils/changed-profile-fields';
import {
  maxTaxRatePercent,
  shopProfileFormSchema,
  shopProfileFormValues,
  timeZoneChoices,
  type ShopProfileFieldId,
} from '../utils/shop-profile-form-schema';
import { ShopProfileConflictNotice } from './ShopProfileConflictNotice';

export interface ShopProfileFormProps {
  profile: ShopProfile;
}

type Errors = Partial<Record<ShopProfileFieldId, string>>;

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, maxWidth: '36rem' },
  rate: { maxWidth: '10rem' },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
});

export function ShopProfileForm({ profile }: ShopProfileFormProps) {
  const styles = useStyles();
  const save = useSaveShopProfile();
  // `original` is the profile the admin started editing from; `conflict` the server's newer one.
  const [original, setOriginal] = useState<ShopProfile>(profile);
  const [conflict, setConflict] = useState<ShopProfile | null>(null);
  const [values, setValues] = useState(() => shopProfileFormValues(profile));
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  const changed = changedProfileFields(shopProfileFormValues(original), values);
  const zones = useMemo(() => {
    const known = timeZoneChoices();
    // A zone stored before this browser's list knew it stays choosable.
    return known.includes(values.timezone) ? known : [values.timezone, ...known];
  }, [values.timezone]);

  function setValue(id: ShopProfileFieldId, text: string) {
    setValues((current) => ({ ...current, [id]: text }));
    setSaved(false);
  }

  function adopt(next: ShopProfile) {
    setOriginal(next);
    setValues(shopProfileFormValues(next));
    setConflict(null);
    setErrors({});
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    setSaved(false);
    const parsed = shopProfileFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<ShopProfileFieldId>(parsed.error.issues));
      return;
    }
    setErrors({});
    // Only the changed fields go out, against the version they were edited from (or, after a
    // conflict, the server's newer one): someone else's other changes survive a re-apply.
    const input: SaveShopProfileInput = { version: (conflict ?? original).version };
    for (const id of changed) Object.assign(input, { [id]: parsed.data[id] });
    try {
      adopt(await save.mutateAsync(input));
      setSaved(true);
    } catch (error) {
      const current = conflictCurrentShopProfile(error);
      if (current) {
        setConflict(current);
        return;
      }
      if (error instanceof ApiError && error.issues.length > 0) setErrors(fieldErrors<ShopProfileFieldId>(error.issues));
      setFormError(error instanceof Error ? error.message : 'The shop profile could not be saved.');
    }
  }

  return (
    <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Shop profile">
      {conflict && <ShopProfileConflictNotice current={conflict} changedByMe={changed} />}
      {formError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The shop profile could not be saved: {formError}</MessageBarBody>
        </MessageBar>
      )}
      {saved && (
        <MessageBar intent="success" role="status">
          <MessageBarBody>Shop profile saved.</MessageBarBody>
        </MessageBar>
      )}
      <Field label="Shop name" required validationMessage={errors.name}>
        <Input value={values.name} onChange={(_, data) => setValue('name', data.value)} maxLength={120} />
      </Field>
      <Field
        label="Time zone"
        required
        hint="Dates on shop sheets and order sheets are printed in this zone."
        validationMessage={errors.timezone}
      >
        <Select value={values.timezone} onChange={(_, data) => setValue('timezone', data.value)}>
          {zones.map((zone) => (
            <option key={zone} value={zone}>
              {zone}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Sales tax rate (%)"
        required
        hint={`Applied to the order sheets drafted from now on; a sheet keeps the rate it was priced with. 0 to ${maxTaxRatePercent} %, at most two decimals.`}
        validationMessage={errors.taxRatePercent}
      >
        <Input
          className={styles.rate}
          inputMode="decimal"
          value={values.taxRatePercent}
          onChange={(_, data) => setValue('taxRatePercent', data.value)}
          contentAfter="%"
        />
      </Field>
      <div className={styles.actions}>
        <Button
          type="submit"
          appearance="primary"
          icon={save.isPending ? <Spinner size="tiny" /> : <SaveRegular />}
          disabled={save.isPending || (changed.length === 0 && !conflict)}
        >
          {conflict ? 'Re-apply my changes' : 'Save'}
        </Button>
        {conflict && (
          <Button appearance="secondary" onClick={() => adopt(conflict)} disabled={save.isPending}>
            Use current values
          </Button>
        )}
        {!conflict && changed.length > 0 && (
          <Button appearance="secondary" onClick={() => adopt(original)} disabled={save.isPending}>
            Discard changes
          </Button>
        )}
        <Text size={200}>
          Last saved {formatDateTime(original.updatedAt)} · version {original.version}
        </Text>
      </div>
    </form>
  );
}
