import { describe, expect, it } from 'vitest';
import { ConnectionRefusedError, DatabaseError, ValidationError } from 'sequelize';
import { isDatabaseUnavailable } from '../../server/lib/database-errors';

function pgError(message: string, code?: string) {
  return Object.assign(new Error(message), code ? { code } : {});
}

describe('isDatabaseUnavailable', () => {
  it('recognises PostgreSQL going away (SQLSTATE 57P01 admin shutdown, 57P03, class 08) and refused sockets', () => {
    expect(isDatabaseUnavailable(pgError('terminating connection due to administrator command', '57P01'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('the database system is starting up', '57P03'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('connection failure', '08006'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('connect ECONNREFUSED 127.0.0.1:5432', 'ECONNREFUSED'))).toBe(true);
    expect(isDatabaseUnavailable(pgError('Connection terminated unexpectedly'))).toBe(true);
  });

  it('sees through Sequelize wrappers', () => {
    expect(isDatabaseUnavailable(new ConnectionRefusedError(pgError('connect ECONNREFUSED', 'ECONNREFUSED')))).toBe(true);
    const wrapped = new DatabaseError(Object.assign(pgError('terminating connection', '57P01'), { sql: 'SELECT 1' }) as never);
    expect(isDatabaseUnavailable(wrapped)).toBe(true);
  });

  it('leaves real query errors and bad input alone', () => {
    const syntax = new DatabaseError(Object.assign(pgError('syntax error at or near "x"', '42601'), { sql: 'x' }) as never);
    expect(isDatabaseUnavailable(syntax)).toBe(false);
    expect(isDatabaseUnavailable(pgError('invalid byte sequence for encoding "UTF8": 0x00', '22021'))).toBe(false);
    expect(isDatabaseUnavailable(new ValidationError('bad', []))).toBe(false);
    expect(isDatabaseUnavailable(new Error('boom'))).toBe(false);
    expect(isDatabaseUnavailable(undefined)).toBe(false);
  });
});
