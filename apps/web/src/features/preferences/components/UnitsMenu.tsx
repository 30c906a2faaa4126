import {
  Button,
  Menu,
  MenuGroup,
  MenuGroupHeader,
  MenuItemRadio,
  MenuList,
  MenuPopover,
  MenuTrigger,
  type MenuProps,
} from '@fluentui/react-components';
import { RulerRegular } from '@fluentui/react-icons';
import { useUnitPreferences } from '../hooks/useUnitPreferences';
import { unitPreferencesSchema, type UnitPreferences } from '../utils/unit-preferences-schema';

const lengthLabel = { in: 'Inches (fractions)', mm: 'Millimetres' } as const;
const pressureLabel = { psi: 'psi', bar: 'bar' } as const;
const temperatureLabel = { F: '°F', C: '°C' } as const;

/** Top-bar menu for the display units; every screen follows it. */
export function UnitsMenu() {
  const { units, setUnits } = useUnitPreferences();
  const checkedValues = { length: [units.length], pressure: [units.pressure], temperature: [units.temperature] };

  const onCheckedValueChange: MenuProps['onCheckedValueChange'] = (_, { name, checkedItems }) => {
    const parsed = unitPreferencesSchema.safeParse({ ...units, [name]: checkedItems[0] });
    if (parsed.success) setUnits(parsed.data satisfies UnitPreferences);
  };

  const summary = `${units.length === 'in' ? 'in' : 'mm'} · ${units.pressure} · ${temperatureLabel[units.temperature]}`;
  return (
    <Menu checkedValues={checkedValues} onCheckedValueChange={onCheckedValueChange}>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance="subtle" icon={<RulerRegular />} aria-label={`Units: ${summary}`}>
          {summary}
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuGroup>
            <MenuGroupHeader>Length</MenuGroupHeader>
            {(['in', 'mm'] as const).map((value) => (
              <MenuItemRadio key={value} name="length" value={value}>
                {lengthLabel[value]}
              </MenuItemRadio>
            ))}
          </MenuGroup>
          <MenuGroup>
            <MenuGroupHeader>Pressure</MenuGroupHeader>
            {(['psi', 'bar'] as const).map((value) => (
              <MenuItemRadio key={value} name="pressure" value={value}>
                {pressureLabel[value]}
              </MenuItemRadio>
            ))}
          </MenuGroup>
          <MenuGroup>
            <MenuGroupHeader>Temperature</MenuGroupHeader>
            {(['F', 'C'] as const).map((value) => (
              <MenuItemRadio key={value} name="temperature" value={value}>
                {temperatureLabel[value]}
              </MenuItemRadio>
            ))}
          </MenuGroup>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
