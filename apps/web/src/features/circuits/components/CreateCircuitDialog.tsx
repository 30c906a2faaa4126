import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Dropdown,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Option,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { fluidSchema } from '@linesmith/catalog';
import { circuitKindSchema, circuitKinds, type CircuitKind } from '@linesmith/routing';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { ApiError } from '../../../lib/api-error';
import { fieldErrors } from '../../../lib/field-errors';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';
import type { UnitPreferences } from '../../preferences/utils/unit-preferences-schema';
import { useCreateCircuit } from '../hooks/useCreateCircuit';
import { circuitFormSchema, type CircuitFormInput } from '../utils/circuit-form-schema';
import { fluidLabels } from '../utils/fluid-labels';
import { pressureInputText, temperatureInputText } from '../utils/unit-value-text';

export interface CreateCircuitDialogProps {
  buildId: string;
  onClose(): void;
}

type Errors = Partial<Record<keyof CircuitFormInput, string>>;

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  pair: { display: 'grid', gridTemplateColumns: '1fr 1fr', gap: tokens.spacingHorizontalM },
  note: { color: tokens.colorNeutralForeground3 },
});

const firstKind: CircuitKind = 'transmission-cooler';

/** The kind's preset values, typed out in the user's units. */
function presetValues(kind: CircuitKind, units: UnitPreferences): Pick<CircuitFormInput, 'fluid' | 'maxPressure' | 'maxTemp'> {
  const preset = circuitKinds[kind];
  return {
    fluid: preset.fluid,
    maxPressure: pressureInputText(preset.maxPressurePsi, units.pressure),
    maxTemp: temperatureInputText(preset.maxTempF, units.temperature),
  };
}

/** New circuit: the kind fills fluid, pressure and temperature with common-practice starting values. */
export function CreateCircuitDialog({ buildId, onClose }: CreateCircuitDialogProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  const { units } = useUnitPreferences();
  const createCircuit = useCreateCircuit(buildId);
  const [values, setValues] = useState<CircuitFormInput>(() => ({
    name: circuitKinds[firstKind].label,
    kind: firstKind,
    ...presetValues(firstKind, units),
  }));
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const preset = circuitKinds[values.kind];
  const presetLabel = `Preset for ${preset.label.toLowerCase()}: ${preset.origin}`;

  function set<K extends keyof CircuitFormInput>(key: K, value: CircuitFormInput[K]) {
    setValues((current) => ({ ...current, [key]: value }));
  }

  function chooseKind(kind: CircuitKind) {
    setValues((current) => ({
      ...current,
      kind,
      // A name the user has not changed from the previous preset follows the kind.
      name: current.name.trim() === '' || current.name === circuitKinds[current.kind].label ? circuitKinds[kind].label : current.name,
      ...presetValues(kind, units),
    }));
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = circuitFormSchema(units).safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof CircuitFormInput>(parsed.error.issues));
      return;
    }
    setErrors({});
    const { name, kind, fluid, maxPressure, maxTemp } = parsed.data;
    // A preset left as shown is sent exactly, not as its rounded bar or °C text converted back.
    const shown = presetValues(kind, units);
    const exact = circuitKinds[kind];
    const maxPressurePsi = values.maxPressure.trim() === shown.maxPressure ? exact.maxPressurePsi : maxPressure;
    const maxTempF = values.maxTemp.trim() === shown.maxTemp ? exact.maxTempF : maxTemp;
    try {
      const circuit = await createCircuit.mutateAsync({ name, kind, fluid, maxPressurePsi, maxTempF });
      onClose();
      navigate(`/circuits/${encodeURIComponent(circuit.id)}`);
    } catch (error) {
      if (error instanceof ApiError && error.issues.length > 0) setErrors(fieldErrors<keyof CircuitFormInput>(error.issues));
      setFormError(error instanceof Error ? error.message : 'The circuit could not be created.');
    }
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="modal">
      <DialogSurface>
        <form onSubmit={handleSubmit} noValidate>
          <DialogBody>
            <DialogTitle>New circuit</DialogTitle>
            <DialogContent className={styles.content}>
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <Field label="Kind" required>
                <Dropdown
                  value={preset.label}
                  selectedOptions={[values.kind]}
                  onOptionSelect={(_, data) => {
                    const parsed = circuitKindSchema.safeParse(data.optionValue);
                    if (parsed.success) chooseKind(parsed.data);
                  }}
                >
                  {circuitKindSchema.options.map((kind) => (
                    <Option key={kind} value={kind}>
                      {circuitKinds[kind].label}
                    </Option>
                  ))}
                </Dropdown>
              </Field>
              <Field label="Name" required validationMessage={errors.name}>
                <Input value={values.name} onChange={(_, d) => set('name', d.value)} />
              </Field>
              <Field label="Fluid" required hint={presetLabel} validationMessage={errors.fluid}>
                <Dropdown
                  value={fluidLabels[values.fluid]}
                  selectedOptions={[values.fluid]}
                  onOptionSelect={(_, data) => {
                    const parsed = fluidSchema.safeParse(data.optionValue);
                    if (parsed.success) set('fluid', parsed.data);
                  }}
                >
                  {fluidSchema.options.map((fluid) => (
                    <Option key={fluid} value={fluid}>
                      {fluidLabels[fluid]}
                    </Option>
                  ))}
                </Dropdown>
              </Field>
              <div className={styles.pair}>
                <Field
                  label={`Max pressure (${units.pressure})`}
                  required
                  hint={presetLabel}
                  validationMessage={errors.maxPressure}
                >
                  <Input inputMode="decimal" value={values.maxPressure} onChange={(_, d) => set('maxPressure', d.value)} />
                </Field>
                <Field
                  label={`Max temperature (°${units.temperature})`}
                  required
                  hint={presetLabel}
                  validationMessage={errors.maxTemp}
                >
                  <Input inputMode="decimal" value={values.maxTemp} onChange={(_, d) => set('maxTemp', d.value)} />
                </Field>
              </div>
              <Text size={200} className={styles.note}>
                {preset.note} Starting values are common shop practice, not ratings: set the real maximum pressure and
                temperature from the makers&apos; data for the pump, transmission or engine.
              </Text>
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={onClose} disabled={createCircuit.isPending}>
                Cancel
              </Button>
              <Button
                type="submit"
                appearance="primary"
                disabled={createCircuit.isPending}
                icon={createCircuit.isPending ? <Spinner size="tiny" /> : undefined}
              >
                Create circuit
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
