import { z } from "zod";

/**
 * Machine-readable error codes. Every failed API request answers
 * `{ error: { code, message, issues? } }` with one of these codes; the HTTP status follows the
 * code (see `errorStatus`).
 */
export const errorCodeSchema = z.enum([
  "VALIDATION",
  "BAD_REQUEST",
  "UNAUTHENTICATED",
  "FORBIDDEN",
  "NOT_FOUND",
  "CONFLICT",
  "PAYLOAD_TOO_LARGE",
  "RATE_LIMITED",
  "UNAVAILABLE",
  "INTERNAL",
]);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

/** HTTP status sent with each error code. */
export const errorStatus: Record<ErrorCode, number> = {
  VALIDATION: 422,
  BAD_REQUEST: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  PAYLOAD_TOO_LARGE: 413,
  RATE_LIMITED: 429,
  UNAVAILABLE: 503,
  INTERNAL: 500,
};

/**
 * One field problem. `path` is the dotted path inside the validated part ("email",
 * "members.0.role"); an empty string means the part as a whole. Forms put `message` on the
 * field named by `path`.
 */
export const errorIssueSchema = z.object({
  path: z.string(),
  message: z.string(),
});
export type ErrorIssue = z.infer<typeof errorIssueSchema>;

export const errorBodySchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    issues: z.array(errorIssueSchema).optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;
