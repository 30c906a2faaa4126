import {
  Button,
  MessageBar,
  MessageBarBody,
  Spinner,
  Table,
  TableBody,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { SaveRegular } from '@fluentui/react-icons';
import type { ShopRules } from '@linesmith/routing';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { fieldErrors } from '../../../lib/field-errors';
import { formatDateTime } from '../../users/utils/format-date-time';
import { conflictCurrentShopRules } from '../api/conflict-current-shop-rules';
import type { ShopRulesRecord } from '../api/shop-rules-record-schema';
import { useSaveShopRules } from '../hooks/useSaveShopRules';
import { changedRuleFields, reapplyRuleChanges } from '../utils/reapply-rule-changes';
import { readRuleValue, shopRuleFields, type ShopRuleFieldId } from '../utils/shop-rule-fields';
import { fieldOfApiIssue, shopRulesFormSchema, shopRulesFormValues } from '../utils/shop-rules-form-schema';
import { ruleValueDisplay, ruleValueText } from '../utils/rule-value-text';
import { ShopRuleRow } from './ShopRuleRow';
import { ShopRulesConflictNotice } from './ShopRulesConflictNotice';

export interface ShopRulesFormProps {
  record: ShopRulesRecord;
  /** Admins edit; anyone else who reaches the page reads. */
  canEdit: boolean;
}

type Errors = Partial<Record<ShopRuleFieldId, string>>;

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

export function ShopRulesForm({ record, canEdit }: ShopRulesFormProps) {
  const styles = useStyles();
  const save = useSaveShopRules();
  // `original` is the record the admin started editing from; `conflict` the server's newer one.
  const [original, setOriginal] = useState<ShopRulesRecord>(record);
  const [conflict, setConflict] = useState<ShopRulesRecord | null>(null);
  const [values, setValues] = useState(() => shopRulesFormValues(record.rules));
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [changedByMe, setChangedByMe] = useState<ShopRuleFieldId[]>([]);

  const originalTexts = shopRulesFormValues(original.rules);
  const dirty = shopRuleFields.some((field) => values[field.id].trim() !== originalTexts[field.id]);
  const defaults = original.defaults;

  function setValue(id: ShopRuleFieldId, text: string) {
    setValues((current) => ({ ...current, [id]: text }));
    setSaved(false);
  }

  function adopt(next: ShopRulesRecord) {
    setOriginal(next);
    setValues(shopRulesFormValues(next.rules));
    setConflict(null);
    setErrors({});
    setChangedByMe([]);
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    setSaved(false);
    const parsed = shopRulesFormSchema(original.rules).safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<ShopRuleFieldId>(parsed.error.issues));
      return;
    }
    setErrors({});
    const base = conflict ?? original;
    const rules: ShopRules = conflict ? reapplyRuleChanges(original.rules, parsed.data, conflict.rules) : parsed.data;
    try {
      adopt(await save.mutateAsync({ version: base.version, rules }));
      setSaved(true);
    } catch (error) {
      const current = conflictCurrentShopRules(error);
      if (current) {
        setConflict(current);
        setChangedByMe(changedRuleFields(original.rules, parsed.data).map((field) => field.id));
        return;
      }
      if (error instanceof ApiError && error.issues.length > 0) {
        setErrors(
          fieldErrors<ShopRuleFieldId>(
            error.issues.flatMap((issue) => {
              const id = fieldOfApiIssue(issue.path);
              return id ? [{ path: [id], message: issue.message }] : [];
            }),
          ),
        );
      }
      setFormError(error instanceof Error ? error.message : 'The shop rules could not be saved.');
    }
  }

  return (
    <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Shop rules">
      {conflict && <ShopRulesConflictNotice current={conflict} changedByMe={changedByMe} />}
      {formError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The shop rules could not be saved: {formError}</MessageBarBody>
        </MessageBar>
      )}
      {saved && (
        <MessageBar intent="success" role="status">
          <MessageBarBody>Shop rules saved. New checks of every circuit use them.</MessageBarBody>
        </MessageBar>
      )}
      <Table size="small" aria-label="Rules and defaults">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Rule</TableHeaderCell>
            <TableHeaderCell>Value</TableHeaderCell>
            <TableHeaderCell>Default</TableHeaderCell>
            <TableHeaderCell>Origin of the default</TableHeaderCell>
            <TableHeaderCell>{canEdit ? 'Reset' : ''}</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {shopRuleFields.map((field) => {
            const defaultValue = readRuleValue(defaults, field);
            const defaultText = ruleValueText(defaultValue, field.unit);
            return (
              <ShopRuleRow
                key={field.id}
                field={field}
                value={values[field.id]}
                error={errors[field.id]}
                defaultText={ruleValueDisplay(defaultValue, field.unit)}
                origin={field.origin ?? original.origins[field.rule]}
                readOnly={!canEdit}
                isDefault={values[field.id].trim() === defaultText}
                onChange={(text) => setValue(field.id, text)}
                onReset={() => setValue(field.id, defaultText)}
              />
            );
          })}
        </TableBody>
      </Table>
      <div className={styles.actions}>
        {canEdit && (
          <>
            <Button
              type="submit"
              appearance="primary"
              icon={save.isPending ? <Spinner size="tiny" /> : <SaveRegular />}
              disabled={save.isPending || (!dirty && !conflict)}
            >
              {conflict ? 'Re-apply my changes' : 'Save'}
            </Button>
            {conflict && (
              <Button appearance="secondary" onClick={() => adopt(conflict)} disabled={save.isPending}>
                Use current values
              </Button>
            )}
            {!conflict && dirty && (
              <Button appearance="secondary" onClick={() => adopt(original)} disabled={save.isPending}>
                Discard changes
              </Button>
            )}
          </>
        )}
        <Text size={200}>
          {original.updatedAt ? `Last saved ${formatDateTime(original.updatedAt)}` : 'Never changed: the defaults apply'} ·
          version {original.version}
        </Text>
      </div>
    </form>
  );
}
