import { fluidSchema } from '@linesmith/catalog';
import { barToPsi, celsiusToFahrenheit, circuitKindSchema, type PressureUnit, type TemperatureUnit } from '@linesmith/routing';
import { z } from 'zod';

const numberText = (message: string) =>
  z
    .string()
    .trim()
    .min(1, message)
    .transform((value, ctx) => {
      const parsed = Number(value.replace(',', '.'));
      if (!Number.isFinite(parsed)) {
        ctx.addIssue({ code: 'custom', message });
        return z.NEVER;
      }
      return parsed;
    });

/**
 * The create-circuit form: pressure and temperature are typed in the user's units and stored in
 * psi and °F (conversions from the routing lib).
 */
export function circuitFormSchema(units: { pressure: PressureUnit; temperature: TemperatureUnit }) {
  return z.object({
    name: z.string().trim().min(1, 'Name the circuit, e.g. "Transmission cooler".').max(120, 'Keep the name under 120 characters.'),
    kind: circuitKindSchema,
    fluid: fluidSchema,
    maxPressure: numberText(`Enter the maximum pressure in ${units.pressure}.`)
      .pipe(z.number().positive('The maximum pressure must be above zero.'))
      .transform((value) => (units.pressure === 'bar' ? barToPsi(value) : value)),
    maxTemp: numberText(`Enter the maximum temperature in °${units.temperature}.`).transform((value) =>
      units.temperature === 'C' ? celsiusToFahrenheit(value) : value,
    ),
  });
}

export type CircuitFormInput = z.input<ReturnType<typeof circuitFormSchema>>;
