import { describe, expect, it } from "vitest";
import {
  acceptInvitationSchema,
  changeRoleSchema,
  inviteMemberSchema,
  signInSchema,
} from "@/lib/validation/auth";
import { fieldErrorsFromZod } from "@/lib/errors";

describe("shared auth schemas", () => {
  it("normalises e-mail addresses to lower case without spaces", () => {
    const parsed = signInSchema.parse({ email: "  Wren.Admin@Saltmarsh.Example ", password: "x" });
    expect(parsed.email).toBe("wren.admin@saltmarsh.example");
  });

  it("reports each bad field by name", () => {
    const result = signInSchema.safeParse({ email: "not-an-address", password: "" });
    expect(result.success).toBe(false);
    if (!result.success) {
      const errors = fieldErrorsFromZod(result.error.issues);
      expect(errors.email).toEqual(["Enter a valid e-mail address."]);
      expect(errors.password).toEqual(["Enter your password."]);
    }
  });

  it("accepts only the three roles for invitations", () => {
    expect(inviteMemberSchema.safeParse({ email: "a@b.example", role: "supervisor" }).success).toBe(
      true,
    );
    expect(inviteMemberSchema.safeParse({ email: "a@b.example", role: "owner" }).success).toBe(
      false,
    );
    expect(changeRoleSchema.safeParse({ userId: "not-a-uuid", role: "admin" }).success).toBe(false);
  });

  it("wants a long, mixed password typed twice the same", () => {
    const base = { token: "t".repeat(43), email: "rowan@lab.example", name: "Rowan Test" };
    expect(
      acceptInvitationSchema.safeParse({ ...base, password: "short1", confirmPassword: "short1" })
        .success,
    ).toBe(false);
    expect(
      acceptInvitationSchema.safeParse({
        ...base,
        password: "onlyletterslong",
        confirmPassword: "onlyletterslong",
      }).success,
    ).toBe(false);
    const mismatch = acceptInvitationSchema.safeParse({
      ...base,
      password: "graphite-rod-7",
      confirmPassword: "graphite-rod-8",
    });
    expect(mismatch.success).toBe(false);
    if (!mismatch.success)
      expect(fieldErrorsFromZod(mismatch.error.issues).confirmPassword).toBeDefined();
    expect(
      acceptInvitationSchema.safeParse({
        ...base,
        password: "graphite-rod-7",
        confirmPassword: "graphite-rod-7",
      }).success,
    ).toBe(true);
  });
});
