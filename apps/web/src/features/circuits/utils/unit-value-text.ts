import { fahrenheitToCelsius, psiToBar, type PressureUnit, type TemperatureUnit } from '@linesmith/routing';

/** A stored psi value as the text of an input in the user's unit (bar to one decimal). */
export function pressureInputText(psi: number, unit: PressureUnit): string {
  return unit === 'bar' ? String(Math.round(psiToBar(psi) * 10) / 10) : String(Math.round(psi));
}

/** A stored °F value as the text of an input in the user's unit (whole degrees). */
export function temperatureInputText(fahrenheit: number, unit: TemperatureUnit): string {
  return String(Math.round(unit === 'C' ? fahrenheitToCelsius(fahrenheit) : fahrenheit));
}
