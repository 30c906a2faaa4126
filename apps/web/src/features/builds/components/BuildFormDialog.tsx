import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  MessageBar,
  MessageBarBody,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { ApiError } from '../../../lib/api-error';
import { fieldErrors } from '../../../lib/field-errors';
import type { CreateBuildInput } from '../api/build-input';
import type { Build } from '../api/build-schema';
import { conflictCurrentBuild } from '../api/conflict-current-build';
import { useCreateBuild } from '../hooks/useCreateBuild';
import { useUpdateBuild } from '../hooks/useUpdateBuild';
import { buildToFormInput, changedBuildFields, formValuesToInput } from '../utils/build-form-mapping';
import { buildFormSchema, emptyBuildForm, type BuildFormInput } from '../utils/build-form-schema';
import { BuildConflictNotice } from './BuildConflictNotice';
import { BuildFormFields, type BuildFormErrors } from './BuildFormFields';

export interface BuildFormDialogProps {
  /** The build to edit; without it the dialog creates a new build and opens it. */
  build?: Build;
  onClose(): void;
}

const useStyles = makeStyles({
  surface: { maxWidth: '640px' },
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/** API issue paths (`vehicle.make`, `customer.email`) onto the form's field names. */
const apiFieldNames: Record<string, keyof BuildFormInput> = {
  'vehicle.year': 'year',
  'vehicle.make': 'make',
  'vehicle.model': 'model',
  'vehicle.engine': 'engine',
  'vehicle.transmission': 'transmission',
  'customer.name': 'customerName',
  'customer.phone': 'customerPhone',
  'customer.email': 'customerEmail',
  notes: 'notes',
  status: 'status',
};

function apiFieldErrors(error: ApiError): BuildFormErrors {
  const errors: BuildFormErrors = {};
  for (const issue of error.issues) {
    const field = apiFieldNames[issue.path];
    if (field && errors[field] === undefined) errors[field] = issue.message;
  }
  return errors;
}

export function BuildFormDialog({ build, onClose }: BuildFormDialogProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  const createBuild = useCreateBuild();
  const updateBuild = useUpdateBuild();
  const pending = createBuild.isPending || updateBuild.isPending;
  // `original` is what the user started editing from; `conflict` is the server's newer build.
  const [original, setOriginal] = useState<Build | undefined>(build);
  const [conflict, setConflict] = useState<Build | null>(null);
  const [values, setValues] = useState<BuildFormInput>(build ? buildToFormInput(build) : emptyBuildForm);
  const [errors, setErrors] = useState<BuildFormErrors>({});
  const [formError, setFormError] = useState<string | null>(null);

  function set<K extends keyof BuildFormInput>(key: K, value: BuildFormInput[K]) {
    setValues((current) => ({ ...current, [key]: value }));
  }

  async function save(input: CreateBuildInput) {
    if (!original) {
      const created = await createBuild.mutateAsync(input);
      onClose();
      navigate(`/builds/${encodeURIComponent(created.id)}`);
      return;
    }
    const changes = changedBuildFields(original, input);
    if (Object.keys(changes).length === 0) {
      onClose();
      return;
    }
    await updateBuild.mutateAsync({ id: original.id, changes: { version: (conflict ?? original).version, ...changes } });
    onClose();
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = buildFormSchema().safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof BuildFormInput>(parsed.error.issues));
      return;
    }
    setErrors({});
    try {
      await save(formValuesToInput(parsed.data));
    } catch (error) {
      const current = conflictCurrentBuild(error);
      if (current) {
        setConflict(current);
        return;
      }
      if (error instanceof ApiError) setErrors(apiFieldErrors(error));
      setFormError(error instanceof Error ? error.message : 'The build could not be saved.');
    }
  }

  function adoptCurrentValues(current: Build) {
    setOriginal(current);
    setConflict(null);
    setValues(buildToFormInput(current));
  }

  const title = build ? 'Edit build' : 'New build';
  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="modal">
      <DialogSurface className={styles.surface}>
        <form onSubmit={handleSubmit} noValidate>
          <DialogBody>
            <DialogTitle>{title}</DialogTitle>
            <DialogContent className={styles.content}>
              {conflict && <BuildConflictNotice current={conflict} />}
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <BuildFormFields values={values} errors={errors} onChange={set} />
            </DialogContent>
            <DialogActions>
              {conflict && (
                <Button appearance="secondary" onClick={() => adoptCurrentValues(conflict)}>
                  Use current values
                </Button>
              )}
              <Button appearance="secondary" onClick={onClose} disabled={pending}>
                Cancel
              </Button>
              <Button
                type="submit"
                appearance="primary"
                disabled={pending}
                icon={pending ? <Spinner size="tiny" /> : undefined}
              >
                {conflict ? 'Retry with my changes' : build ? 'Save' : 'Create build'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
