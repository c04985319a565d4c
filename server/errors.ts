/** One error class per kind of failure; the error middleware turns each into its JSON answer. */
export type FieldErrors = Record<string, string>;

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
  }
}

export class ValidationError extends HttpError {
  constructor(fields: FieldErrors, message = 'Some fields need attention.') {
    super(400, 'invalid', message, fields);
  }
}

export class BadRequestError extends HttpError {
  constructor(message: string, code = 'bad-request') {
    super(400, code, message);
  }
}

export class UnauthorizedError extends HttpError {
  constructor(message = 'Sign in to continue.', code = 'unauthorized') {
    super(401, code, message);
  }
}

export class ForbiddenError extends HttpError {
  constructor(message = 'Your account may not do this.', code = 'forbidden') {
    super(403, code, message);
  }
}

export class NotFoundError extends HttpError {
  constructor(message = 'Not found.') {
    super(404, 'not-found', message);
  }
}

export class ConflictError extends HttpError {
  constructor(message: string, code = 'conflict', fields?: FieldErrors) {
    super(409, code, message, fields);
  }
}

export class RateLimitedError extends HttpError {
  constructor(message = 'Too many attempts; wait a few minutes and try again.') {
    super(429, 'rate-limited', message);
  }
}
