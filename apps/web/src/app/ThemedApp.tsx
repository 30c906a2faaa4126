import { FluentProvider, makeStyles } from '@fluentui/react-components';
import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { readColorScheme, saveColorScheme, type ColorScheme } from './color-scheme';
import { ColorSchemeContext } from './color-scheme-context';
import { linesmithDarkTheme, linesmithLightTheme } from './theme';

export interface ThemedAppProps {
  children: ReactNode;
  /** Fixed scheme for tests; the app reads the saved choice or the OS preference. */
  initialScheme?: ColorScheme;
}

// The layout lives on an inner element: Fluent copies the provider's className onto the portal
// layer that pop-ups open into, where a full-height box would cover the page.
const useStyles = makeStyles({
  root: { minHeight: '100vh', display: 'flex', flexDirection: 'column' },
});

export function ThemedApp({ children, initialScheme }: ThemedAppProps) {
  const styles = useStyles();
  const [scheme, setScheme] = useState<ColorScheme>(() => initialScheme ?? readColorScheme());
  const toggle = useCallback(() => {
    const next = scheme === 'dark' ? 'light' : 'dark';
    saveColorScheme(next);
    setScheme(next);
  }, [scheme]);
  const value = useMemo(() => ({ scheme, toggle }), [scheme, toggle]);

  return (
    <ColorSchemeContext.Provider value={value}>
      <FluentProvider theme={scheme === 'dark' ? linesmithDarkTheme : linesmithLightTheme}>
        <div className={styles.root}>{children}</div>
      </FluentProvider>
    </ColorSchemeContext.Provider>
  );
}
