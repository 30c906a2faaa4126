import type { z } from 'zod';

/** A class that carries a zod schema, so route parameters typed with it are parsed by the global pipe. */
export interface ZodDtoClass<S extends z.ZodType = z.ZodType> {
  new (): z.output<S>;
  readonly zodSchema: S;
}

/**
 * `class CreateUserDto extends zodDto(createUserSchema) {}` gives a parameter type equal to the
 * schema's output; the class exists only so Nest's metadata can point the pipe at the schema.
 */
export function zodDto<S extends z.ZodType>(schema: S): ZodDtoClass<S> {
  class ZodDto {
    static readonly zodSchema = schema;
  }
  return ZodDto as unknown as ZodDtoClass<S>;
}

export function isZodDtoClass(value: unknown): value is ZodDtoClass {
  return typeof value === 'function' && 'zodSchema' in value;
}
