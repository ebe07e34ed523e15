/** Normalises "components.1.amount" and "components[1].amount" to the bracket form the UI uses. */
export function normaliseFieldPath(field: string): string {
  return field.replace(/\.(\d+)(?=\.|$)/g, "[$1]");
}
