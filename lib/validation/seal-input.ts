import { z } from "zod";

/** The text fields of a seal profile, as the engineer of record enters them from their licence. */
export const sealProfileInput = z
  .object({
    name: z.string().trim().min(1, "Give the name as it appears on the licence.").max(200, "At most 200 characters."),
    licenceNumber: z.string().trim().min(1, "Give the licence number.").max(60, "At most 60 characters."),
    jurisdiction: z.string().trim().min(1, "Give the jurisdiction that issued the licence (state, province or country).").max(120, "At most 120 characters."),
    expiresOn: z.iso.date("Give the expiry date as YYYY-MM-DD."),
  })
  .strict();

export type SealProfileInput = z.output<typeof sealProfileInput>;
