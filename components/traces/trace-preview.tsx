import type { TraceViewDto } from "@/lib/contract/traces";

const COLOURS = ["#1b6964", "#9c5430", "#52606d", "#7d4226", "#22807a", "#b8683d", "#1f2933"];
const WIDTH = 640;
const HEIGHT = 300;
const PAD = { left: 56, right: 12, top: 12, bottom: 36 };
const MAX_DRAWN_POINTS = 4000;

/** "1.2e-5" style numbers for the axis ends, short enough for a corner label. */
const tick = (v: number) =>
  v === 0 ? "0" : Math.abs(v) >= 1e-2 ? v.toFixed(2) : v.toExponential(1);

/**
 * A trace drawn as a still picture (SVG) from its plot view: it comes with the page's HTML,
 * so the curve is on screen before the interactive plot's code has loaded, and the live plot
 * replaces it. No hooks and no browser APIs: it renders on the server and in the browser.
 */
export function TracePreview({ view }: { view: Pick<TraceViewDto, "series" | "axes" | "name"> }) {
  const total = view.series.reduce((n, s) => n + s.x.length, 0);
  if (total === 0) return null;
  let [xMin, xMax, yMin, yMax] = [Infinity, -Infinity, Infinity, -Infinity];
  for (const s of view.series)
    for (let i = 0; i < s.x.length; i++) {
      xMin = Math.min(xMin, s.x[i]);
      xMax = Math.max(xMax, s.x[i]);
      yMin = Math.min(yMin, s.y[i]);
      yMax = Math.max(yMax, s.y[i]);
    }
  // A picture some 600 px wide needs no more than a few thousand vertices in all: of a long
  // cycling run it draws every k-th cycle (and the last) whole, rather than every cycle coarse.
  const every = Math.max(1, Math.ceil(total / MAX_DRAWN_POINTS));
  const drawn = view.series.filter((_, k) => k % every === 0 || k === view.series.length - 1);
  const polyline = (s: { x: number[]; y: number[] }) =>
    s.x.map((x, i) => `${px(x).toFixed(1)},${py(s.y[i]).toFixed(1)}`).join(" ");
  const xSpan = xMax - xMin || 1;
  const ySpan = yMax - yMin || 1;
  const innerW = WIDTH - PAD.left - PAD.right;
  const innerH = HEIGHT - PAD.top - PAD.bottom;
  const px = (x: number) => PAD.left + ((x - xMin) / xSpan) * innerW;
  const py = (y: number) => PAD.top + (1 - (y - yMin) / ySpan) * innerH;
  return (
    <svg
      data-testid="trace-preview"
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      className="h-auto w-full"
      role="img"
      aria-label={`${view.axes.y} against ${view.axes.x}: ${view.name}`}
    >
      <rect x={PAD.left} y={PAD.top} width={innerW} height={innerH} fill="none" stroke="#e5e7eb" />
      {drawn.map((s, k) => (
        <polyline
          key={s.label}
          fill="none"
          stroke={COLOURS[k % COLOURS.length]}
          strokeWidth={1.5}
          vectorEffect="non-scaling-stroke"
          points={polyline(s)}
        />
      ))}
      <g fill="#52606d" fontSize={11}>
        <text x={PAD.left} y={HEIGHT - 18}>
          {tick(xMin)}
        </text>
        <text x={WIDTH - PAD.right} y={HEIGHT - 18} textAnchor="end">
          {tick(xMax)}
        </text>
        <text x={PAD.left + innerW / 2} y={HEIGHT - 4} textAnchor="middle">
          {view.axes.x}
        </text>
        <text x={PAD.left - 4} y={PAD.top + 10} textAnchor="end">
          {tick(yMax)}
        </text>
        <text x={PAD.left - 4} y={PAD.top + innerH} textAnchor="end">
          {tick(yMin)}
        </text>
        <text x={12} y={PAD.top + innerH / 2} transform={`rotate(-90 12 ${PAD.top + innerH / 2})`}>
          {view.axes.y}
        </text>
      </g>
    </svg>
  );
}
