/** Field name (dotted path) → messages, as returned to forms and API clients. */
export type FieldErrors = Record<string, string[]>;

/** An error that maps to one HTTP status. Everything that refuses a request throws one of these. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors?: FieldErrors,
    /** Extra JSON fields for the response body, e.g. the stored result of an already-submitted attempt. */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = "Sign in to continue.") {
    super(401, "unauthenticated", message);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = "Your role does not allow this.") {
    super(403, "forbidden", message);
  }
}

/** Also used for "exists but is not yours", so that nobody learns another athlete's ids. */
export class NotFoundError extends AppError {
  constructor(message = "Not found.", fieldErrors?: FieldErrors) {
    super(404, "not_found", message, fieldErrors);
  }
}

export class ValidationError extends AppError {
  constructor(message: string, fieldErrors: FieldErrors = {}, status: 400 | 422 = 400) {
    super(status, "invalid_input", message, fieldErrors);
  }
}

/** `fieldErrors` names the field the conflict is about (an e-mail already taken); `extra` goes into the body as is. */
export class ConflictError extends AppError {
  constructor(message: string, options: { fieldErrors?: FieldErrors; extra?: Record<string, unknown> } = {}) {
    super(409, "conflict", message, options.fieldErrors, options.extra);
  }
}

/** `field` names what was too large ("body" or a form field such as "file"), in the message and in `fields`. */
export class PayloadTooLargeError extends AppError {
  constructor(message = "The upload is too large.", field = "body") {
    super(413, "too_large", `${field}: ${message}`, { [field]: [message] });
  }
}

/** `field` names what was of the wrong type: the Content-Type header or a file's bytes ("file"). */
export class UnsupportedMediaError extends AppError {
  constructor(message: string, field = "content-type") {
    super(415, "unsupported_media_type", `${field}: ${message}`, { [field]: [message] });
  }
}

export class TooManyRequestsError extends AppError {
  constructor(
    message = "Too many attempts. Wait a few minutes and try again.",
    readonly retryAfterSeconds = 60,
  ) {
    super(429, "too_many_requests", message);
  }
}
