import { Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import type { z } from 'zod';
import { ValidationError, type ErrorIssue } from '../errors/app-error.js';
import { isZodDtoClass } from './zod-dto.js';

export function toIssues(error: z.ZodError): ErrorIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message }));
}

/** Parses with a zod schema; failures become 400 `validation_failed` with one issue per field. */
export function parseWithSchema<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw new ValidationError(toIssues(result.error));
  return result.data;
}

/**
 * Registered once globally: parses every body, query and param whose declared type is a
 * `zodDto(...)` class, and leaves other parameters alone.
 */
@Injectable()
export class ZodValidationPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'custom' || !isZodDtoClass(metadata.metatype)) return value;
    return parseWithSchema(metadata.metatype.zodSchema, value ?? {});
  }
}
