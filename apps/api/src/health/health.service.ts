import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';

export interface HealthStatus {
  status: 'ok';
  db: 'up';
}

@Injectable()
export class HealthService {
  constructor(private readonly dataSource: DataSource) {}

  /** Throws when the database does not answer; the error filter turns that into 503 `unavailable`. */
  async check(): Promise<HealthStatus> {
    await this.dataSource.query('SELECT 1');
    return { status: 'ok', db: 'up' };
  }
}
