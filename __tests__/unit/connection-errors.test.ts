// Which errors mean "the database is out of reach" (answered 503 db_unavailable), and the reconnect delay.
import { DrizzleQueryError } from 'drizzle-orm/errors';

import { isConnectionError, reconnectDelayS } from '@/db/client';
import { toErrorResponse } from '@/server/middleware/error-handler';

const coded = (code: string, message = code) => Object.assign(new Error(message), { code });

describe('isConnectionError', () => {
  const cases: [string, unknown, boolean][] = [
    ['refused (nothing listens on the port)', coded('ECONNREFUSED'), true],
    ['reset by the server going away', coded('ECONNRESET'), true],
    ['postgres-js: the socket closed mid-query', coded('CONNECTION_CLOSED'), true],
    ['postgres-js: the pool was ended', coded('CONNECTION_ENDED'), true],
    ['postgres-js: the connection was destroyed', coded('CONNECTION_DESTROYED'), true],
    ['postgres-js: no answer within connect_timeout', coded('CONNECT_TIMEOUT'), true],
    ['57P01 admin_shutdown (fast stop, terminated backend)', coded('57P01'), true],
    ['57P03 cannot_connect_now (starting up)', coded('57P03'), true],
    ['wrapped by Drizzle', new DrizzleQueryError('select 1', [], coded('CONNECTION_CLOSED') as Error), true],
    ['wrapped twice', Object.assign(new Error('outer'), { cause: Object.assign(new Error('inner'), { cause: coded('ECONNRESET') }) }), true],
    ['every address refused', new AggregateError([coded('ECONNREFUSED'), coded('ECONNREFUSED')]), true],
    ['a unique violation', coded('23505'), false],
    ['a Drizzle-wrapped unique violation', new DrizzleQueryError('insert', [], coded('23505') as Error), false],
    ['a plain error', new Error('boom'), false],
    ['nothing', null, false],
  ];
  it.each(cases)('%s', (_name, err, expected) => {
    expect(isConnectionError(err)).toBe(expected);
    expect(toErrorResponse(err).status).toBe(expected ? 503 : 500);
  });
});

describe('reconnectDelayS', () => {
  it('starts at 50 ms, doubles, and never waits more than half a second', () => {
    expect([0, 1, 2, 3, 4, 10, 100].map(reconnectDelayS)).toEqual([0.05, 0.1, 0.2, 0.4, 0.5, 0.5, 0.5]);
  });
});
