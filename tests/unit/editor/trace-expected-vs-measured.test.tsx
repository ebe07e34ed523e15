import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ExpectedVsMeasured } from "@/editor/trace-block/expected-vs-measured";
import type { TraceViewDto } from "@/lib/contract/traces";
import { defaultCellBlockInput, defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { analyseVoltammogram, type CycleAnalysis } from "@/lib/traces";
import { simulateReversibleCv } from "@/lib/traces/simulate";

// uPlot needs a canvas, which jsdom lacks: the plot is checked in the e2e test.
vi.mock("@/editor/trace-block/scan-rate-plot", () => ({
  default: ({ points }: { points: unknown[] }) => (
    <div data-testid="scan-rate-plot">{points.length} points</div>
  ),
}));

afterEach(cleanup);

const ferri = defaultSolutionBlockInput({
  name: "Ferri/ferro in KCl",
  components: [
    { formula: "KCl", amount: 0.1, unit: "mol/L" },
    { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
    { formula: "K4Fe(CN)6", amount: 5, unit: "mmol/L" },
  ],
});
const cell = defaultCellBlockInput({
  name: "Cell 1",
  electrolyteBlockId: ferri.blockId,
  workingElectrodeRadiusMm: 1.5,
  redoxProbe: {
    probe: "ferricyanide/ferrocyanide",
    form: "reduced",
    concentrationMmolPerL: null,
    scanRateMVPerS: 100,
  },
});

/** The parts of a trace view the panel reads: the header's scan rate and the peaks. */
function view(scanRateVPerS: number | null, peaks: CycleAnalysis[]): TraceViewDto {
  return {
    attachmentId: "00000000-0000-4000-8000-000000000001",
    name: "cv.txt",
    summary: { technique: "cyclic-voltammetry", header: { scanRateVPerS } },
    series: [],
    axes: { x: "E / V", y: "I / A" },
    bode: null,
    peaks,
    mapping: null,
  } as unknown as TraceViewDto;
}

function simulated(scanRateVPerS: number): TraceViewDto {
  const sim = simulateReversibleCv({
    concentrationMolPerL: 5e-3,
    diffusionCoefficientCm2PerS: 6.7e-6,
    electrodeAreaCm2: Math.PI * 0.15 ** 2,
    scanRateVPerS,
  });
  return view(
    scanRateVPerS,
    analyseVoltammogram({ potentialV: sim.potentialV, currentA: sim.currentA }),
  );
}

describe("expected and measured, in a trace block linked to a cell", () => {
  it("a reversible CV of the cell's probe: ΔEp and ip beside the expected, the verdict, the iR drop and ip against √v", async () => {
    const at100 = simulated(0.1);
    render(
      <ExpectedVsMeasured
        cell={cell}
        electrolyte={ferri}
        view={at100}
        linked={[
          { label: "100 mV/s", view: at100 },
          { label: "400 mV/s", view: simulated(0.4) },
        ]}
        editable
      />,
    );
    const panel = screen.getByRole("region", { name: "Expected and measured" });
    // Reversible: 57–58 mV at 25 °C (Bard & Faulkner 2001, Table 6.2.1); 2.218 RT/F = 57.0 mV.
    expect(within(panel).getByTestId("voltammogram-verdict")).toHaveTextContent(
      /^ΔEp 5[78] mV: reversible \(Nernstian\), as expected for 1 electron\.$/,
    );
    expect(within(panel).getByTestId("expected-delta-ep")).toHaveTextContent("57.0 mV");
    // Randles–Ševčík 25 °C form (B&F eq. 6.2.19): 77.8 µA for 5 mM, 0.0707 cm², 100 mV/s.
    expect(within(panel).getByTestId("expected-peak")).toHaveTextContent("77.7 µA");
    expect(within(panel).getByTestId("measured-anodic-peak")).toHaveTextContent(/^7[67]\.\d µA$/);
    expect(within(panel).getByTestId("ir-drop")).toHaveTextContent(/^\d\.\d mV$/);
    expect(within(panel).getByText(/2 of 2 voltammogram\(s\) linked to Cell 1/)).toBeVisible();
    // The plot is a lazy chunk.
    expect(await within(panel).findByTestId("scan-rate-plot")).toHaveTextContent("2 points");
  });

  it("ΔEp 72 mV says quasi-reversible or uncompensated resistance; without a probe the expected peak is asked for", () => {
    const peaks: CycleAnalysis[] = [
      {
        cycle: 1,
        anodic: {
          potentialV: 0.286,
          currentA: 7.4e-5,
          rawCurrentA: 7.6e-5,
          baselineCurrentA: 2e-6,
          row: 400,
        },
        cathodic: {
          potentialV: 0.214,
          currentA: -7.2e-5,
          rawCurrentA: -5.5e-5,
          baselineCurrentA: 1.7e-5,
          row: 1600,
        },
        deltaEpV: 0.072,
        halfWavePotentialV: 0.25,
        anodicToCathodicRatio: 1.03,
        nicholsonReverseToForwardRatio: 1,
        smoothingWindow: 11,
      },
    ];
    render(
      <ExpectedVsMeasured
        cell={{ ...cell, redoxProbe: null }}
        electrolyte={ferri}
        view={view(0.1, peaks)}
        linked={[]}
        editable
      />,
    );
    expect(screen.getByTestId("voltammogram-verdict")).toHaveTextContent(
      "ΔEp 72 mV: quasi-reversible or uncompensated resistance.",
    );
    expect(screen.getByText(/Expected peak: Choose a redox probe/)).toBeInTheDocument();
    expect(screen.queryByTestId("expected-peak")).not.toBeInTheDocument();
    expect(screen.queryByTestId("scan-rate-plot")).not.toBeInTheDocument();
  });
});
