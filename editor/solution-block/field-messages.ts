/** Messages keyed by input path ("temperatureC", "components[1].amount"). */
export type FieldMessages = ReadonlyMap<string, string>;

export const NO_MESSAGES: FieldMessages = new Map();
