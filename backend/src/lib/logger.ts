import { pino, type Logger } from 'pino';

export function createLogger(mode: string): Logger {
  return pino({
    level: process.env.LOG_LEVEL ?? (mode === 'test' ? 'silent' : 'info'),
    redact: { paths: ['req.headers.cookie', 'password', '*.password', 'token', '*.token'], censor: '[redacted]' },
  });
}
