import type { ErrorRequestHandler, RequestHandler } from "express";
import { ZodError } from "zod";
import { errorStatus, type ErrorBody, type ErrorCode, type ErrorIssue } from "../../shared/schemas/errors";
import { AppError, RateLimitedError } from "./errors";
import type { Logger } from "./logger";

function body(code: ErrorCode, message: string, issues?: ErrorIssue[]): ErrorBody {
  return { error: issues ? { code, message, issues } : { code, message } };
}

function zodIssues(err: ZodError): ErrorIssue[] {
  return err.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }));
}

/** body-parser marks its failures with `type` and `status`. */
function parserFailure(err: unknown): { type: string; status: number } | null {
  if (typeof err !== "object" || err === null) return null;
  const e = err as { type?: unknown; status?: unknown };
  return typeof e.type === "string" && typeof e.status === "number" ? { type: e.type, status: e.status } : null;
}

/**
 * The one error middleware: typed AppErrors and ZodErrors become the shared error body with
 * their status; body-parser's oversize and malformed-JSON failures become 413 and 400; anything
 * else is a 500 whose stack goes to the log and never to the client.
 */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    if (err instanceof AppError) {
      if (err instanceof RateLimitedError) res.setHeader("Retry-After", String(err.retryAfterSeconds));
      res.status(errorStatus[err.code]).json(body(err.code, err.message, err.issues));
      return;
    }
    if (err instanceof ZodError) {
      res.status(422).json(body("VALIDATION", "Some fields are not valid", zodIssues(err)));
      return;
    }
    const parser = parserFailure(err);
    if (parser?.type === "entity.too.large") {
      res.status(413).json(body("PAYLOAD_TOO_LARGE", "The request body is too large"));
      return;
    }
    if (parser && parser.status >= 400 && parser.status < 500) {
      res.status(400).json(body("BAD_REQUEST", "The request body could not be read as JSON"));
      return;
    }
    const stack = err instanceof Error ? err.stack : String(err);
    logger.error("unhandled error", { method: req.method, path: req.path, stack });
    res.status(500).json(body("INTERNAL", "Something went wrong on our side"));
  };
}

/** Unknown /api routes answer 404 in the shared error body (never the SPA page). */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json(body("NOT_FOUND", `No API route ${req.method} ${req.originalUrl.split("?")[0]}`));
};
