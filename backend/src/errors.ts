/** Domain errors thrown by services; the error middleware maps them to HTTP. */
export class DomainError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    /** Extra top-level fields of the error answer, beside `error` (e.g. the current record on a conflict). */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class NotFoundError extends DomainError {
  constructor(message = 'Not found', code = 'not_found') {
    super(404, code, message);
  }
}

export class ConflictError extends DomainError {
  constructor(message: string, code = 'conflict') {
    super(409, code, message);
  }
}

export class GoneError extends DomainError {
  constructor(message: string, code = 'gone') {
    super(410, code, message);
  }
}

export class BadRequestError extends DomainError {
  constructor(message: string, code = 'bad_request') {
    super(400, code, message);
  }
}

export class UnauthorizedError extends DomainError {
  constructor(message = 'Sign in to continue.', code = 'unauthenticated') {
    super(401, code, message);
  }
}

export class ForbiddenRequestError extends DomainError {
  constructor(message = 'Your role does not allow this.', code = 'forbidden') {
    super(403, code, message);
  }
}
