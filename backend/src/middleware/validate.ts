import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';

type Parsed<B, Q, P> = {
  body: B extends z.ZodType ? z.infer<B> : undefined;
  query: Q extends z.ZodType ? z.infer<Q> : undefined;
  params: P extends z.ZodType ? z.infer<P> : undefined;
};

export class ValidationError extends Error {
  constructor(readonly issues: { path: string; message: string }[]) {
    super('Some fields need attention.');
  }
}

/**
 * `validate(schemas, handler)` → the two last steps of a route's pipeline: parse body, query and
 * params with the shared schemas (400 with every issue), then call the handler with the parsed input,
 * so the handler never re-reads `req`.
 */
export function validate<B extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined, P extends z.ZodType | undefined = undefined>(
  schemas: { body?: B; query?: Q; params?: P },
  handler: (input: Parsed<B, Q, P>, req: Request, res: Response) => unknown,
): RequestHandler[] {
  const parse: RequestHandler = (req, res, next: NextFunction) => {
    const issues: { path: string; message: string }[] = [];
    const input: Record<string, unknown> = {};
    for (const part of ['body', 'query', 'params'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? {});
      if (result.success) input[part] = result.data;
      else
        for (const issue of result.error.issues)
          issues.push({ path: [part, ...issue.path.map(String)].join('.'), message: issue.message });
    }
    if (issues.length) return next(new ValidationError(issues));
    res.locals.input = input;
    next();
  };
  const run: RequestHandler = async (req, res) => {
    await handler(res.locals.input as Parsed<B, Q, P>, req, res);
  };
  return [parse, run];
}
