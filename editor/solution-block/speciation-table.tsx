import { ChemFormula } from "@/lib/ui/chem-formula";
import { formatSignificant } from "@/lib/ui/format-number";
import type { SolutionResult } from "@/lib/document/evaluate-solution-block";

type Speciation = NonNullable<SolutionResult["speciation"]>;

/**
 * Ion association: the free ions and the pairs they form (molality, γ, activity, log K), shown
 * beside the ion table, whose γ and the salts' γ± are the stoichiometric values.
 */
export function SpeciationTable({ speciation }: { speciation: Speciation }) {
  const rows = [
    ...speciation.free.map((s) => ({ ...s, kind: "free" as const, log10K: null, from: null })),
    ...speciation.pairs.map((p) => ({ ...p, kind: "pair" as const, from: [p.cation, p.anion] })),
  ];
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left text-[11px] font-medium tracking-wide text-ink-soft uppercase">
        Free ions and ion pairs
        <span className="ml-2 font-normal tracking-normal normal-case">
          true I = {formatSignificant(speciation.ionicStrengthMolal)} mol/kg
        </span>
      </caption>
      <thead>
        <tr className="border-b border-ink-faint/30 text-right text-[11px] text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Species
          </th>
          <th scope="col" className="py-1 text-left font-medium">
            Kind
          </th>
          <th scope="col" className="py-1 font-medium">
            log K
          </th>
          <th scope="col" className="py-1 font-medium">
            m / mol kg⁻¹
          </th>
          <th scope="col" className="py-1 font-medium">
            γ
          </th>
          <th scope="col" className="py-1 font-medium">
            a
          </th>
        </tr>
      </thead>
      <tbody className="font-mono whitespace-nowrap tabular-nums">
        {rows.map((row) => (
          <tr
            key={`${row.kind}-${row.formula}`}
            className="border-b border-ink-faint/15 text-right last:border-0"
          >
            <th
              scope="row"
              className="py-0.5 pr-3 text-left font-sans font-normal whitespace-nowrap text-ink"
            >
              <ChemFormula formula={row.formula} />
            </th>
            <td className="py-0.5 pr-3 text-left font-sans text-xs text-ink-soft">
              {row.from ? (
                <>
                  pair of <ChemFormula formula={row.from[0]} /> +{" "}
                  <ChemFormula formula={row.from[1]} />
                </>
              ) : (
                "free ion"
              )}
            </td>
            <td className="py-0.5 text-ink-soft">
              {row.log10K === null ? "" : formatSignificant(row.log10K)}
            </td>
            <td className="py-0.5" data-testid={`species-molality-${row.formula}`}>
              {formatSignificant(row.molality)}
            </td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(row.gamma)}</td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(row.activity)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
