import { z } from 'zod';
import { ValidationError } from '../errors/app-error.js';
import { zodDto } from './zod-dto.js';
import { ZodValidationPipe } from './zod-validation.pipe.js';

const schema = z.object({ name: z.string().min(1), sizes: z.array(z.number().int()) });
class SampleDto extends zodDto(schema) {}

describe('ZodValidationPipe', () => {
  const pipe = new ZodValidationPipe();

  it('parses parameters typed with a zodDto class', () => {
    expect(pipe.transform({ name: 'x', sizes: [4], extra: 1 }, { type: 'body', metatype: SampleDto })).toEqual({
      name: 'x',
      sizes: [4],
    });
  });

  it('reports dotted paths for nested failures', () => {
    try {
      pipe.transform({ name: '', sizes: [4, 'six'] }, { type: 'body', metatype: SampleDto });
      throw new Error('expected a validation error');
    } catch (error) {
      expect(error).toBeInstanceOf(ValidationError);
      expect((error as ValidationError).issues.map((issue) => issue.path)).toEqual(['name', 'sizes.1']);
      expect((error as ValidationError).statusCode).toBe(400);
    }
  });

  it('treats a missing body as an empty object', () => {
    expect(() => pipe.transform(undefined, { type: 'body', metatype: SampleDto })).toThrow(ValidationError);
  });

  it('leaves parameters without a schema alone', () => {
    const value = { anything: true };
    expect(pipe.transform(value, { type: 'body', metatype: Object })).toBe(value);
    expect(pipe.transform('abc', { type: 'param', metatype: String })).toBe('abc');
  });

  it('refuses NUL characters in any body or query, naming the path (PostgreSQL cannot store them)', () => {
    const body = { units: [{ ports: [{ label: 'ok' }, { label: 'bad\u0000label' }] }] };
    try {
      pipe.transform(body, { type: 'body', metatype: Object });
      throw new Error('expected a validation error');
    } catch (error) {
      expect(error).toBeInstanceOf(ValidationError);
      expect((error as ValidationError).issues).toEqual([{ path: 'units.0.ports.1.label', message: 'Text must not contain NUL characters' }]);
    }
    expect(() => pipe.transform({ search: 'a\u0000' }, { type: 'query', metatype: Object })).toThrow(ValidationError);
    expect(pipe.transform({ search: 'plain' }, { type: 'query', metatype: Object })).toEqual({ search: 'plain' });
    // Deeper than the call stack would allow: walked without recursion.
    let deep: unknown = 'x\u0000';
    for (let i = 0; i < 100_000; i++) deep = { d: deep };
    expect(() => pipe.transform(deep, { type: 'body', metatype: Object })).toThrow(ValidationError);
  });
});
