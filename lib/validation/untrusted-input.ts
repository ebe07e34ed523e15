import { AppError } from "@/lib/errors";
import { checkJsonShape } from "./json-shape";

/**
 * The first check of everything that arrives from outside (JSON bodies, query strings, path
 * parameters, form fields), before any schema or anything recursive runs: nesting and size
 * within bounds, and text that PostgreSQL can store and a person can read — no NUL bytes and
 * no lone UTF-16 surrogates. A refusal is a 422 that names the problem.
 */
const LIMITS = { maxDepth: 128, maxValues: 1_000_000 };

function badText(text: string): string | null {
  if (text.includes("\u0000")) return "contains a NUL byte";
  if (!text.isWellFormed()) return "is not valid Unicode (a lone surrogate)";
  return null;
}

export function checkUntrustedJson(value: unknown): void {
  const shape = checkJsonShape(value, LIMITS);
  if (shape) {
    throw new AppError(
      "invalid_input",
      shape.kind === "too_deep"
        ? `The request nests deeper than ${LIMITS.maxDepth} levels.`
        : `The request holds more than ${LIMITS.maxValues} values.`,
    );
  }
  // The shape check passed, so this walk is bounded; it is iterative all the same.
  const stack: [unknown, string][] = [[value, ""]];
  while (stack.length) {
    const [current, path] = stack.pop()!;
    if (typeof current === "string") {
      const problem = badText(current);
      if (problem) throw fieldError(path || "body", problem);
    } else if (Array.isArray(current)) {
      current.forEach((item, i) => stack.push([item, `${path}${path ? "." : ""}${i}`]));
    } else if (current && typeof current === "object") {
      for (const [key, item] of Object.entries(current)) {
        const problem = badText(key);
        if (problem) throw fieldError(path || "body", `a key ${problem}`);
        stack.push([item, `${path}${path ? "." : ""}${key}`]);
      }
    }
  }
}

/** Query parameters, path parameters and form fields: flat text. */
export function checkUntrustedText(fields: Record<string, string>, maxLength = 100_000): void {
  for (const [name, text] of Object.entries(fields)) {
    const problem = badText(name) ?? badText(text);
    if (problem) throw fieldError(name, problem);
    if (text.length > maxLength) throw fieldError(name, `is longer than ${maxLength} characters`);
  }
}

function fieldError(field: string, problem: string): AppError {
  const message = `The value of ${field} ${problem}.`;
  return new AppError("invalid_input", message, { fieldErrors: { [field]: [message] } });
}
