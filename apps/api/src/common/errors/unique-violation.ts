/** PostgreSQL 23505 unique_violation (manual, appendix A), as wrapped by TypeORM's QueryFailedError. */
export function isUniqueViolation(error: unknown): boolean {
  return (error as { driverError?: { code?: string } } | null)?.driverError?.code === '23505';
}
