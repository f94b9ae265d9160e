import pino from 'pino';

/** Structured JSON logs on stdout; `level` "silent" turns them off (tests). */
export function createLogger(level: pino.LevelWithSilent = 'info'): pino.Logger {
  return pino({ level, redact: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'] });
}
