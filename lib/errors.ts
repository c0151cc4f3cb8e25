/**
 * What the data layer and the services raise when a request cannot be done. They say what went wrong in
 * the domain's terms and know nothing of HTTP; only the route wrapper (server/http/errors.ts) turns each
 * kind into a status. `fields` names the inputs at fault, as docs/PRODUCT.md's error shape does.
 */
export class DomainError extends Error {
  constructor(
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** The input breaks a rule only the server can check (a price, a CSV row, a file name). */
export class ValidationError extends DomainError {}
/** Nobody is signed in. */
export class NotSignedInError extends DomainError {}
/** Signed in, but the role (or the person) may not do this. */
export class ForbiddenError extends DomainError {}
/** Not there, or not in the member's workshop: the two are never told apart. */
export class NotFoundError extends DomainError {}
/** The record's state forbids it now (an approved estimate, the last owner, a paid invoice). */
export class ConflictError extends DomainError {}
/** A single-use link already used, expired or withdrawn. */
export class GoneError extends DomainError {}
/** A file over its size limit. */
export class TooLargeError extends DomainError {}
/** A file whose content is not a kind we keep. */
export class UnsupportedTypeError extends DomainError {}
/** An outside service this installation has not set up (card payments). */
export class NotConfiguredError extends DomainError {}
/** An outside service that failed to answer (the payment service). */
export class UpstreamError extends DomainError {}

export const notSignedIn = () => new NotSignedInError("Sign in to do this.");
export const forbidden = (what = "do this") => new ForbiddenError(`Your role does not allow you to ${what}.`);
export const notFound = (what = "That record") => new NotFoundError(`${what} was not found in your workshop.`);
