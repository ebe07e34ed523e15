import { AppError } from "./index";

/** PostgreSQL's error fields that matter here (node-postgres DatabaseError). */
interface PgError {
  code?: string;
  constraint?: string;
  message?: string;
}

/** Drizzle wraps the driver's error; the PostgreSQL error is the cause (or the error itself). */
function postgresErrorOf(error: unknown): PgError | null {
  for (let e: unknown = error, depth = 0; e && depth < 4; depth++) {
    const candidate = e as PgError & { cause?: unknown };
    if (typeof candidate.code === "string" && /^[0-9A-Z]{5}$/.test(candidate.code))
      return candidate;
    e = candidate.cause;
  }
  return null;
}

/** Messages for constraints a person can run into, by constraint name. */
const CONSTRAINT_MESSAGES: Record<string, string> = {
  signatures_revision_unique: "This revision has already been countersigned.",
  review_requests_one_open_per_entry: "This entry already waits for review.",
  revisions_entry_number_unique: "This entry was saved elsewhere at the same moment; reload it.",
  projects_lab_name_unique: "Your lab already has a project with that name.",
  users_email_lower_unique: "Someone with that e-mail already has an Ionleaf account.",
  species_lab_formula_unique: "Your lab already has that species.",
};

/**
 * The one place that turns database errors into typed application errors: the user gets a
 * clear 409 or 422 instead of a 500, and the log gets no SQL. Anything not recognised stays
 * an internal error (null here).
 */
export function appErrorFromDatabase(error: unknown): AppError | null {
  const pg = postgresErrorOf(error);
  if (!pg?.code) return null;
  const byConstraint = pg.constraint ? CONSTRAINT_MESSAGES[pg.constraint] : undefined;
  switch (pg.code) {
    case "23505": // unique_violation
      return new AppError("conflict", byConstraint ?? "That already exists.");
    case "23503": // foreign_key_violation
      return new AppError("invalid_input", "That refers to something that does not exist.");
    case "23514": // check_violation
    case "23502": // not_null_violation
      return new AppError("invalid_input", byConstraint ?? "A value is outside what is allowed.");
    case "23000": // integrity_constraint_violation: Ionleaf's record guards
      return new AppError("conflict", "That part of the record can no longer be changed.");
    case "22P02": // invalid_text_representation
    case "22003": // numeric_value_out_of_range
    case "22007": // invalid_datetime_format
    case "22008": // datetime_field_overflow
    case "22021": // character_not_in_repertoire (e.g. NUL bytes)
    case "22P05": // untranslatable_character
    case "54000": // program_limit_exceeded
    case "54001": // statement_too_complex
      return new AppError("invalid_input", "A value is outside what the database can store.");
    case "40001": // serialization_failure
    case "40P01": // deadlock_detected
    case "55P03": // lock_not_available
      return new AppError("conflict", "Someone else changed this at the same moment; try again.");
    default:
      return null;
  }
}
