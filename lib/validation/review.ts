import { z } from "@/lib/validation/zod";
import { SIGNATURE_MEANINGS } from "@/lib/contract/vocabulary";

const revisionNumber = z.coerce
  .number({ message: "Give the revision number you reviewed." })
  .int()
  .min(1)
  .max(1_000_000);

/** Submit for countersignature: optionally one supervisor; without one, all are asked. */
export const submitEntrySchema = z.object({
  reviewerId: z
    .union([z.literal(""), z.uuid("Choose a supervisor of your lab.")])
    .optional()
    .transform((v) => (v ? v : undefined)),
});

export const countersignSchema = z.object({
  revision: revisionNumber,
  password: z.string().min(1, "Enter your password to sign.").max(200),
  meaning: z.enum(SIGNATURE_MEANINGS, { message: "Choose what your signature means." }),
  comment: z.string().trim().max(2000, "Use at most 2000 characters.").default(""),
});

export const returnEntrySchema = z.object({
  revision: revisionNumber,
  comment: z
    .string()
    .trim()
    .min(1, "Say what the author should change.")
    .max(2000, "Use at most 2000 characters."),
});

export const amendEntrySchema = z.object({
  reason: z
    .string()
    .trim()
    .min(3, "Give the reason for the amendment.")
    .max(2000, "Use at most 2000 characters."),
});
