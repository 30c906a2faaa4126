import { HttpException, NotFoundException } from '@nestjs/common';
import { AllExceptionsFilter } from './all-exceptions.filter.js';
import { ConflictError, NotFoundError, ValidationError } from './app-error.js';

describe('AllExceptionsFilter.toBody', () => {
  const filter = new AllExceptionsFilter();
  const quiet = jest.spyOn((filter as unknown as { logger: { error: () => void } }).logger, 'error');
  beforeEach(() => quiet.mockImplementation(() => undefined));

  it('keeps typed app errors, including extra fields', () => {
    const current = { id: 'u1', version: 3 };
    expect(filter.toBody(new ConflictError('Changed.', { current }))).toEqual({
      statusCode: 409,
      code: 'conflict',
      message: 'Changed.',
      issues: [],
      current,
    });
    expect(filter.toBody(new ValidationError([{ path: 'email', message: 'bad' }]))).toMatchObject({
      statusCode: 400,
      code: 'validation_failed',
      issues: [{ path: 'email', message: 'bad' }],
    });
    expect(filter.toBody(new NotFoundError('The user'))).toMatchObject({ statusCode: 404, code: 'not_found' });
  });

  it("maps Nest's HTTP exceptions, a 429 among them", () => {
    expect(filter.toBody(new NotFoundException('Cannot GET /api/x'))).toEqual({
      statusCode: 404,
      code: 'not_found',
      message: 'Cannot GET /api/x',
      issues: [],
    });
    expect(filter.toBody(new HttpException('slow down', 429))).toMatchObject({ statusCode: 429, code: 'rate_limited' });
    expect(filter.toBody(new HttpException('teapot', 418))).toMatchObject({ statusCode: 418, code: 'bad_request' });
  });

  it('hides unknown errors behind a generic 500 and logs them', () => {
    const body = filter.toBody(new Error('secret internals'));
    expect(body).toMatchObject({ statusCode: 500, code: 'internal_error', issues: [] });
    expect(body.message).not.toContain('secret');
    expect(quiet).toHaveBeenCalled();
  });

  it('answers 503 unavailable when the database cannot be reached', () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    expect(filter.toBody(refused)).toMatchObject({ statusCode: 503, code: 'unavailable' });
  });
});
