import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { HttpError } from './http-error.ts';

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

/** Parses one part of the request with its contract, or refuses it with a 400 that says what to fix. */
export function parseOrRefuse<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const parsed = schema.safeParse(value ?? {});
  if (!parsed.success) {
    const { message, fields } = describeIssues(parsed.error);
    throw new HttpError('invalid', message, fields);
  }
  return parsed.data;
}

interface RequestSchemas {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
}

type Infer<S> = S extends z.ZodType ? z.infer<S> : undefined;

/** The checked parts of a request, typed from the contracts that checked them. */
export type ValidInput<S extends RequestSchemas> = {
  params: Infer<S['params']>;
  query: Infer<S['query']>;
  body: Infer<S['body']>;
};

/**
 * A handler that only ever sees checked input: each named part of the request (params, query, body) is parsed with
 * its contract schema first, and the handler gets the parsed values, typed, as its first argument. A part that does
 * not parse is answered 400 with a sentence and a field map, and the handler never runs.
 */
export function validated<S extends RequestSchemas>(
  schemas: S,
  handler: (input: ValidInput<S>, req: Request, res: Response, next: NextFunction) => unknown,
): RequestHandler {
  return async (req, res, next) => {
    const input = {
      params: schemas.params ? parseOrRefuse(schemas.params, req.params) : undefined,
      query: schemas.query ? parseOrRefuse(schemas.query, req.query) : undefined,
      body: schemas.body ? parseOrRefuse(schemas.body, req.body) : undefined,
    } as ValidInput<S>;
    await handler(input, req, res, next);
  };
}
