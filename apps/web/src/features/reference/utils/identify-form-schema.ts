import type { ThreadReading } from '@linesmith/catalog';
import { parseInches } from '@linesmith/routing';
import { z } from 'zod';

export type DiameterUnit = 'in' | 'mm';
export type ThreadMeasure = 'tpi' | 'pitch';
export type TaperAnswer = 'yes' | 'no' | 'unsure';
/** Which thread gauge seats: 55° (BSP) or 60° (NPT, unified, metric). */
export type FlankAnswer = '55' | '60' | 'unsure';

export interface IdentifyFormValues {
  diameter: string;
  diameterUnit: DiameterUnit;
  thread: string;
  threadMeasure: ThreadMeasure;
  tapers: TaperAnswer;
  flank: FlankAnswer;
}

export type IdentifyFormField = 'diameter' | 'thread' | 'form';

export const emptyIdentifyForm: IdentifyFormValues = {
  diameter: '',
  diameterUnit: 'in',
  thread: '',
  threadMeasure: 'tpi',
  tapers: 'unsure',
  flank: 'unsure',
};

/*
 * Plausibility limits catch a reading typed with the wrong switch set (0.56 as mm, 1.5 as TPI).
 * They sit well outside every fitting thread of the tables (1/16 NPT at 0.3125 in up to
 * 2-1/2-12 UN, pitches 1 to 2 mm, 11.5 to 28 TPI), so they never reject a real reading.
 */
const limits = {
  diameterIn: { max: 4 },
  diameterMm: { min: 2 },
  tpi: { min: 4, max: 80 },
  pitchMm: { min: 0.25, max: 6 },
};

/** A decimal number, with a comma accepted for the decimal point. */
function parseDecimal(text: string): number {
  const body = text.trim().replace(',', '.');
  return /^(?:\d+(?:\.\d*)?|\.\d+)$/.test(body) ? Number(body) : Number.NaN;
}

function parseDiameterIn(text: string): number {
  try {
    return parseInches(text);
  } catch {
    return Number.NaN;
  }
}

export const identifyFormSchema = z
  .object({
    diameter: z.string().trim(),
    diameterUnit: z.enum(['in', 'mm']),
    thread: z.string().trim(),
    threadMeasure: z.enum(['tpi', 'pitch']),
    tapers: z.enum(['yes', 'no', 'unsure']),
    flank: z.enum(['55', '60', 'unsure']).default('unsure'),
  })
  .transform((values, ctx): ThreadReading => {
    const reading: ThreadReading = {};
    if (values.diameter !== '') {
      const inches = values.diameterUnit === 'in';
      const value = inches ? parseDiameterIn(values.diameter) : parseDecimal(values.diameter);
      if (!Number.isFinite(value) || value <= 0) {
        ctx.addIssue({
          code: 'custom',
          path: ['diameter'],
          message: inches
            ? 'Enter the diameter in inches as a decimal or a fraction, for example 0.555 or 9/16.'
            : 'Enter the diameter in millimetres as a number, for example 14.1.',
        });
      } else if (inches && value > limits.diameterIn.max) {
        ctx.addIssue({
          code: 'custom',
          path: ['diameter'],
          message: `${values.diameter} in is larger than any fitting thread. Was it measured in millimetres? Switch the unit to mm.`,
        });
      } else if (!inches && value < limits.diameterMm.min) {
        ctx.addIssue({
          code: 'custom',
          path: ['diameter'],
          message: `${values.diameter} mm is smaller than any fitting thread. Was it measured in inches? Switch the unit to in.`,
        });
      } else if (inches) {
        reading.odIn = value;
      } else {
        reading.odMm = value;
      }
    }
    if (values.thread !== '') {
      const perInch = values.threadMeasure === 'tpi';
      const value = parseDecimal(values.thread);
      if (!Number.isFinite(value) || value <= 0) {
        ctx.addIssue({
          code: 'custom',
          path: ['thread'],
          message: perInch
            ? 'Enter the threads per inch as a number, for example 18.'
            : 'Enter the pitch in millimetres as a number, for example 1.5.',
        });
      } else if (perInch && (value < limits.tpi.min || value > limits.tpi.max)) {
        ctx.addIssue({
          code: 'custom',
          path: ['thread'],
          message:
            value < limits.tpi.min
              ? `${values.thread} threads per inch is coarser than any fitting thread. Is it a pitch in mm? Switch to "Pitch (mm)".`
              : `${values.thread} threads per inch is finer than any fitting thread. Count the crests over one inch again.`,
        });
      } else if (!perInch && (value < limits.pitchMm.min || value > limits.pitchMm.max)) {
        ctx.addIssue({
          code: 'custom',
          path: ['thread'],
          message:
            value > limits.pitchMm.max
              ? `A ${values.thread} mm pitch is coarser than any fitting thread. Is it threads per inch? Switch to "Threads per inch".`
              : `A ${values.thread} mm pitch is finer than any fitting thread. Check it with a thread gauge.`,
        });
      } else if (perInch) {
        reading.tpi = value;
      } else {
        reading.pitchMm = value;
      }
    }
    if (values.diameter === '' && values.thread === '') {
      ctx.addIssue({
        code: 'custom',
        path: ['form'],
        message: 'Enter the measured diameter, the thread (TPI or pitch), or both.',
      });
    }
    // "Not sure" leaves the taper out, so both straight and tapered threads are ranked.
    if (values.tapers !== 'unsure') reading.tapered = values.tapers === 'yes';
    // "Not sure" leaves the flank angle out: the identifier then asks about 55° against 60°.
    if (values.flank !== 'unsure') reading.flankAngleDeg = values.flank === '55' ? 55 : 60;
    return reading;
  });
