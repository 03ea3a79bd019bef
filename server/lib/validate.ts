import type { Request, RequestHandler } from "express";
import { z } from "zod";

type AnySchema = z.ZodType;
type Out<S, Fallback> = S extends AnySchema ? z.output<S> : Fallback;

export interface RequestSchemas<B, Q, P> {
  body?: B;
  query?: Q;
  params?: P;
}

/** The request type a handler sees after `validate(schemas)`. */
export type Validated<B = undefined, Q = undefined, P = undefined> = Request<
  Out<P, Record<string, string>>,
  unknown,
  Out<B, unknown>,
  Out<Q, Request["query"]>
>;

/**
 * Parses req.body, req.query and req.params with the given zod schemas and replaces each with
 * its parsed value, so nothing downstream parses again. All issues of all parts are collected
 * into one ZodError, which the error middleware answers with 422.
 */
export function validate<
  B extends AnySchema | undefined = undefined,
  Q extends AnySchema | undefined = undefined,
  P extends AnySchema | undefined = undefined,
>(
  schemas: RequestSchemas<B, Q, P>,
): RequestHandler<Out<P, Record<string, string>>, unknown, Out<B, unknown>, Out<Q, Request["query"]>> {
  return (req, _res, next) => {
    const issues: z.core.$ZodIssue[] = [];
    const parse = (schema: AnySchema | undefined, value: unknown, apply: (v: unknown) => void) => {
      if (!schema) return;
      const result = schema.safeParse(value);
      if (result.success) apply(result.data);
      else issues.push(...result.error.issues);
    };
    parse(schemas.params, req.params, (v) => {
      req.params = v as typeof req.params;
    });
    parse(schemas.query, req.query, (v) => {
      // Express 5 defines req.query as a getter; shadow it with the parsed value.
      Object.defineProperty(req, "query", { value: v, writable: true, configurable: true, enumerable: true });
    });
    parse(schemas.body, req.body ?? {}, (v) => {
      req.body = v as typeof req.body;
    });
    if (issues.length > 0) throw new z.ZodError(issues);
    next();
  };
}
