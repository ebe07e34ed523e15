import { ChemFormula } from "@/lib/ui/chem-formula";
import { formatSignificant } from "@/lib/ui/format-number";
import type { SolutionResult } from "@/lib/document/evaluate-solution-block";

/**
 * What each weighed or measured component amounts to: its molar mass as weighed (hydrate
 * water included) and its molality and molarity in this solution.
 */
export function ComponentResults({ result }: { result: SolutionResult }) {
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left text-[11px] font-medium tracking-wide text-ink-soft uppercase">
        Per component
      </caption>
      <thead>
        <tr className="border-b border-ink-faint/30 text-right text-[11px] text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Species
          </th>
          <th scope="col" className="py-1 font-medium">
            M / g mol⁻¹
          </th>
          <th scope="col" className="py-1 font-medium">
            m / mol kg⁻¹
          </th>
          <th scope="col" className="py-1 font-medium">
            c / mol L⁻¹
          </th>
        </tr>
      </thead>
      <tbody className="font-mono whitespace-nowrap tabular-nums">
        {result.components.map((component, index) => (
          <tr
            key={`${component.formula}-${index}`}
            className="border-b border-ink-faint/15 text-right last:border-0"
          >
            <th
              scope="row"
              className="py-0.5 pr-3 text-left font-sans font-normal text-ink"
              title={component.name}
            >
              <ChemFormula formula={component.formula} />
              {component.name ? (
                <span className="ml-2 text-xs text-ink-faint">{component.name}</span>
              ) : null}
            </th>
            <td className="py-0.5">{formatSignificant(component.molarMassGPerMol, 5)}</td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(component.molality)}</td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(component.molarity)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
