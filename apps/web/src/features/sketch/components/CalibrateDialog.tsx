import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, Field, Input } from '@fluentui/react-components';
import { distance, formatLength, type LengthUnit } from '@linesmith/routing';
import { useState } from 'react';
import type { Point } from '../model/tools';
import { parseLength } from './panels/length-input';

export interface CalibrateDialogProps {
  a: Point;
  b: Point;
  unit: LengthUnit;
  onCalibrate(knownIn: number): void;
  onCancel(): void;
}

/** Asks for the real distance between the two clicked points (fractions accepted: 23 11/16). */
export function CalibrateDialog({ a, b, unit, onCalibrate, onCancel }: CalibrateDialogProps) {
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    try {
      const knownIn = parseLength(text, unit);
      if (!(knownIn > 0)) throw new RangeError('The distance must be more than 0');
      onCalibrate(knownIn);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  };
  const px = distance(a, b);
  return (
    <Dialog open onOpenChange={(_, d) => !d.open && onCancel()}>
      <DialogSurface aria-label="Calibrate the sketch">
        <form
          onSubmit={(e) => {
            e.preventDefault();
            submit();
          }}
        >
          <DialogBody>
            <DialogTitle>Calibrate the sketch</DialogTitle>
            <DialogContent>
              <Field
                label={`Known distance between the two points (${unit === 'mm' ? 'mm' : 'inches'})`}
                hint={`The points are ${px.toFixed(0)} px apart on the sketch. ${unit === 'in' ? `Fractions are fine: 23 11/16 or ${formatLength(23.6875, 'in')}.` : ''}`}
                validationMessage={error ?? undefined}
              >
                <Input autoFocus value={text} onChange={(_, d) => setText(d.value)} />
              </Field>
            </DialogContent>
            <DialogActions>
              <Button onClick={onCancel}>Cancel</Button>
              <Button appearance="primary" type="submit">
                Set scale
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
