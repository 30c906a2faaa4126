import { createContext } from 'react';
import type { ColorScheme } from './color-scheme';

export interface ColorSchemeContextValue {
  scheme: ColorScheme;
  toggle(): void;
}

export const ColorSchemeContext = createContext<ColorSchemeContextValue | null>(null);
