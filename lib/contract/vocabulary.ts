/**
 * The value lists both sides of the app use, with the words the screens show for them. The
 * lists themselves live beside the database's CHECK constraints (db/schema/enums.ts, plain
 * constants with no database code), so a new value is added in one place.
 */
import {
  ENTRY_STATUSES,
  ROLES,
  SIGNATURE_MEANINGS,
  type EntryStatus,
  type Role,
  type SignatureMeaning,
} from "@/db/schema/enums";

export {
  ENTRY_STATUSES,
  ROLES,
  SIGNATURE_MEANINGS,
  type EntryStatus,
  type Role,
  type SignatureMeaning,
};

export const ROLE_LABELS: Record<Role, { name: string; duty: string }> = {
  researcher: { name: "Researcher", duty: "writes entries" },
  supervisor: { name: "Supervisor", duty: "reviews and countersigns" },
  admin: { name: "Admin", duty: "manages the lab" },
};

export const ENTRY_STATUS_LABELS: Record<EntryStatus, string> = {
  draft: "draft",
  submitted: "submitted",
  countersigned: "countersigned",
  returned: "returned",
  amended: "amendment in progress",
};

/** What a countersignature means, in the words the signer chooses from. */
export const SIGNATURE_MEANING_LABELS: Record<SignatureMeaning, string> = {
  witnessed: "Reviewed and witnessed: I saw this work done as recorded",
  approved: "Approved: I have reviewed the record and accept it",
  reviewed: "Reviewed: I have read the record; no technical approval implied",
};
