import { z } from "zod";

const text = z.string().trim().min(1, "Write some text.").max(10_000, "Use at most 10,000 characters.");

export const remarkParams = z.object({ packageId: z.uuid(), remarkId: z.uuid() });
export const calcParams = z.object({ packageId: z.uuid(), calcId: z.string().min(1).max(200) });

/** A remark on a calc, on a range of text (with its quote), or on the whole package when neither is given. */
export const createRemarkInput = z
  .object({
    text,
    calcId: z.string().min(1).max(200).nullish(),
    anchor: z
      .object({ from: z.number().int().min(0), to: z.number().int().min(0), quote: z.string().max(2_000) })
      .strict()
      .refine((a) => a.to >= a.from, { message: "The anchor must end at or after its start.", path: ["to"] })
      .nullish(),
  })
  .strict();

export const replyInput = z.object({ text }).strict();

export const assignCheckerInput = z.object({ checkerId: z.uuid("Give the checker's user id.") }).strict();

export const markCalcInput = z.object({ state: z.enum(["checked", "returned"]) }).strict();
