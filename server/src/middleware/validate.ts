import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { HttpError } from './http-error.ts';

type Part = 'body' | 'query' | 'params';

/** Turns zod issues into one readable sentence plus a field → message map. */
export function describeIssues(error: z.ZodError): { message: string; fields: Record<string, string> } {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '(request)';
    fields[key] ??= issue.message;
  }
  const first = Object.entries(fields)[0];
  const message = first
    ? `Please check ${first[0] === '(request)' ? 'the request' : `“${first[0]}”`}: ${first[1]}.`
    : 'The request is not valid.';
  return { message, fields };
}

/**
 * Validates one part of the request with a contract schema and replaces it with the parsed value, so handlers only
 * ever see checked data. Express 5 makes req.query a getter, so the parsed query is stored on res.locals.query.
 */
export function validate(schema: z.ZodType, part: Part = 'body'): RequestHandler {
  return (req, res, next) => {
    const parsed = schema.safeParse(req[part] ?? {});
    if (!parsed.success) {
      const { message, fields } = describeIssues(parsed.error);
      throw new HttpError('invalid', message, fields);
    }
    if (part === 'query') res.locals.query = parsed.data;
    else if (part === 'params') res.locals.params = parsed.data;
    else req.body = parsed.data;
    next();
  };
}
