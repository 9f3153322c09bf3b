/** The one error type services throw; the error-handler middleware renders it. */
import type { FieldIssue } from '../../shared/schemas/quantity';

export class HttpError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly issues: FieldIssue[] = [],
    /** Extra top-level fields of the answer (e.g. `latest` on a stale save). */
    public readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (message: string, issues: FieldIssue[] = []) =>
  new HttpError(400, 'invalid_input', message, issues);
export const unauthorized = () => new HttpError(401, 'unauthorized', 'Sign in first.');
export const forbidden = (message: string, issues: FieldIssue[] = []) =>
  new HttpError(403, 'forbidden', message, issues);
export const notFound = (what = 'item') => new HttpError(404, 'not_found', `No such ${what}.`);
export const conflict = (code: string, message: string) => new HttpError(409, code, message);
