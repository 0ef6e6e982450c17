import type { z } from "zod";
import { AppError } from "@/lib/app-error";
import { toErrorResponse, zodErrorResponse } from "./error-response";

/** The parsed body, or the 400 (not JSON) / 422 (wrong shape, naming the field) response to send instead. */
export async function readBody(req: Request, schema: z.ZodType): Promise<unknown> {
  const text = await req.text();
  let json: unknown;
  try {
    json = text.trim() === "" ? {} : JSON.parse(text);
  } catch (e) {
    const reason = e instanceof Error ? e.message : "unreadable";
    return toErrorResponse(new AppError("BAD_REQUEST", `The request body is not valid JSON (${reason}).`));
  }
  const parsed = schema.safeParse(json);
  return parsed.success ? parsed.data : zodErrorResponse(parsed.error);
}
