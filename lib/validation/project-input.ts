import { z } from "zod";

const text = (max: number) => z.string().trim().max(max, `Use at most ${max} characters.`);

export const projectCreateInput = z.object({
  name: text(200).min(1, "Give the project a name."),
  jobNumber: text(50).min(1, "Give the job number."),
  client: text(200).default(""),
  site: text(300).default(""),
  unitSystem: z.enum(["SI", "US"]).default("SI"),
  designCodes: z.array(text(120).min(1)).max(30).default([]),
  paperSize: z.enum(["A4", "Letter"]).default("A4"),
  revisionScheme: z.enum(["numeric", "alpha"]).default("numeric"),
});
export type ProjectCreateInput = z.infer<typeof projectCreateInput>;

export const projectUpdateInput = z
  .object({
    name: text(200).min(1, "Give the project a name."),
    jobNumber: text(50).min(1, "Give the job number."),
    client: text(200),
    site: text(300),
    unitSystem: z.enum(["SI", "US"]),
    designCodes: z.array(text(120).min(1)).max(30),
    paperSize: z.enum(["A4", "Letter"]),
    revisionScheme: z.enum(["numeric", "alpha"]),
  })
  .partial()
  .strict();
export type ProjectUpdateInput = z.infer<typeof projectUpdateInput>;

export const projectParams = z.object({ projectId: z.uuid() });
