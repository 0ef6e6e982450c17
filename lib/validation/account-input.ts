import { z } from "zod";
import { passwordSchema } from "@/lib/auth/password-policy";

export const acceptInvitationInput = z.object({ token: z.string().min(20).max(200), password: passwordSchema });

export const accountUpdateInput = z
  .object({
    name: z.string().trim().min(1, "Give your name.").max(200),
    currentPassword: z.string().min(1),
    newPassword: passwordSchema,
  })
  .partial()
  .strict()
  .refine((v) => (v.newPassword ? Boolean(v.currentPassword) : true), { message: "Give your current password to set a new one.", path: ["currentPassword"] });
