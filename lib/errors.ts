/**
 * Domain errors: what lib/ throws when a request cannot be carried out. They know nothing of HTTP;
 * `errorResponse` in lib/server/request.ts maps each kind to a status and the one error shape
 * `{ error: { code, message, field? } }`. `field` names the input to change, when there is one.
 */
export abstract class DomainError extends Error {
  abstract readonly kind: "not_found" | "conflict" | "invalid" | "forbidden" | "gone";
  constructor(
    message: string,
    /** A short machine-readable code; defaults to the kind. */
    public readonly code?: string,
    public readonly field?: string,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** The thing does not exist, or the person may not know that it does. */
export class NotFoundError extends DomainError {
  readonly kind = "not_found";
  constructor(what = "That item", message = `${what} was not found.`) {
    super(message);
  }
}

/** The request clashes with what is stored (a duplicate, a state that forbids it). */
export class ConflictError extends DomainError {
  readonly kind = "conflict";
  constructor(message: string, field?: string, code?: string) {
    super(message, code, field);
  }
}

/** The input is wrong; `field` names the input to change. */
export class ValidationError extends DomainError {
  readonly kind = "invalid";
  constructor(message: string, field?: string, code?: string) {
    super(message, code, field);
  }
}

/** The person is known but their role or their link to the resource does not allow this. */
export class ForbiddenError extends DomainError {
  readonly kind = "forbidden";
  constructor(message = "Your role does not allow this.", code?: string) {
    super(message, code);
  }
}

/** It existed but is no longer usable (an expired invitation). */
export class GoneError extends DomainError {
  readonly kind = "gone";
  constructor(message: string, code?: string) {
    super(message, code);
  }
}
