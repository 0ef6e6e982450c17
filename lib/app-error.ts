/** The one error type of the server side; its code decides the HTTP status. */
export type AppErrorCode = "UNAUTHENTICATED" | "FORBIDDEN" | "NOT_FOUND" | "CONFLICT" | "INVALID" | "BAD_REQUEST" | "UNSTABLE" | "THROTTLED";

export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly path?: string;

  constructor(code: AppErrorCode, message: string, path?: string) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.path = path;
  }
}

export const statusOf: Record<AppErrorCode, number> = {
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  INVALID: 422,
  UNSTABLE: 422,
  BAD_REQUEST: 400,
  THROTTLED: 429,
};

export const notFound = (what: string) => new AppError("NOT_FOUND", `${what} not found.`);
