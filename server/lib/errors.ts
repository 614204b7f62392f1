/** The one error type services throw; the error middleware turns it into JSON. */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number = 400,
    readonly fields?: Record<string, string>,
    /** Extra members of the error body the client needs, e.g. the current record on a 409. */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const notFound = (what = "That item") => new AppError("not-found", `${what} was not found.`, 404);
export const forbidden = (message = "Your role does not allow this.") => new AppError("forbidden", message, 403);
export const unauthorized = (message = "Please sign in.") => new AppError("unauthorized", message, 401);
export const conflict = (message: string, code = "conflict") => new AppError(code, message, 409);
