import { z } from "@/lib/validation/zod";
import { ROLES } from "@/db/schema/enums";

/** Shared by the sign-in form, the server action and the credentials provider. */
const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .email("Enter a valid e-mail address.");

export const signInSchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: "Enter your password." })
    .min(1, "Enter your password.")
    .max(200, "That password is too long."),
});

const newPasswordSchema = z
  .string({ error: "Choose a password." })
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.")
  .refine((p) => /[A-Za-z]/.test(p) && /[^A-Za-z]/.test(p), "Mix letters with digits or symbols.");

const roleSchema = z.enum(ROLES, {
  error: "Choose a role: researcher, supervisor or admin.",
});

export const inviteMemberSchema = z.object({
  email: emailSchema,
  role: roleSchema,
});

export const acceptInvitationSchema = z
  .object({
    token: z.string().min(20, "This invitation link is incomplete.").max(200),
    email: emailSchema,
    name: z
      .string()
      .trim()
      .min(2, "Enter your name as colleagues know it.")
      .max(120, "Use at most 120 characters."),
    password: newPasswordSchema,
    confirmPassword: z.string(),
  })
  .refine((v) => v.password === v.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords differ.",
  });

export const changeRoleSchema = z.object({
  userId: z.string().uuid("Unknown member."),
  role: roleSchema,
});

export const memberIdSchema = z.object({ userId: z.string().uuid("Unknown member.") });
