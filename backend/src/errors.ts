/** Errors with a stable code; the error handler maps each to its HTTP status. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly headers: Record<string, string> = {},
  ) {
    super(message);
  }

  /** More for the client to show, e.g. every check result behind a refused install. */
  details(): Record<string, unknown> | undefined {
    return undefined;
  }
}

export class ValidationError extends AppError {
  constructor(message: string, field?: string, code = 'invalid_input') {
    super(400, code, message, field);
  }
}
export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue', code = 'unauthenticated') {
    super(401, code, message);
  }
}
export class ForbiddenError extends AppError {
  constructor(message = 'You do not have permission to do that', code = 'forbidden') {
    super(403, code, message);
  }
}
export class NotFoundError extends AppError {
  constructor(what = 'Record') {
    super(404, 'not_found', `${what} not found`);
  }
}
export class ConflictError extends AppError {
  constructor(code: string, message: string, field?: string) {
    super(409, code, message, field);
  }
}
export class TooManyAttemptsError extends AppError {
  constructor(readonly retryAfterSeconds: number) {
    super(429, 'too_many_attempts', `Too many attempts. Try again in ${retryAfterSeconds} second${retryAfterSeconds === 1 ? '' : 's'}.`, undefined, {
      'Retry-After': String(retryAfterSeconds),
    });
  }
}
