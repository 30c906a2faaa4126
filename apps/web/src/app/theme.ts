import { createDarkTheme, createLightTheme, type BrandVariants, type Theme } from '@fluentui/react-components';

/**
 * Linesmith's own petrol-teal ramp (hue 192°). Shade 80 is the light theme's primary and keeps
 * 5.7:1 contrast with white text; shades 100–110 carry brand text on the dark background.
 */
export const linesmithBrand: BrandVariants = {
  10: '#050e10',
  20: '#091a1e',
  30: '#062b34',
  40: '#083945',
  50: '#0b4756',
  60: '#0d5466',
  70: '#0f6277',
  80: '#117088',
  90: '#1487a3',
  100: '#19a6c9',
  110: '#28bfe4',
  120: '#4dcae9',
  130: '#73d5ee',
  140: '#a9d7e2',
  150: '#c8e6ed',
  160: '#e8f4f7',
};

// Fluent's own font stack wins unless the base family is overridden; Noto Sans ships with the app.
const fontFamilyBase =
  "'Noto Sans', -apple-system, BlinkMacSystemFont, 'Segoe UI', system-ui, Roboto, 'Helvetica Neue', sans-serif";

const darkBase = createDarkTheme(linesmithBrand);

export const linesmithLightTheme: Theme = { ...createLightTheme(linesmithBrand), fontFamilyBase };

export const linesmithDarkTheme: Theme = {
  ...darkBase,
  fontFamilyBase,
  // The dark theme's default brand text shades are too dim on a dark surface for this hue.
  colorBrandForeground1: linesmithBrand[110],
  colorBrandForeground2: linesmithBrand[120],
  colorBrandForegroundLink: linesmithBrand[110],
  colorBrandForegroundLinkHover: linesmithBrand[120],
};
