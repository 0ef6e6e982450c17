import { ZodError } from "zod";
import { AppError, statusOf } from "@/lib/app-error";
import { SolveError } from "@/lib/solve/errors";

export type ErrorBody = { error: { code: string; message: string; path?: string } };

export function errorResponse(code: string, message: string, status: number, path?: string): Response {
  const body: ErrorBody = { error: { code, message, ...(path ? { path } : {}) } };
  return Response.json(body, { status });
}

/** Maps anything a handler throws to the one error shape; never an empty 500. */
export function toErrorResponse(e: unknown): Response {
  if (e instanceof AppError) return errorResponse(e.code, e.message, statusOf[e.code], e.path);
  if (e instanceof ZodError) return zodErrorResponse(e);
  if (e instanceof SolveError) return errorResponse(e.code, e.message, 422, e.path);
  console.error("Unhandled error in route handler", e);
  return errorResponse("INTERNAL", "Something went wrong on our side. The error was logged; please try again.", 500);
}

export function zodErrorResponse(e: ZodError): Response {
  const issue = e.issues[0];
  const path = issue ? formatPath(issue.path) : undefined;
  const message = issue ? `${path ? `${path}: ` : ""}${issue.message}` : "Invalid input.";
  return errorResponse("INVALID", message, 422, path);
}

/** `["members", 3, "end"]` → `members[3].end`. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((acc, p) => (typeof p === "number" ? `${acc}[${p}]` : acc ? `${acc}.${String(p)}` : String(p)), "");
}
