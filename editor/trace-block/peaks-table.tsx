import type { TraceViewDto } from "@/lib/contract/traces";
import { formatSignificant } from "@/lib/ui/format-number";

const mV = (v: number | null) => (v === null ? "—" : `${(v * 1000).toFixed(1)}`);
const volts = (v: number | null, shift: number) => (v === null ? "—" : (v + shift).toFixed(4));

/** Anodic and cathodic peaks per cycle (baseline-corrected), ΔEp and E½. */
export function PeaksTable({
  peaks,
  shift,
  perArea,
}: {
  peaks: TraceViewDto["peaks"];
  shift: number;
  perArea: number;
}) {
  if (peaks.length === 0) return null;
  const current = (a: number | null | undefined) =>
    a === null || a === undefined ? "—" : formatSignificant(a * perArea);
  const unit = perArea === 1 ? "A" : "A cm⁻²";
  // A long cycling run scrolls inside the block (focusable, so the keyboard can scroll it too).
  const long = peaks.length > 12;
  return (
    <div
      className={long ? "max-h-72 overflow-auto" : "overflow-x-auto"}
      {...(long ? { tabIndex: 0, role: "region", "aria-label": "Peaks of every cycle" } : {})}
    >
      <table className="w-full text-xs tabular-nums" aria-label="Peaks per cycle">
        <thead className="sticky top-0 bg-paper text-left text-ink-soft">
          <tr>
            <th scope="col" className="py-1 pr-3 font-normal">
              Cycle
            </th>
            <th scope="col" className="py-1 pr-3 font-normal">
              E<sub>pa</sub> / V
            </th>
            <th scope="col" className="py-1 pr-3 font-normal">
              i<sub>pa</sub> / {unit}
            </th>
            <th scope="col" className="py-1 pr-3 font-normal">
              E<sub>pc</sub> / V
            </th>
            <th scope="col" className="py-1 pr-3 font-normal">
              i<sub>pc</sub> / {unit}
            </th>
            <th scope="col" className="py-1 pr-3 font-normal">
              ΔE<sub>p</sub> / mV
            </th>
            <th scope="col" className="py-1 font-normal">
              E<sub>½</sub> / V
            </th>
          </tr>
        </thead>
        <tbody className="font-mono">
          {peaks.map((p) => (
            <tr key={p.cycle} data-testid={`peaks-cycle-${p.cycle}`}>
              <td className="py-1 pr-3">{p.cycle}</td>
              <td className="py-1 pr-3">{volts(p.anodic?.potentialV ?? null, shift)}</td>
              <td className="py-1 pr-3">{current(p.anodic?.currentA)}</td>
              <td className="py-1 pr-3">{volts(p.cathodic?.potentialV ?? null, shift)}</td>
              <td className="py-1 pr-3">{current(p.cathodic?.currentA)}</td>
              <td className="py-1 pr-3" data-testid={`delta-ep-${p.cycle}`}>
                {mV(p.deltaEpV)}
              </td>
              <td className="py-1">{volts(p.halfWavePotentialV, shift)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
