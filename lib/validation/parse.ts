import type { z } from "zod";
import { AppError, fieldErrorsFromZod } from "@/lib/errors";
import { checkUntrustedText } from "./untrusted-input";

/** Parses untrusted input with a shared schema, or throws a 422 AppError with field errors. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input);
  if (!result.success) {
    throw new AppError("invalid_input", "Some fields need attention.", {
      fieldErrors: fieldErrorsFromZod(result.error.issues),
    });
  }
  return result.data;
}

/**
 * FormData → plain object (last value wins; empty strings kept so schemas can say "required").
 * Every server action's input passes here, so its text is checked first (no NUL bytes, no lone
 * surrogates, bounded length).
 */
export function formDataToObject(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  form.forEach((value, key) => {
    if (typeof value === "string") out[key] = value;
  });
  checkUntrustedText(out);
  return out;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A record id from a URL: anything but a UUID cannot exist, so it is simply "not found". */
export function parseRecordId(id: string, what = "Record"): string {
  if (!UUID.test(id)) throw new AppError("not_found", `${what} not found.`);
  return id;
}

/** A revision number from a URL: digits only and within PostgreSQL's integer range. */
export function parseRevisionNumber(raw: string): number {
  if (!/^\d{1,9}$/.test(raw)) throw new AppError("not_found", "Revision not found.");
  const number = Number(raw);
  if (number < 1) throw new AppError("not_found", "Revision not found.");
  return number;
}
