import { pino, type Logger } from 'pino';

/** Logs go to stdout as JSON lines; LOG_LEVEL=silent quiets them (tests do). */
export function createLogger(level = process.env['LOG_LEVEL'] ?? 'info'): Logger {
  return pino({ level, redact: ['req.headers.authorization', 'req.headers.cookie'] });
}
