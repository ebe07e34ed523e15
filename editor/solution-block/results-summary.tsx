import { formatSignificant } from "@/lib/ui/format-number";
import type { SolutionResult } from "@/lib/document/evaluate-solution-block";

/** The headline numbers: ionic strength on both scales and the Debye length. */
export function ResultsSummary({ result }: { result: SolutionResult }) {
  const items = [
    {
      label: "Ionic strength (molal)",
      symbol: "I",
      value: formatSignificant(result.ionicStrength.molal),
      unit: "mol/kg",
    },
    {
      label: "Ionic strength (molar)",
      symbol: "I",
      value: formatSignificant(result.ionicStrength.molar),
      unit: "mol/L",
    },
    {
      label: "Debye length",
      symbol: "λD",
      value: formatSignificant(result.debyeLengthNm),
      unit: "nm",
    },
  ];
  if (result.osmoticCoefficient !== undefined && result.osmoticCoefficient !== null) {
    items.push({
      label: "Osmotic coefficient",
      symbol: "φ",
      value: formatSignificant(result.osmoticCoefficient),
      unit: "",
    });
  }
  if (result.waterActivity !== undefined && result.waterActivity !== null) {
    items.push({
      label: "Water activity",
      symbol: "a(H₂O)",
      value: formatSignificant(result.waterActivity, 5),
      unit: "",
    });
  }
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-3">
      {items.map((item) => (
        <div
          key={item.label}
          className="rounded-md border border-lagoon-100 bg-lagoon-50/60 px-3 py-1.5"
        >
          <dt className="text-[11px] font-medium tracking-wide text-ink-soft uppercase">
            {item.label}
          </dt>
          <dd
            className="font-mono text-base text-lagoon-700 tabular-nums"
            data-testid={`result-${item.label}`}
          >
            <span className="mr-1 font-sans text-xs text-ink-soft italic">{item.symbol} =</span>
            {item.value}
            {item.unit ? (
              <span className="ml-1 font-sans text-xs text-ink-soft">{item.unit}</span>
            ) : null}
          </dd>
        </div>
      ))}
    </dl>
  );
}
