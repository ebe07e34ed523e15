"use client";

import { useDeferredValue, useMemo } from "react";
import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceDot,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { formatSignificant } from "@/lib/ui/format-number";
import { modelLabel } from "../chem-catalogue";
import { SelectField } from "../ui/select-field";
import type { ChemInput, SolutionResult } from "@/lib/document/evaluate-solution-block";
import { computeGammaCurves } from "@/lib/document/gamma-curves";

// One hue per model, from the palette's family of inks, lagoons and coppers, so lines stay
// distinguishable without a rainbow.
const MODEL_COLOURS: Record<string, string> = {
  "dh-limiting": "#9aa5b1",
  "dh-extended": "#52606d",
  guntelberg: "#7b8794",
  davies: "#22807a",
  "truesdell-jones": "#15524e",
  sit: "#dfa27d",
  pitzer: "#9c5430",
};

interface GammaChartProps {
  input: ChemInput;
  result: SolutionResult;
  salt: string | null;
  onSaltChange: (salt: string) => void;
}

/** γ± of the chosen salt against √I for each model; solid inside a model's range, dashed outside. */
export default function GammaChart({
  input: liveInput,
  result: liveResult,
  salt,
  onSaltChange,
}: GammaChartProps) {
  // The curves take a few dozen computeSolution calls (10–40 ms): deferred, so the typed
  // number and the block's own results update first and the chart follows.
  const input = useDeferredValue(liveInput);
  const result = useDeferredValue(liveResult);
  const saltFormula =
    salt && result.salts.some((s) => s.formula === salt) ? salt : result.salts[0]?.formula;
  const curves = useMemo(
    () => (saltFormula ? computeGammaCurves(input, result, saltFormula) : null),
    [input, result, saltFormula],
  );
  if (!curves || !saltFormula) return null;

  return (
    <figure className="mt-2 rounded-md border border-ink-faint/30 bg-white p-2">
      <div className="mb-1 flex items-end justify-between gap-2">
        <figcaption className="text-xs text-ink-soft">
          Mean activity coefficient of <span className="font-mono text-ink">{saltFormula}</span> as
          the whole composition is scaled; dashed beyond each model&apos;s stated range. The dot is
          this solution ({modelLabel(curves.own.model)}).
        </figcaption>
        {result.salts.length > 1 ? (
          <SelectField
            label="Salt"
            className="w-36 shrink-0"
            value={saltFormula}
            options={result.salts.map((s) => ({ value: s.formula, label: s.formula }))}
            onValueChange={onSaltChange}
          />
        ) : null}
      </div>
      <div
        className="h-64 w-full"
        role="img"
        aria-label={`γ± of ${saltFormula} against the square root of ionic strength for ${curves.models.length} models`}
      >
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={curves.points} margin={{ top: 4, right: 16, bottom: 20, left: 4 }}>
            <CartesianGrid stroke="#e4e7eb" strokeDasharray="2 4" />
            <XAxis
              dataKey="sqrtI"
              type="number"
              domain={[0, "dataMax"]}
              tickFormatter={(v: number) => v.toFixed(2)}
              tick={{ fontSize: 11, fill: "#52606d" }}
              label={{
                value: "√I / (mol/kg)^½",
                position: "insideBottom",
                offset: -10,
                fontSize: 11,
                fill: "#52606d",
              }}
            />
            <YAxis
              tick={{ fontSize: 11, fill: "#52606d" }}
              tickFormatter={(v: number) => v.toFixed(2)}
              domain={["auto", "auto"]}
              width={44}
              label={{
                value: "γ±",
                angle: -90,
                position: "insideLeft",
                fontSize: 11,
                fill: "#52606d",
              }}
            />
            <Tooltip
              formatter={(value, name) => [
                formatSignificant(Number(value)),
                modelLabel(String(name).replace(":outside", "")) +
                  (String(name).endsWith(":outside") ? " (outside range)" : ""),
              ]}
              labelFormatter={(label) => `√I = ${Number(label).toFixed(3)}`}
              contentStyle={{ fontSize: 12 }}
            />
            <Legend
              verticalAlign="top"
              height={28}
              wrapperStyle={{ fontSize: 11 }}
              formatter={(value) => modelLabel(String(value))}
            />
            {curves.models.flatMap((model) => [
              <Line
                key={model}
                dataKey={model}
                name={model}
                stroke={MODEL_COLOURS[model] ?? "#1f2933"}
                strokeWidth={1.75}
                dot={false}
                isAnimationActive={false}
                connectNulls={false}
              />,
              <Line
                key={`${model}:outside`}
                dataKey={`${model}:outside`}
                stroke={MODEL_COLOURS[model] ?? "#1f2933"}
                strokeWidth={1.25}
                strokeDasharray="4 3"
                dot={false}
                isAnimationActive={false}
                legendType="none"
                connectNulls={false}
              />,
            ])}
            {Number.isFinite(curves.own.meanGamma) ? (
              <ReferenceDot
                x={curves.own.sqrtI}
                y={curves.own.meanGamma}
                r={5}
                fill="#b8683d"
                stroke="#fbfaf7"
                strokeWidth={2}
                ifOverflow="extendDomain"
              />
            ) : null}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
