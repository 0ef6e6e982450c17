import { z } from "zod";

/**
 * A calc label: the automatic form (T1, S12) or an author's rename of up to
 * 16 characters that starts with a letter (TopChord, T1_alt). Dots are never
 * allowed because `T1.F_U2U3` uses the dot to name one of a calc's values.
 */
export const calcLabelPattern = /^(?:[A-Z][0-9]+|[A-Za-z][A-Za-z0-9_]{0,15})$/;

/** zod schema of a calc label, as stored in a calc node and as written in another calc's inputs. */
export const calcLabelSchema = z.string().regex(calcLabelPattern, "must be a calc label such as T1 (a letter, then letters, digits or _; at most 16)");
