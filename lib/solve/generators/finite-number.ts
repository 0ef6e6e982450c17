import { z } from "zod";

/** A zod number that must be finite; invalidFromZod names the field in front of the message. */
export function finiteNumber() {
  return z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");
}
