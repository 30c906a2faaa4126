import { Button, Tooltip } from '@fluentui/react-components';
import { WeatherMoonRegular, WeatherSunnyRegular } from '@fluentui/react-icons';
import { useColorScheme } from '../../../app/useColorScheme';

export function ThemeToggle() {
  const { scheme, toggle } = useColorScheme();
  const label = scheme === 'dark' ? 'Switch to light theme' : 'Switch to dark theme';
  return (
    <Tooltip content={label} relationship="label">
      <Button
        appearance="subtle"
        icon={scheme === 'dark' ? <WeatherSunnyRegular /> : <WeatherMoonRegular />}
        onClick={toggle}
      />
    </Tooltip>
  );
}
