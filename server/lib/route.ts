/**
 * Typed route handlers: the zod schemas for a request's params, query and body are given once, and
 * the handler receives their parsed output types, so a renamed schema field fails typecheck in
 * every handler and service that reads it. A failure answers 400 with issues whose paths name the
 * field (`input.member.length`), all parts checked in one pass.
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { toFieldIssues, type FieldIssue } from '../../shared/schemas/quantity';
import { badRequest } from './http-error';

type Schema = z.ZodType | undefined;
type Output<S extends Schema> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteSchemas<P extends Schema, Q extends Schema, B extends Schema> {
  params?: P;
  query?: Q;
  body?: B;
}

export interface RouteInput<P extends Schema, Q extends Schema, B extends Schema> {
  params: Output<P>;
  query: Output<Q>;
  body: Output<B>;
}

export type TypedHandler<P extends Schema, Q extends Schema, B extends Schema> = (
  input: RouteInput<P, Q, B>,
  req: Request,
  res: Response,
  next: NextFunction,
) => unknown;

function parsePart(schema: z.ZodType | undefined, value: unknown, issues: FieldIssue[]): unknown {
  if (!schema) return undefined;
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  issues.push(...toFieldIssues(result.error));
  return undefined;
}

/**
 * Wraps a handler with validation. The handler's promise is returned so Express 5 passes a
 * rejection to the error middleware.
 */
export function typedRoute<
  P extends Schema = undefined,
  Q extends Schema = undefined,
  B extends Schema = undefined,
>(schemas: RouteSchemas<P, Q, B>, handler: TypedHandler<P, Q, B>): RequestHandler {
  return (req, res, next) => {
    const issues: FieldIssue[] = [];
    const params = parsePart(schemas.params, req.params, issues);
    const query = parsePart(schemas.query, req.query, issues);
    const body = parsePart(schemas.body, req.body ?? {}, issues);
    if (issues.length > 0) {
      next(badRequest(`The request is not valid: ${issues[0].path}: ${issues[0].message}`, issues));
      return;
    }
    return handler({ params, query, body } as RouteInput<P, Q, B>, req, res, next);
  };
}
