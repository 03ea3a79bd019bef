import type { ErrorCode, ErrorIssue } from "../../shared/schemas/errors";

/**
 * Typed failures thrown by services. The error middleware turns each into the shared error
 * body with the status of its code; services never speak HTTP themselves.
 */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: ErrorIssue[],
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class InvalidError extends AppError {
  /** A rule broken by otherwise well-formed input; `issues` name the fields. */
  constructor(message: string, issues?: ErrorIssue[]) {
    super("VALIDATION", message, issues);
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = "Sign in to continue") {
    super("UNAUTHENTICATED", message);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = "You are not allowed to do that") {
    super("FORBIDDEN", message);
  }
}

export class NotFoundError extends AppError {
  constructor(message = "Not found") {
    super("NOT_FOUND", message);
  }
}

export class ConflictError extends AppError {
  constructor(message: string, issues?: ErrorIssue[]) {
    super("CONFLICT", message, issues);
  }
}

export class RateLimitedError extends AppError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super("RATE_LIMITED", message);
  }
}

export class UnavailableError extends AppError {
  constructor(message: string) {
    super("UNAVAILABLE", message);
  }
}
