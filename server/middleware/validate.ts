/**
 * Parses a request's body, params and query with zod schemas; a failure answers 400 with issues
 * whose paths name the field (`input.member.length`). Parsed values replace the raw ones
 * (query is a getter in Express 5, so the parsed query goes to res.locals.query).
 */
import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { toFieldIssues, type FieldIssue } from '../../shared/schemas/quantity';
import { badRequest } from '../lib/http-error';

interface Schemas {
  body?: z.ZodType;
  params?: z.ZodType;
  query?: z.ZodType;
}

export function validate(schemas: Schemas): RequestHandler {
  return (req, res, next) => {
    const issues: FieldIssue[] = [];
    if (schemas.params) {
      const r = schemas.params.safeParse(req.params);
      if (r.success) req.params = r.data as typeof req.params;
      else issues.push(...toFieldIssues(r.error));
    }
    if (schemas.query) {
      const r = schemas.query.safeParse(req.query);
      if (r.success) res.locals.query = r.data;
      else issues.push(...toFieldIssues(r.error));
    }
    if (schemas.body) {
      const r = schemas.body.safeParse(req.body ?? {});
      if (r.success) req.body = r.data;
      else issues.push(...toFieldIssues(r.error));
    }
    if (issues.length > 0) {
      next(badRequest(`The request is not valid: ${issues[0].path}: ${issues[0].message}`, issues));
      return;
    }
    next();
  };
}
