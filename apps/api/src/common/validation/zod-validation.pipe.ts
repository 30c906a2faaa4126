import { Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import type { z } from 'zod';
import { ValidationError, type ErrorIssue } from '../errors/app-error.js';
import { isZodDtoClass } from './zod-dto.js';

export function toIssues(error: z.ZodError): ErrorIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message }));
}

/** Parses with a zod schema; failures become 400 `validation_failed` with one issue per field. */
export function parseWithSchema<S extends z.ZodType>(schema: S, value: unknown, at?: string): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    const issues = toIssues(result.error);
    throw new ValidationError(at ? issues.map((issue) => ({ ...issue, path: issue.path ? `${at}.${issue.path}` : at })) : issues);
  }
  return result.data;
}

/**
 * The path of the first string holding a NUL character, or null. PostgreSQL text and JSONB cannot
 * store NUL, so such input is refused up front instead of failing at the database. Walks with an
 * explicit stack: request bodies can be nested deeper than the call stack allows.
 */
export function findNulCharacter(value: unknown): string | null {
  const stack: Array<{ value: unknown; path: string }> = [{ value, path: '' }];
  while (stack.length > 0) {
    const { value: current, path } = stack.pop()!;
    if (typeof current === 'string') {
      if (current.includes('\u0000')) return path;
    } else if (current !== null && typeof current === 'object') {
      for (const [key, child] of Object.entries(current)) {
        if (key.includes('\u0000')) return path;
        stack.push({ value: child, path: path ? `${path}.${key}` : key });
      }
    }
  }
  return null;
}

/**
 * Registered once globally: refuses NUL characters in every body and query, then parses every
 * body, query and param whose declared type is a `zodDto(...)` class, and leaves other
 * parameters alone.
 */
@Injectable()
export class ZodValidationPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'body' || metadata.type === 'query') {
      const path = findNulCharacter(value);
      if (path !== null) throw new ValidationError([{ path, message: 'Text must not contain NUL characters' }]);
    }
    if (metadata.type === 'custom' || !isZodDtoClass(metadata.metatype)) return value;
    return parseWithSchema(metadata.metatype.zodSchema, value ?? {});
  }
}
