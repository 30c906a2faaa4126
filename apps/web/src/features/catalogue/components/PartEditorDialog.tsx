import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Divider,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Select,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { partKindSchema, type PartKind } from '@linesmith/catalog';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { conflictCurrent } from '../api/conflict-current';
import { partRecordSchema, type PartRecord } from '../api/part-record-schema';
import type { Supplier } from '../api/supplier-schema';
import { useSavePart } from '../hooks/useSavePart';
import { attributeValuesOf, checkAttributes, emptyAttributeValues, type AttributeValues } from '../utils/attribute-values';
import { partKindLabels } from '../utils/part-kind-labels';
import { centsToText, partFormSchema, toCommonFields, type PartFormValues } from '../utils/part-form-schema';
import { AttributeFieldsEditor } from './AttributeFieldsEditor';

export interface PartEditorDialogProps {
  /** Null for a new part. */
  part: PartRecord | null;
  suppliers: readonly Supplier[];
  onClose(): void;
}

const useStyles = makeStyles({
  surface: { maxWidth: '760px', width: '100%' },
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  grid: { display: 'grid', gridTemplateColumns: 'repeat(2, minmax(0, 1fr))', gap: tokens.spacingVerticalM },
  wide: { gridColumn: '1 / -1' },
});

function formValuesOf(part: PartRecord | null): PartFormValues {
  if (!part) {
    return { kind: 'hose', description: '', supplierId: '', supplierPartNumber: '', price: '', saleUnitType: 'each', packSize: '', stockOnHand: '' };
  }
  return {
    kind: part.kind,
    description: part.description,
    supplierId: part.supplierId ?? '',
    supplierPartNumber: part.supplierPartNumber,
    price: centsToText(part.priceCents),
    saleUnitType: part.saleUnit.type,
    packSize: part.saleUnit.type === 'pack' ? String(part.saleUnit.size) : '',
    stockOnHand: String(part.stockOnHand),
  };
}

