import { z } from "zod";

/** Long enough to resist guessing; no composition rules (they push people to worse passwords). */
export const passwordSchema = z.string().min(10, "Use at least 10 characters.").max(200, "Use at most 200 characters.");
