import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Spinner,
  Switch,
  Textarea,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { fieldErrors } from '../../../lib/field-errors';
import { conflictCurrent } from '../api/conflict-current';
import { supplierSchema, type Supplier } from '../api/supplier-schema';
import { useSaveSupplier } from '../hooks/useSaveSupplier';
import { supplierFormSchema, type SupplierFormValues } from '../utils/supplier-form-schema';

export interface SupplierDialogProps {
  supplier: Supplier | null;
  onClose(): void;
}

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

function valuesOf(supplier: Supplier | null): SupplierFormValues {
  return {
    name: supplier?.name ?? '',
    email: supplier?.email ?? '',
    accountNumber: supplier?.accountNumber ?? '',
    phone: supplier?.phone ?? '',
    notes: supplier?.notes ?? '',
    active: supplier?.active ?? true,
  };
}

export function SupplierDialog({ supplier, onClose }: SupplierDialogProps) {
  const styles = useStyles();
  const save = useSaveSupplier();
  const [version, setVersion] = useState(supplier?.version);
  const [values, setValues] = useState<SupplierFormValues>(valuesOf(supplier));
  const [errors, setErrors] = useState<Partial<Record<keyof SupplierFormValues, string>>>({});
  const [formError, setFormError] = useState<string | null>(null);

  function set<K extends keyof SupplierFormValues>(key: K, value: SupplierFormValues[K]) {
    setValues((current) => ({ ...current, [key]: value }));
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = supplierFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof SupplierFormValues>(parsed.error.issues));
      return;
    }
    setErrors({});
    try {
      await save.mutateAsync({ id: supplier?.id, body: supplier ? { ...parsed.data, version } : parsed.data });
      onClose();
    } catch (error) {
      const current = conflictCurrent(error, supplierSchema);
      if (current) {
        setVersion(current.version);
        setFormError(`Someone changed this supplier meanwhile (now "${current.name}", ${current.email || 'no e-mail'}). Save again to apply your values.`);
        return;
      }
      if (error instanceof ApiError) setErrors(fieldErrors<keyof SupplierFormValues>(error.issues));
      setFormError(describeError(error, 'The supplier could not be saved.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="modal">
      <DialogSurface>
        <form onSubmit={handleSubmit} noValidate aria-label={supplier ? `Edit ${supplier.name}` : 'New supplier'}>
          <DialogBody>
            <DialogTitle>{supplier ? `Edit ${supplier.name}` : 'New supplier'}</DialogTitle>
            <DialogContent className={styles.content}>
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <Field label="Name" required validationMessage={errors.name}>
                <Input value={values.name} onChange={(_, d) => set('name', d.value)} />
              </Field>
              <Field label="Order e-mail" hint="Order sheets are e-mailed to this address." validationMessage={errors.email}>
                <Input type="email" value={values.email} onChange={(_, d) => set('email', d.value)} />
              </Field>
              <Field label="Account number" validationMessage={errors.accountNumber}>
                <Input value={values.accountNumber} onChange={(_, d) => set('accountNumber', d.value)} />
              </Field>
              <Field label="Phone" validationMessage={errors.phone}>
                <Input type="tel" value={values.phone} onChange={(_, d) => set('phone', d.value)} />
              </Field>
              <Field label="Notes" validationMessage={errors.notes}>
                <Textarea value={values.notes} onChange={(_, d) => set('notes', d.value)} />
              </Field>
              <Switch label="Active" checked={values.active} onChange={(_, d) => set('active', d.checked)} />
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={onClose} disabled={save.isPending}>
                Cancel
              </Button>
              <Button type="submit" appearance="primary" disabled={save.isPending} icon={save.isPending ? <Spinner size="tiny" /> : undefined}>
                {supplier ? 'Save' : 'Create supplier'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
