import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Radio,
  RadioGroup,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { SearchRegular } from '@fluentui/react-icons';
import { useState, type FormEvent } from 'react';
import { fieldErrors } from '../../../lib/field-errors';
import { useIdentifyThread } from '../hooks/useIdentifyThread';
import {
  emptyIdentifyForm,
  identifyFormSchema,
  type DiameterUnit,
  type IdentifyFormField,
  type IdentifyFormValues,
  type TaperAnswer,
  type FlankAnswer,
  type ThreadMeasure,
} from '../utils/identify-form-schema';
import { MeasuringHelp } from './MeasuringHelp';
import { ThreadCandidatesTable } from './ThreadCandidatesTable';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, maxWidth: '640px' },
  row: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-start', gap: tokens.spacingHorizontalL },
  value: { width: '180px' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

/** Measured diameter and pitch in, candidate standards and sizes out, with how to tell them apart. */
export function ThreadIdentifierSection() {
  const styles = useStyles();
  const identify = useIdentifyThread();
  const [values, setValues] = useState<IdentifyFormValues>(emptyIdentifyForm);
  const [errors, setErrors] = useState<Partial<Record<IdentifyFormField, string>>>({});

  const set = <K extends keyof IdentifyFormValues>(key: K, value: IdentifyFormValues[K]) =>
    setValues((current) => ({ ...current, [key]: value }));

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const parsed = identifyFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<IdentifyFormField>(parsed.error.issues));
      return;
    }
    setErrors({});
    identify.mutate(parsed.data);
  }

  function clear() {
    setValues(emptyIdentifyForm);
    setErrors({});
    identify.reset();
  }

  const diameterHint = values.diameterUnit === 'in' ? 'Decimal or fraction: 0.555 or 9/16' : 'For example 14.1';
  const threadHint = values.threadMeasure === 'tpi' ? 'Crests per inch, for example 18' : 'Crest to crest, for example 1.5';

  return (
    <div className={styles.root}>
      <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Thread identifier">
        {errors.form && (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>{errors.form}</MessageBarBody>
          </MessageBar>
        )}
        <div className={styles.row}>
          <Field label="Measured outside diameter" hint={diameterHint} validationMessage={errors.diameter} className={styles.value}>
            <Input
              value={values.diameter}
              inputMode="decimal"
              contentAfter={values.diameterUnit}
              onChange={(_, data) => set('diameter', data.value)}
            />
          </Field>
          <Field label="Diameter unit">
            <RadioGroup
              layout="horizontal"
              value={values.diameterUnit}
              onChange={(_, data) => set('diameterUnit', data.value as DiameterUnit)}
            >
              <Radio value="in" label="in" />
              <Radio value="mm" label="mm" />
            </RadioGroup>
          </Field>
        </div>
        <div className={styles.row}>
          <Field
            label={values.threadMeasure === 'tpi' ? 'Threads per inch' : 'Pitch (mm)'}
            hint={threadHint}
            validationMessage={errors.thread}
            className={styles.value}
          >
            <Input value={values.thread} inputMode="decimal" onChange={(_, data) => set('thread', data.value)} />
          </Field>
          <Field label="Thread measured as">
            <RadioGroup
              layout="horizontal"
              value={values.threadMeasure}
              onChange={(_, data) => set('threadMeasure', data.value as ThreadMeasure)}
            >
              <Radio value="tpi" label="Threads per inch" />
              <Radio value="pitch" label="Pitch (mm)" />
            </RadioGroup>
          </Field>
        </div>
        <Field label="Does the thread taper?">
          <RadioGroup layout="horizontal" value={values.tapers} onChange={(_, data) => set('tapers', data.value as TaperAnswer)}>
            <Radio value="yes" label="Yes" />
            <Radio value="no" label="No" />
            <Radio value="unsure" label="Not sure" />
          </RadioGroup>
        </Field>
        <Field label="Flank angle" hint="A 55° gauge seats in BSP threads, a 60° one in NPT, unified and metric">
          <RadioGroup layout="horizontal" value={values.flank} onChange={(_, data) => set('flank', data.value as FlankAnswer)}>
            <Radio value="55" label="55°" />
            <Radio value="60" label="60°" />
            <Radio value="unsure" label="Not checked" />
          </RadioGroup>
        </Field>
        <div className={styles.actions}>
          <Button
            type="submit"
            appearance="primary"
            icon={identify.isPending ? <Spinner size="tiny" /> : <SearchRegular />}
            disabled={identify.isPending}
          >
            Identify
          </Button>
          <Button appearance="secondary" onClick={clear}>
            Clear
          </Button>
        </div>
      </form>

      {identify.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The thread could not be identified: {identify.error.message}</MessageBarBody>
        </MessageBar>
      )}
      {identify.isIdle && <MeasuringHelp />}
      {identify.data && identify.data.length === 0 && (
        <>
          <Text as="p" role="status">
            No thread in the tables matches this reading. Check the reading and the unit switches, then try again.
          </Text>
          <MeasuringHelp />
        </>
      )}
      {identify.data?.find((c) => c.question) && (
        <MessageBar intent="info" role="status">
          <MessageBarBody>
            <strong>55° or 60°?</strong> {identify.data.find((c) => c.question)?.question} Then answer “Which thread gauge seats” above and identify again.
          </MessageBarBody>
        </MessageBar>
      )}
      {identify.data && identify.data.length > 0 && <ThreadCandidatesTable candidates={identify.data} />}
    </div>
  );
}
