/**
 * The ways potentiostat exports lay out the same data: delimiter, decimal separator, header
 * block style, column-name style, units and an optional cycle column. `allLayoutVariants()`
 * is every combination the parser must read; tests write each one and read it back.
 */
export type NameStyle = "slash" | "spaced-slash" | "words" | "vs-reference" | "brackets";
type HeaderStyle = "none" | "equals" | "colon" | "delimited";

export interface TraceFileLayout {
  delimiter: "," | ";" | "\t";
  decimal: "." | ",";
  headerStyle: HeaderStyle;
  nameStyle: NameStyle;
  potentialUnit: "V" | "mV";
  currentUnit: "A" | "mA" | "µA" | "uA";
  cycleColumn: boolean;
  newline: "\n" | "\r\n";
}

const NAME_STYLES: readonly NameStyle[] = [
  "slash",
  "spaced-slash",
  "words",
  "vs-reference",
  "brackets",
];
const HEADER_STYLES: readonly HeaderStyle[] = ["none", "equals", "colon", "delimited"];
/** Unit pairs: every potential and current unit appears with every other setting. */
const UNIT_SETS: readonly [TraceFileLayout["potentialUnit"], TraceFileLayout["currentUnit"]][] = [
  ["V", "A"],
  ["V", "mA"],
  ["mV", "µA"],
  ["mV", "uA"],
];
/** Comma decimals never go with a comma delimiter. */
const DIALECTS: readonly [TraceFileLayout["delimiter"], TraceFileLayout["decimal"]][] = [
  [",", "."],
  [";", "."],
  [";", ","],
  ["\t", "."],
  ["\t", ","],
];

export function allLayoutVariants(): TraceFileLayout[] {
  const layouts: TraceFileLayout[] = [];
  let k = 0;
  for (const [delimiter, decimal] of DIALECTS)
    for (const headerStyle of HEADER_STYLES)
      for (const nameStyle of NAME_STYLES)
        for (const [potentialUnit, currentUnit] of UNIT_SETS)
          for (const cycleColumn of [false, true])
            layouts.push({
              delimiter,
              decimal,
              headerStyle,
              nameStyle,
              potentialUnit,
              currentUnit,
              cycleColumn,
              // Alternate line endings so both are read in every other combination.
              newline: k++ % 2 === 0 ? "\n" : "\r\n",
            });
  return layouts;
}

export function describeLayout(l: TraceFileLayout): string {
  const delimiter = l.delimiter === "\t" ? "tab" : l.delimiter;
  return `${delimiter} / ${l.decimal} / header ${l.headerStyle} / ${l.nameStyle} / ${l.potentialUnit}, ${l.currentUnit}${l.cycleColumn ? " / cycle column" : ""}${l.newline === "\r\n" ? " / CRLF" : ""}`;
}
