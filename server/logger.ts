import pino from 'pino';
import type { Config } from './config';

export type Logger = pino.Logger;

export function createLogger(config: Pick<Config, 'logLevel'>): Logger {
  return pino({ level: config.logLevel, base: undefined });
}
