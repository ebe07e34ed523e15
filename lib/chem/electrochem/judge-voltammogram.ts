/**
 * A plain-words verdict on a measured voltammogram beside the expected reversible one
 * (common practice, after Bard & Faulkner 2001 §6.2–6.5):
 * - ΔEp: reversible at 2.218–2.3 RT/nF (57–59/n mV at 25 °C); a little below that is not
 *   physical for diffusing species (adsorbed or thin-layer); up to about 200/n mV the
 *   electron transfer is quasi-reversible or an uncompensated resistance spreads the
 *   peaks (each peak moves by ip·Ru, so ΔEp grows by about 2 ip Ru); beyond, irreversible
 *   or a large iR drop.
 * - |ipa/ipc| near 1 (0.9–1.1): chemically reversible; otherwise a following reaction or
 *   adsorption.
 * - The forward peak against Randles–Ševčík: within ±15 % (the spread of published D) as
 *   expected; lower: less electroactive material, a smaller active area or slow electron
 *   transfer; higher: adsorption, a rough electrode or charging current.
 */
import { ChemInputError } from "../errors";
import { reversiblePeakSeparationV } from "./peak-current";

export interface JudgeVoltammogramInput {
  measured: {
    deltaEpV?: number | null;
    anodicPeakCurrentA?: number | null;
    cathodicPeakCurrentA?: number | null;
  };
  expected?: {
    peakCurrentA?: number;
    forwardPeak?: "anodic" | "cathodic";
  };
  electrons?: number;
  temperatureC?: number;
  uncompensatedResistanceOhm?: number;
}

export interface VoltammogramVerdict {
  verdict: string;
  notes: string[];
  reversibleDeltaEpV: number;
  /** ΔEp the uncompensated resistance alone would add (2 ip Ru), V; null without Ru. */
  iRContributionV: number | null;
  measuredToExpectedPeakCurrent: number | null;
  anodicToCathodicRatio: number | null;
}

const mv = (v: number) => `${Math.round(v * 1000)} mV`;

function finiteOrNull(value: number | null | undefined, field: string): number | null {
  if (value === null || value === undefined) return null;
  if (typeof value !== "number" || !Number.isFinite(value))
    throw new ChemInputError("Measured values must be numbers.", { field, code: "bad_value" });
  return value;
}

export function judgeVoltammogram(input: JudgeVoltammogramInput): VoltammogramVerdict {
  const n = input.electrons ?? 1;
  const temperatureC = input.temperatureC ?? 25;
  const reversible = reversiblePeakSeparationV(n, temperatureC);
  const nernstian = reversible * (2.303 / 2.218); // 2.3 RT/nF, 59/n mV at 25 °C
  const deltaEp = finiteOrNull(input.measured.deltaEpV, "measured.deltaEpV");
  const ipa = finiteOrNull(input.measured.anodicPeakCurrentA, "measured.anodicPeakCurrentA");
  const ipc = finiteOrNull(input.measured.cathodicPeakCurrentA, "measured.cathodicPeakCurrentA");
  const ru = finiteOrNull(input.uncompensatedResistanceOhm, "uncompensatedResistanceOhm");
  const notes: string[] = [];

  const peak = ipa !== null && ipc !== null ? Math.max(Math.abs(ipa), Math.abs(ipc)) : (ipa ?? ipc);
  const iRContributionV = ru !== null && peak !== null ? 2 * Math.abs(peak) * ru : null;

  let verdict: string;
  if (deltaEp === null)
    verdict = "No ΔEp: one of the peaks is missing (irreversible, or the sweep stops short of it).";
  else if (deltaEp < reversible - 0.005 / n)
    verdict = `ΔEp ${mv(deltaEp)}: below the reversible ${mv(reversible)} — an adsorbed or thin-layer couple, not a diffusing one.`;
  else if (deltaEp <= nernstian + 0.006 / n)
    verdict = `ΔEp ${mv(deltaEp)}: reversible (Nernstian), as expected for ${n} electron${n > 1 ? "s" : ""}.`;
  else if (deltaEp <= 0.2 / n)
    verdict = `ΔEp ${mv(deltaEp)}: quasi-reversible or uncompensated resistance.`;
  else
    verdict = `ΔEp ${mv(deltaEp)}: irreversible electron transfer or a large uncompensated resistance.`;

  if (deltaEp !== null && iRContributionV !== null && deltaEp > nernstian + 0.006 / n) {
    const left = deltaEp - iRContributionV;
    notes.push(
      left <= nernstian + 0.006 / n
        ? `The uncompensated resistance (${ru!.toPrecision(3)} Ω) adds about ${mv(iRContributionV)} to ΔEp: without it the couple looks reversible.`
        : `The uncompensated resistance (${ru!.toPrecision(3)} Ω) explains about ${mv(iRContributionV)} of ΔEp; the rest points to slow electron transfer.`,
    );
  }

  let anodicToCathodicRatio: number | null = null;
  if (ipa !== null && ipc !== null && ipc !== 0) {
    anodicToCathodicRatio = Math.abs(ipa / ipc);
    notes.push(
      anodicToCathodicRatio >= 0.9 && anodicToCathodicRatio <= 1.1
        ? `|ipa/ipc| = ${anodicToCathodicRatio.toFixed(2)}: chemically reversible.`
        : `|ipa/ipc| = ${anodicToCathodicRatio.toFixed(2)}: a chemical reaction following the electron transfer, or adsorption.`,
    );
  }

  let measuredToExpectedPeakCurrent: number | null = null;
  const expected = input.expected?.peakCurrentA;
  if (expected !== undefined) {
    if (!(expected > 0))
      throw new ChemInputError("The expected peak current must be positive.", {
        field: "expected.peakCurrentA",
        code: "bad_value",
      });
    const forward = input.expected?.forwardPeak === "cathodic" ? ipc : ipa;
    if (forward !== null) {
      measuredToExpectedPeakCurrent = Math.abs(forward) / expected;
      const pct = Math.round((measuredToExpectedPeakCurrent - 1) * 100);
      notes.push(
        Math.abs(measuredToExpectedPeakCurrent - 1) <= 0.15
          ? `Peak current ${pct >= 0 ? "+" : ""}${pct} % of Randles–Ševčík: as expected for this concentration, area and D.`
          : measuredToExpectedPeakCurrent < 1
            ? `Peak current ${pct} % below Randles–Ševčík: less electroactive material, a smaller active area, or slow electron transfer.`
            : `Peak current +${pct} % above Randles–Ševčík: adsorption, a rough (larger) electrode area, or charging current.`,
      );
    }
  }
  return {
    verdict,
    notes,
    reversibleDeltaEpV: reversible,
    iRContributionV,
    measuredToExpectedPeakCurrent,
    anodicToCathodicRatio,
  };
}
