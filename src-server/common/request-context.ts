import { AsyncLocalStorage } from 'node:async_hooks';
import { randomUUID } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import { Logger } from '@nestjs/common';

/** The request id travels with every log line written while the request is handled. */
export const requestContext = new AsyncLocalStorage<{ requestId: string }>();

export const currentRequestId = (): string | undefined => requestContext.getStore()?.requestId;

const INCOMING_ID = /^[\w.-]{8,64}$/;
const accessLog = new Logger('Http');

/** Takes a well-formed X-Request-Id from a proxy or makes one, echoes it, and logs one line per request. */
export function requestIdMiddleware(req: Request & { id?: string }, res: Response, next: NextFunction): void {
  const incoming = req.header('x-request-id');
  const requestId = incoming && INCOMING_ID.test(incoming) ? incoming : randomUUID();
  req.id = requestId;
  res.setHeader('X-Request-Id', requestId);
  const started = process.hrtime.bigint();
  requestContext.run({ requestId }, () => {
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      // Paths only: query strings may hold search terms or tokens.
      accessLog.log(`${req.method} ${req.path} ${res.statusCode} ${ms.toFixed(1)}ms`);
    });
    next();
  });
}