/** Create or edit a part: common fields, then the kind's own fields checked by the catalogue library. */
export function PartEditorDialog({ part, suppliers, onClose }: PartEditorDialogProps) {
  const styles = useStyles();
  const savePart = useSavePart();
  const [base, setBase] = useState<PartRecord | null>(part);
  const [conflict, setConflict] = useState<PartRecord | null>(null);
  const [values, setValues] = useState<PartFormValues>(formValuesOf(part));
  const [attributes, setAttributes] = useState<AttributeValues>(
    part ? attributeValuesOf(part.kind, part.attributes) : emptyAttributeValues('hose'),
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const kind = partKindSchema.safeParse(values.kind).data ?? 'hose';

  function set<K extends keyof PartFormValues>(key: K, value: PartFormValues[K]) {
    setValues((current) => ({ ...current, [key]: value }));
  }

  function changeKind(next: PartKind) {
    set('kind', next);
    setAttributes(emptyAttributeValues(next));
    setErrors({});
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const common = partFormSchema.safeParse(values);
    const checked = checkAttributes(kind, attributes);
    const nextErrors: Record<string, string> = checked.ok ? {} : { ...checked.errors };
    if (!common.success) {
      for (const issue of common.error.issues) nextErrors[String(issue.path[0])] ??= issue.message;
    }
    setErrors(nextErrors);
    if (!common.success || !checked.ok) {
      setFormError('Some fields need attention before the part can be saved.');
      return;
    }
    const fields = toCommonFields(common.data);
    const current = conflict ?? base;
    // Stock changes go through adjustments (with a reason), so an edit never sends stock on hand.
    const { stockOnHand, ...editable } = fields;
    const body = current
      ? { ...editable, attributes: checked.attributes, version: current.version }
      : { ...editable, stockOnHand, attributes: checked.attributes };
    try {
      await savePart.mutateAsync({ id: part?.id, body });
      onClose();
    } catch (error) {
      const newer = conflictCurrent(error, partRecordSchema);
      if (newer) {
        setConflict(newer);
        setFormError('Someone changed this part while you were editing. Save again to apply your values over theirs, or use theirs.');
        return;
      }
      if (error instanceof ApiError) {
        const apiErrors: Record<string, string> = {};
        for (const issue of error.issues) {
          const key = issue.path.replace(/^attributes\./, '');
          apiErrors[key] ??= issue.message;
        }
        setErrors(apiErrors);
      }
      setFormError(describeError(error, 'The part could not be saved.'));
    }
  }

  function adoptCurrent(current: PartRecord) {
    setBase(current);
    setConflict(null);
    setValues(formValuesOf(current));
    setAttributes(attributeValuesOf(current.kind, current.attributes));
    setFormError(null);
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="modal">
      <DialogSurface className={styles.surface}>
        <form onSubmit={handleSubmit} noValidate aria-label={part ? `Edit ${part.description}` : 'New part'}>
          <DialogBody>
            <DialogTitle>{part ? `Edit ${part.description}` : 'New part'}</DialogTitle>
            <DialogContent className={styles.content}>
              {formError && (
                <MessageBar intent={conflict ? 'warning' : 'error'} role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <div className={styles.grid}>
                <Field label="Kind" required validationMessage={errors.kind}>
                  <Select
                    value={values.kind}
                    disabled={part !== null}
                    onChange={(_, d) => changeKind(partKindSchema.parse(d.value))}
                  >
                    {partKindSchema.options.map((k) => (
                      <option key={k} value={k}>
                        {partKindLabels[k]}
                      </option>
                    ))}
                  </Select>
                </Field>
                <Field label="Supplier" validationMessage={errors.supplierId}>
                  <Select value={values.supplierId} onChange={(_, d) => set('supplierId', d.value)}>
                    <option value="">No supplier yet</option>
                    {suppliers.map((s) => (
                      <option key={s.id} value={s.id}>
                        {s.name}
                      </option>
                    ))}
                  </Select>
                </Field>
                <Field className={styles.wide} label="Description" required validationMessage={errors.description}>
                  <Input value={values.description} onChange={(_, d) => set('description', d.value)} />
                </Field>
                <Field label="Supplier part number" validationMessage={errors.supplierPartNumber}>
                  <Input value={values.supplierPartNumber} onChange={(_, d) => set('supplierPartNumber', d.value)} />
                </Field>
                <Field label="Price per sale unit" validationMessage={errors.price}>
                  <Input inputMode="decimal" value={values.price} onChange={(_, d) => set('price', d.value)} />
                </Field>
                <Field label="Sale unit" required validationMessage={errors.saleUnitType}>
                  <Select value={values.saleUnitType} onChange={(_, d) => set('saleUnitType', d.value)}>
                    <option value="each">Each</option>
                    <option value="foot">By the foot</option>
                    <option value="pack">By the pack</option>
                  </Select>
                </Field>
                {values.saleUnitType === 'pack' && (
                  <Field label="Pack size" required validationMessage={errors.packSize}>
                    <Input inputMode="numeric" value={values.packSize} onChange={(_, d) => set('packSize', d.value)} />
                  </Field>
                )}
                {!part && (
                  <Field label="Stock on hand" hint="Later changes go through Adjust stock." validationMessage={errors.stockOnHand}>
                    <Input inputMode="decimal" value={values.stockOnHand} onChange={(_, d) => set('stockOnHand', d.value)} />
                  </Field>
                )}
              </div>
              <Divider>{partKindLabels[kind]} details</Divider>
              <AttributeFieldsEditor
                kind={kind}
                values={attributes}
                errors={errors}
                onChange={(key, value) => setAttributes((current) => ({ ...current, [key]: value }))}
              />
            </DialogContent>
            <DialogActions>
              {conflict && (
                <Button appearance="secondary" onClick={() => adoptCurrent(conflict)}>
                  Use current values
                </Button>
              )}
              <Button appearance="secondary" onClick={onClose} disabled={savePart.isPending}>
                Cancel
              </Button>
              <Button
                type="submit"
                appearance="primary"
                disabled={savePart.isPending}
                icon={savePart.isPending ? <Spinner size="tiny" /> : undefined}
              >
                {part ? 'Save' : 'Create part'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
