import { Radio, RadioGroup, Field } from '@fluentui/react-components';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';

/** In-page switch for the length unit; it changes the user's preference, so every screen follows. */
export function LengthUnitToggle() {
  const { units, setUnits } = useUnitPreferences();
  return (
    <Field label="Lengths in">
      <RadioGroup
        layout="horizontal"
        value={units.length}
        onChange={(_, data) => setUnits({ length: data.value === 'mm' ? 'mm' : 'in' })}
      >
        <Radio value="in" label="Fractional inches" />
        <Radio value="mm" label="Millimetres" />
      </RadioGroup>
    </Field>
  );
}
