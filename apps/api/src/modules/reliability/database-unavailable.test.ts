import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { isDatabaseUnavailable } from '../../shared/error-middleware';
import { AppError } from '../../shared/app-error';

const withCode = (message: string, code: string) => Object.assign(new Error(message), { code });

describe('isDatabaseUnavailable', () => {
  // Codes from the PostgreSQL documentation, appendix A "Error Codes"; messages as node-postgres and TypeORM word them.
  it.each([
    ['connection refused', withCode('connect ECONNREFUSED 127.0.0.1:54320', 'ECONNREFUSED')],
    ['refused on every address (AggregateError)', new AggregateError([withCode('connect ECONNREFUSED ::1:5432', 'ECONNREFUSED')], '')],
    ['admin shutdown 57P01 inside TypeORM', Object.assign(new Error('terminating connection due to administrator command'), { name: 'QueryFailedError', driverError: withCode('x', '57P01') })],
    ['cannot connect now 57P03', withCode('the database system is shutting down', '57P03')],
    ['connection terminated', new Error('Connection terminated unexpectedly')],
    ['pool timeout', new Error('timeout exceeded when trying to connect')],
    ['wrapped as a cause', new Error('session store failed', { cause: withCode('read ECONNRESET', 'ECONNRESET') })],
    ['a released query runner', Object.assign(new Error('Query runner already released. Cannot run queries anymore.'), { name: 'QueryRunnerAlreadyReleasedError' })],
  ])('%s: yes', (_what, err) => {
    expect(isDatabaseUnavailable(err)).toBe(true);
  });

  it.each([
    ['a unique violation 23505', withCode('duplicate key value violates unique constraint', '23505')],
    ['a serialization failure 40001', withCode('could not serialize access', '40001')],
    ['a validation error', new ZodError([])],
    ['an AppError', new AppError('NOT_FOUND', 404, 'Entry was not found')],
    ['a plain bug', new TypeError("Cannot read properties of undefined (reading 'id')")],
    ['not an error at all', 'ECONNREFUSED'],
  ])('%s: no', (_what, err) => {
    expect(isDatabaseUnavailable(err)).toBe(false);
  });
});
