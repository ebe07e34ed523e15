const TOP_LEVEL: Record<string, string> = {
  temperatureC: "the temperature",
  solvent: "the solvent",
  densityGPerMl: "the density",
  model: "the activity model",
};

const IN_ROW: Record<string, string> = {
  formula: "species",
  amount: "amount",
  unit: "unit",
  "per.amount": "basis amount",
  "per.unit": "basis unit",
  per: "basis",
};

/** "components[1].amount" → "the amount in row 2", for the summary above the results. */
export function describeField(field: string): string {
  if (TOP_LEVEL[field]) return TOP_LEVEL[field];
  const row = /^components\[(\d+)\](?:\.(.+))?$/.exec(field);
  if (row) return `the ${IN_ROW[row[2] ?? ""] ?? "entry"} in row ${Number(row[1]) + 1}`;
  return "the marked field";
}
