import type { NextFunction, Request, Response } from 'express';
import { DomainError } from '../errors';
import { ValidationError } from './validate';

export function notFoundApi(_req: Request, res: Response) {
  res.status(404).json({ error: { code: 'not_found', message: 'No such API route.' } });
}

/** The one place errors become HTTP answers, always as `{ error: { code, message, issues? } }`. */
export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  if (err instanceof ValidationError) {
    return res.status(400).json({ error: { code: 'validation_failed', message: err.message, issues: err.issues } });
  }
  if (err instanceof DomainError) {
    return res.status(err.status).json({ ...err.extra, error: { code: err.code, message: err.message } });
  }
  const status = (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
  if (status === 400 && (err as { type?: string }).type === 'entity.parse.failed') {
    return res.status(400).json({ error: { code: 'invalid_json', message: 'The request body is not valid JSON.' } });
  }
  if (status === 413) {
    return res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large.' } });
  }
  if (isDatabaseUnavailable(err)) {
    return res.status(503).json({ error: { code: 'db_unavailable', message: 'The database is unreachable; try again shortly.' } });
  }
  console.error(`[error] ${req.method} ${req.originalUrl}`, err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side.' } });
}

function isDatabaseUnavailable(err: unknown): boolean {
  const code = (err as { code?: string })?.code;
  const message = String((err as { message?: string })?.message ?? '');
  return code === 'ECONNREFUSED' || code === '57P01' || code === '57P03' || /timeout exceeded when trying to connect|Connection terminated/i.test(message);
}
