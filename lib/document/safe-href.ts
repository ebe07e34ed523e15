/**
 * Which link targets an entry may hold. Shared by the editor's Link extension and the
 * server's document schema, so a pasted `javascript:` link is neither created nor saved.
 */
const ALLOWED_SCHEMES = ["http:", "https:", "mailto:"];

export function isSafeHref(href: string): boolean {
  // Browsers ignore control characters and whitespace inside a scheme ("java\tscript:"),
  // so strip them before reading it.
  const cleaned = href.replace(/[\u0000-\u0020\u007f-\u009f]/g, "").toLowerCase();
  if (cleaned === "") return false;
  const scheme = /^([a-z][a-z0-9+.-]*):/.exec(cleaned);
  if (!scheme) {
    // Relative links and fragments stay inside Ionleaf; protocol-relative "//host" does not,
    // and browsers read a backslash as a slash there ("/\host", "\\host" go to host too).
    return !cleaned.replace(/\\/g, "/").startsWith("//");
  }
  return ALLOWED_SCHEMES.includes(`${scheme[1]}:`);
}
