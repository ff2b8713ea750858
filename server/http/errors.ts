import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ConnectionError, TimeoutError } from 'sequelize';
import { ZodError } from 'zod';
import { loggedPath } from './logging';

export type ErrorCode =
  | 'invalid_input'
  | 'signed_out'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'not_allowed'
  | 'too_large'
  | 'unsupported_type'
  | 'too_many_requests'
  | 'database_unavailable'
  | 'internal';

/** The one error class: a status, a code a client can branch on, and a message a person can act on. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That') =>
  new AppError(
    404,
    'not_found',
    `${what} was not found. It may have been removed, or it belongs to another household.`,
  );
export const forbidden = (message = 'Your role in this household does not allow that. Ask a keeper.') =>
  new AppError(403, 'forbidden', message);
export const conflict = (message: string) => new AppError(409, 'conflict', message);

export function zodFields(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

function isDatabaseDown(error: unknown): boolean {
  if (error instanceof ConnectionError || error instanceof TimeoutError) return true;
  const code =
    (error as { code?: string; parent?: { code?: string } })?.parent?.code ?? (error as { code?: string })?.code;
  return (
    ['ECONNREFUSED', 'ECONNRESET', '57P01', '57P03', '08006', '08001', '08003'].includes(code ?? '') ||
    /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect|connection error and is not queryable/i.test(
      String((error as Error)?.message),
    )
  );
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `There is no ${req.method} ${req.path}.`));
};

export function errorHandler({ exposeInternals }: { exposeInternals: boolean }): ErrorRequestHandler {
  return (err, req, res, _next) => {
    let error: AppError;
    if (err instanceof AppError) error = err;
    else if (err instanceof ZodError)
      error = new AppError(400, 'invalid_input', 'Some fields need attention.', zodFields(err));
    else if (isDatabaseDown(err)) {
      error = new AppError(
        503,
        'database_unavailable',
        'The database is not answering right now. Nothing was saved; try again in a minute.',
      );
    } else if (err?.type === 'entity.too.large') {
      error = new AppError(413, 'too_large', 'That request is too large (1 MB at most).');
    } else if (err?.type === 'entity.parse.failed') {
      error = new AppError(400, 'invalid_input', 'The request body is not valid JSON.');
    } else {
      // The request's own logger carries its id, which the answer's X-Request-Id header repeats.
      if (req.log) req.log.error({ err }, `unexpected error in ${req.method} ${loggedPath(req.originalUrl)}`);
      else console.error(`[${req.method} ${req.originalUrl}]`, err);
      error = new AppError(
        500,
        'internal',
        'Something went wrong on our side. Nothing was saved; try again, and tell us if it keeps happening.',
      );
      if (exposeInternals) error = new AppError(500, 'internal', error.message, undefined, String(err?.stack ?? err));
    }
    if (res.headersSent) return;
    res.status(error.status).json({
      error: {
        code: error.code,
        message: error.message,
        ...(error.fields ? { fields: error.fields } : {}),
        ...(error.details !== undefined ? { details: error.details } : {}),
      },
    });
  };
}
