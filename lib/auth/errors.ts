/** Thrown by the data-access layer; route wrappers turn them into 401/403/404 JSON. */
export class AuthError extends Error {
  constructor(
    readonly status: 401 | 403 | 404,
    message: string,
  ) {
    super(message);
  }
}

export const notSignedIn = () => new AuthError(401, "Sign in to do this.");
export const forbidden = (what = "do this") => new AuthError(403, `Your role does not allow you to ${what}.`);
export const notFound = (what = "That record") => new AuthError(404, `${what} was not found in your workshop.`);
