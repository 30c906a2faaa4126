import { useContext } from 'react';
import { ColorSchemeContext, type ColorSchemeContextValue } from './color-scheme-context';

export function useColorScheme(): ColorSchemeContextValue {
  const value = useContext(ColorSchemeContext);
  if (!value) throw new Error('useColorScheme must be used inside ThemedApp');
  return value;
}
