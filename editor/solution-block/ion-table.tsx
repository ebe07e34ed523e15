import { ChemFormula } from "@/lib/ui/chem-formula";
import { formatSignificant } from "@/lib/ui/format-number";
import type { SolutionResult } from "@/lib/document/evaluate-solution-block";

function chargeLabel(charge: number): string {
  if (charge === 0) return "0";
  return `${charge > 0 ? "+" : "−"}${Math.abs(charge)}`;
}

/** Per-ion molality, molarity, γ and activity, in tabular mono digits. */
export function IonTable({ result }: { result: SolutionResult }) {
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left text-[11px] font-medium tracking-wide text-ink-soft uppercase">
        Ions
      </caption>
      <thead>
        <tr className="border-b border-ink-faint/30 text-right text-[11px] text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Ion
          </th>
          <th scope="col" className="py-1 font-medium">
            z
          </th>
          <th scope="col" className="py-1 font-medium">
            m / mol kg⁻¹
          </th>
          <th scope="col" className="py-1 font-medium">
            c / mol L⁻¹
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
        {result.ions.map((ion) => (
          <tr key={ion.formula} className="border-b border-ink-faint/15 text-right last:border-0">
            <th
              scope="row"
              className="py-0.5 pr-3 text-left font-sans font-normal whitespace-nowrap text-ink"
            >
              <ChemFormula formula={ion.formula} />
            </th>
            <td className="py-0.5 text-ink-soft">{chargeLabel(ion.charge)}</td>
            <td className="py-0.5">{formatSignificant(ion.molality)}</td>
            <td className="py-0.5">{formatSignificant(ion.molarity)}</td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(ion.gamma)}</td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(ion.activity)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Mean activity coefficient and mean activity of each salt. */
export function SaltList({ result }: { result: SolutionResult }) {
  if (result.salts.length === 0) return null;
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left text-[11px] font-medium tracking-wide text-ink-soft uppercase">
        Salts
      </caption>
      <thead>
        <tr className="border-b border-ink-faint/30 text-right text-[11px] text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Salt
          </th>
          <th scope="col" className="py-1 font-medium">
            {result.speciation ? "γ± (stoichiometric)" : "γ±"}
          </th>
          <th scope="col" className="py-1 font-medium">
            a±
          </th>
        </tr>
      </thead>
      <tbody className="font-mono whitespace-nowrap tabular-nums">
        {result.salts.map((salt) => (
          <tr key={salt.formula} className="border-b border-ink-faint/15 text-right last:border-0">
            <th
              scope="row"
              className="py-0.5 pr-3 text-left font-sans font-normal whitespace-nowrap text-ink"
            >
              <ChemFormula formula={salt.formula} />
            </th>
            <td className="py-0.5 text-lagoon-700" data-testid={`mean-gamma-${salt.formula}`}>
              {formatSignificant(salt.meanGamma)}
            </td>
            <td className="py-0.5 text-lagoon-700">{formatSignificant(salt.meanActivity)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
