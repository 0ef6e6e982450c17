import type { z } from "zod";
import { toErrorResponse } from "./error-response";
import { readBody } from "./read-body";

/** For the few routes that need no sign-in (health, accepting an invitation): input parsing and error mapping only. */
export function publicRoute<B extends z.ZodType | undefined = undefined>(
  options: { body?: B },
  handler: (ctx: { req: Request; body: B extends z.ZodType ? z.output<B> : undefined }) => Promise<unknown>,
): (req: Request) => Promise<Response> {
  return async (req) => {
    try {
      const body = options.body ? await readBody(req, options.body) : undefined;
      if (body instanceof Response) return body;
      const result = await handler({ req, body: body as B extends z.ZodType ? z.output<B> : undefined });
      return result instanceof Response ? result : Response.json(result);
    } catch (e) {
      return toErrorResponse(e);
    }
  };
}
