import type { LoggerService, LogLevel } from '@nestjs/common';
import { currentRequestId } from './request-context';

// Nest announces every module and route at start-up; that is noise in production logs.
const QUIET_CONTEXTS = new Set(['InstanceLoader', 'RoutesResolver', 'RouterExplorer']);

/** One JSON object per line, with the request id when the line belongs to a request. */
export class JsonLogger implements LoggerService {
  constructor(private readonly levels: LogLevel[] = ['log', 'warn', 'error', 'fatal']) {}

  private write(level: LogLevel, message: unknown, rest: unknown[]): void {
    if (!this.levels.includes(level)) return;
    const context = typeof rest[rest.length - 1] === 'string' ? (rest.pop() as string) : undefined;
    if (level === 'log' && context && QUIET_CONTEXTS.has(context)) return;
    const stack = rest.find((r) => typeof r === 'string' && r.includes('\n    at '));
    const line: Record<string, unknown> = { time: new Date().toISOString(), level, context, requestId: currentRequestId(), message };
    if (stack) line.stack = stack;
    (level === 'error' || level === 'fatal' ? process.stderr : process.stdout).write(`${JSON.stringify(line)}\n`);
  }

  log(message: unknown, ...rest: unknown[]) {
    this.write('log', message, rest);
  }
  warn(message: unknown, ...rest: unknown[]) {
    this.write('warn', message, rest);
  }
  error(message: unknown, ...rest: unknown[]) {
    this.write('error', message, rest);
  }
  fatal(message: unknown, ...rest: unknown[]) {
    this.write('fatal', message, rest);
  }
  debug(message: unknown, ...rest: unknown[]) {
    this.write('debug', message, rest);
  }
  verbose(message: unknown, ...rest: unknown[]) {
    this.write('verbose', message, rest);
  }
}
