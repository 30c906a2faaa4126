import { createServer } from 'node:net';
import { DataSource } from 'typeorm';
import { isDatabaseUnavailable } from './database-errors.js';

/** A loopback port with nothing listening: bind an ephemeral port, then free it. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

describe('isDatabaseUnavailable', () => {
  it('recognises the real error of TypeORM and the pg driver when nothing listens', async () => {
    const dataSource = new DataSource({
      type: 'postgres',
      host: '127.0.0.1',
      port: await closedPort(),
      extra: { connectionTimeoutMillis: 2000 },
    });
    const error = await dataSource.initialize().then(
      () => undefined,
      (caught: unknown) => caught,
    );
    expect(error).toMatchObject({ code: 'ECONNREFUSED' });
    expect(isDatabaseUnavailable(error)).toBe(true);
  });

  it('recognises PostgreSQL connection-exception codes (class 08, 57P01 admin shutdown)', () => {
    // Codes from the PostgreSQL manual, appendix A "PostgreSQL Error Codes".
    expect(isDatabaseUnavailable(Object.assign(new Error('x'), { code: '08006' }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error('x'), { code: '57P01' }))).toBe(true);
  });

  it('looks inside wrapped driver errors', () => {
    const driverError = Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' });
    expect(isDatabaseUnavailable(Object.assign(new Error('query failed'), { driverError }))).toBe(true);
  });

  it('does not treat query errors as an outage', () => {
    // 23505 unique_violation and 42P01 undefined_table (same appendix) are bugs or conflicts, not outages.
    expect(isDatabaseUnavailable(Object.assign(new Error('duplicate key'), { code: '23505' }))).toBe(false);
    expect(isDatabaseUnavailable(Object.assign(new Error('no such table'), { code: '42P01' }))).toBe(false);
    expect(isDatabaseUnavailable('ECONNREFUSED')).toBe(false);
  });
});
