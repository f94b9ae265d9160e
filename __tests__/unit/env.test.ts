import { ConfigError, parseEnv } from '@/server/env';

const DB = 'postgres://u:p@127.0.0.1:54329/ligandry';

describe('parseEnv', () => {
  it('fills defaults: loopback host, port 8080, info logs', () => {
    const env = parseEnv({ DATABASE_URL: DB });
    expect(env).toMatchObject({ HOST: '127.0.0.1', PORT: 8080, LOG_LEVEL: 'info', JSON_LIMIT: '100kb' });
  });

  const bad: Array<{ name: string; input: Record<string, string | undefined>; mentions: RegExp }> = [
    { name: 'missing DATABASE_URL', input: {}, mentions: /DATABASE_URL: is not set/ },
    { name: 'non-postgres URL', input: { DATABASE_URL: 'mysql://x' }, mentions: /DATABASE_URL: must start with postgres/ },
    { name: 'port out of range', input: { DATABASE_URL: DB, PORT: '70000' }, mentions: /PORT: must be a whole number/ },
    { name: 'port not a number', input: { DATABASE_URL: DB, PORT: 'eighty' }, mentions: /PORT: must be a whole number/ },
    { name: 'unknown log level', input: { DATABASE_URL: DB, LOG_LEVEL: 'loud' }, mentions: /LOG_LEVEL/ },
  ];

  it.each(bad)('$name: throws ConfigError naming the variable', ({ input, mentions }) => {
    expect(() => parseEnv(input)).toThrow(ConfigError);
    expect(() => parseEnv(input)).toThrow(mentions);
  });
});
