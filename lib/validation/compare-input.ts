import { z } from "zod";

/** `?from=<revisionId>&to=<revisionId|draft>`; `to` defaults to the current draft. */
export const compareQuery = z.object({
  from: z.uuid("from: give the id of a revision of this package."),
  to: z.union([z.literal("draft"), z.uuid()], "to: give the id of a revision of this package, or draft.").default("draft"),
});
