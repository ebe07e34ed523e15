import { AppError } from "@/lib/errors";

/**
 * An uploaded file's name as shown and sent back on download: a plain name, never a path.
 * Refused: empty names, path separators, "." and "..", control characters and over-long names.
 */
export function checkedFileName(raw: string): string {
  const name = raw.normalize("NFC").trim();
  const problem =
    name === ""
      ? "The file has no name."
      : /[/\\]/.test(name)
        ? "A file name cannot contain / or \\."
        : name === "." || name === ".."
          ? "That is not a file name."
          : /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/.test(name)
            ? "A file name cannot contain control characters."
            : [...name].length > 200
              ? "Use a file name of at most 200 characters."
              : null;
  if (problem) throw new AppError("invalid_input", problem, { fieldErrors: { file: [problem] } });
  return name;
}
