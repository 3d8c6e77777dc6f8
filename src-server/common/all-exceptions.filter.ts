import { ArgumentsHost, Catch, ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import type { Request, Response } from 'express';
import { randomUUID } from 'node:crypto';
import { DomainError } from './domain-error';
import { duplicateKeyConflict } from './duplicate-key';
import { isRetryableLockError } from './transaction-retry';

const HTTP_CODES: Record<number, string> = {
  400: 'BAD_REQUEST',
  401: 'AUTH_REQUIRED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  405: 'METHOD_NOT_ALLOWED',
  409: 'CONFLICT',
  413: 'PAYLOAD_TOO_LARGE',
  415: 'UNSUPPORTED_MEDIA_TYPE',
  422: 'UNPROCESSABLE',
  429: 'TOO_MANY_REQUESTS',
};

const DB_DOWN_CODES = new Set(['ECONNREFUSED', 'PROTOCOL_CONNECTION_LOST', 'ETIMEDOUT', 'ECONNRESET', 'ER_SERVER_SHUTDOWN', 'EPIPE']);

/** The one place that turns any error into `{ statusCode, code, message, ... }`; never a stack trace or SQL. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const request = host.switchToHttp().getRequest<Request & { id?: string }>();
    const body = this.toBody(exception, request);
    if (response.headersSent) return;
    // A route's own @Header (a CSV download) must not relabel the error as a file.
    response.removeHeader('Content-Disposition');
    response.status(body.statusCode).type('application/json').json(body);
  }

  private toBody(exception: unknown, request: Request & { id?: string }): Record<string, unknown> & { statusCode: number } {
    if (exception instanceof DomainError) {
      return { statusCode: exception.status, code: exception.code, message: exception.message, ...exception.details };
    }
    if (exception instanceof HttpException) {
      // Express wraps errors thrown in body-parser's verify hook (the JSON depth and Unicode check): answer the DomainError.
      if (exception.cause instanceof DomainError) return this.toBody(exception.cause, request);
      const cause = exception.cause as { type?: string } | undefined;
      if (cause?.type === 'entity.parse.failed') {
        return { statusCode: 400, code: 'MALFORMED_JSON', message: `The request body is not valid JSON: ${exception.message}` };
      }
      if (cause?.type === 'entity.too.large' || exception.getStatus() === 413) {
        return { statusCode: 413, code: 'PAYLOAD_TOO_LARGE', message: 'The request body is too large' };
      }
      const status = exception.getStatus();
      const raw = exception.getResponse();
      const message = typeof raw === 'string' ? raw : String((raw as { message?: unknown }).message ?? exception.message);
      return { statusCode: status, code: HTTP_CODES[status] ?? 'HTTP_ERROR', message };
    }
    const err = exception as { type?: string; status?: number; code?: string; message?: string };
    // body-parser errors carry a type and an HTTP status.
    if (err?.type === 'entity.parse.failed') {
      return { statusCode: 400, code: 'MALFORMED_JSON', message: 'The request body is not valid JSON' };
    }
    if (err?.type === 'entity.too.large') {
      return { statusCode: 413, code: 'PAYLOAD_TOO_LARGE', message: 'The request body is too large' };
    }
    if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
      return { statusCode: err.status, code: HTTP_CODES[err.status] ?? 'BAD_REQUEST', message: err.message ?? 'Bad request' };
    }
    if (err?.code && DB_DOWN_CODES.has(err.code)) {
      this.logger.warn(`database unavailable during ${request.method} ${request.url}: ${err.code}`);
      return { statusCode: 503, code: 'DATABASE_UNAVAILABLE', message: 'The database is unavailable; try again shortly' };
    }
    // A parallel write won the race past the service's own check: the unique key says which record and field.
    const duplicate = duplicateKeyConflict(exception);
    if (duplicate) return { statusCode: 409, code: duplicate.code, message: duplicate.message, ...duplicate.details };
    if (isRetryableLockError(exception)) {
      this.logger.warn(`lock contention during ${request.method} ${request.url}`);
      return { statusCode: 503, code: 'DATABASE_BUSY', message: 'The database was busy with a conflicting change; try again' };
    }
    const correlationId = request.id ?? randomUUID();
    this.logger.error(`unhandled error ${correlationId} during ${request.method} ${request.url}`, (exception as Error)?.stack);
    return { statusCode: 500, code: 'INTERNAL_ERROR', message: 'Something went wrong on our side', correlationId };
  }
}
