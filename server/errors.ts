import type { FieldIssue } from "../shared/schemas/common";

/** The one error type services throw; the error middleware decides what the client sees. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldIssue[],
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const invalidInput = (message: string, fields?: FieldIssue[]) => new AppError(400, "invalid_input", message, fields);
export const unauthenticated = (message = "Sign in to continue.") => new AppError(401, "unauthenticated", message);
export const forbidden = (message = "Your role does not allow this.") => new AppError(403, "forbidden", message);
export const notFound = (what = "record") => new AppError(404, "not_found", `No such ${what}.`);
export const conflict = (code: string, message: string) => new AppError(409, code, message);
export const tooManyRequests = (message: string) => new AppError(429, "rate_limited", message);
export const invalidToken = () =>
  new AppError(400, "invalid_token", "This link is invalid, already used or expired. Ask for a new one.");
