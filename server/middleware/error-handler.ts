/**
 * Turns every error into { error: { code, message, issues } }. Never sends a stack trace; logs
 * unexpected errors on the server only.
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';

interface BodyParserError {
  type?: string;
  status?: number;
  statusCode?: number;
  expose?: boolean;
}

export const notFoundApi: RequestHandler = (_req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: 'No such API route.', issues: [] } });
};

export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, next) => {
  if (res.headersSent) {
    next(err);
    return;
  }
  if (err instanceof HttpError) {
    res
      .status(err.status)
      .json({ error: { code: err.code, message: err.message, issues: err.issues }, ...err.extra });
    return;
  }
  const parserError = err as BodyParserError;
  if (parserError && typeof parserError === 'object' && parserError.type === 'entity.too.large') {
    res
      .status(413)
      .json({ error: { code: 'too_large', message: 'The request body is too large.', issues: [] } });
    return;
  }
  if (parserError && typeof parserError === 'object' && parserError.type === 'entity.parse.failed') {
    res.status(400).json({
      error: {
        code: 'invalid_json',
        message: 'The request body is not valid JSON.',
        issues: [{ path: '(body)', message: 'is not valid JSON' }],
      },
    });
    return;
  }
  if (
    parserError &&
    typeof parserError === 'object' &&
    (parserError.status ?? parserError.statusCode) === 404
  ) {
    // serve-static: a missing file under /assets.
    res.status(404).json({ error: { code: 'not_found', message: 'No such file.', issues: [] } });
    return;
  }
  if (
    parserError &&
    typeof parserError === 'object' &&
    parserError.expose &&
    typeof parserError.status === 'number' &&
    parserError.status < 500
  ) {
    res
      .status(parserError.status)
      .json({ error: { code: 'bad_request', message: String((err as Error).message), issues: [] } });
    return;
  }
  // pino-http's request logger (with the request id) when present.
  if (req.log) req.log.error({ err }, 'Unexpected error while answering a request');
  else console.error('Unexpected error while answering a request:', err);
  res
    .status(500)
    .json({ error: { code: 'internal', message: 'Something went wrong on the server.', issues: [] } });
};
