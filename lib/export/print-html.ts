import "server-only";
import katex from "katex";
import { SIGNATURE_MEANING_LABELS, type SignatureMeaning } from "@/lib/contract/vocabulary";
import type { SolutionBlockInput, CellBlockInput } from "@/lib/document/block-schemas";
import { computeCellPotential } from "@/lib/document/evaluate-cell-block";
import { evaluateCellElectrochemistry } from "@/lib/document/evaluate-cell-electrochem";
import { evaluationFromStored, type StoredSolution } from "@/lib/document/stored-evaluation";
import { splitCharge } from "@/lib/document/formula-text";
import { formatPotentialV, formatSignificant } from "@/lib/ui/format-number";
import type { EntryArchive } from "./archive";

/**
 * The printable record of a revision as one HTML document, for Chromium to turn into a PDF:
 * the text, every solution block with its stored numbers, every cell block, the attachments'
 * hashes, and the signature manifest on the last page. Formulas are MathML (KaTeX), which
 * Chromium typesets without fonts or scripts. Everything from the record is escaped.
 */
const escape = (s: unknown): string => {
  const text = typeof s === "string" ? s : typeof s === "number" ? String(s) : "";
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
};
/** "SO4^2-" → SO<sub>4</sub><sup>2−</sup>, as the block writes formulas (lib/ui/chem-formula). */
function formulaHtml(formula: string): string {
  const { body, count, sign } = splitCharge(formula);
  const charge = sign ? `${count}${sign === "-" ? "−" : "+"}` : "";
  const typeset = escape(body).replace(/([A-Za-z)\]])(\d+)/g, "$1<sub>$2</sub>");
  return charge ? `${typeset}<sup>${charge}</sup>` : typeset;
}

const latexOf = (node: Node) => (typeof node.attrs?.latex === "string" ? node.attrs.latex : "");

const tex = (source: string, display = false) =>
  katex.renderToString(source, { output: "mathml", displayMode: display, throwOnError: false });

interface Node {
  type?: string;
  text?: string;
  attrs?: Record<string, unknown>;
  marks?: { type: string; attrs?: Record<string, unknown> }[];
  content?: Node[];
}

interface Context {
  stored: Readonly<Record<string, StoredSolution>>;
  solutions: Map<string, SolutionBlockInput>;
}

function marked(node: Node): string {
  let html = escape(node.text);
  for (const mark of node.marks ?? []) {
    if (mark.type === "bold") html = `<strong>${html}</strong>`;
    else if (mark.type === "italic") html = `<em>${html}</em>`;
    else if (mark.type === "strike") html = `<s>${html}</s>`;
    else if (mark.type === "code") html = `<code>${html}</code>`;
    else if (mark.type === "underline") html = `<u>${html}</u>`;
    else if (mark.type === "link")
      html = `${html} <span class="href">(${escape(mark.attrs?.href)})</span>`;
  }
  return html;
}

const children = (node: Node, ctx: Context) =>
  (node.content ?? []).map((c) => render(c, ctx)).join("");

function render(node: Node, ctx: Context): string {
  switch (node.type) {
    case "doc":
      return children(node, ctx);
    case "text":
      return marked(node);
    case "paragraph":
      return `<p>${children(node, ctx)}</p>`;
    case "heading": {
      const level = Math.min(4, Math.max(1, Number(node.attrs?.level ?? 2))) + 1;
      return `<h${level}>${children(node, ctx)}</h${level}>`;
    }
    case "bulletList":
      return `<ul>${children(node, ctx)}</ul>`;
    case "orderedList":
      return `<ol>${children(node, ctx)}</ol>`;
    case "taskList":
      return `<ul class="tasks">${children(node, ctx)}</ul>`;
    case "listItem":
      return `<li>${children(node, ctx)}</li>`;
    case "taskItem":
      return `<li>${node.attrs?.checked ? "☑" : "☐"} ${children(node, ctx)}</li>`;
    case "blockquote":
      return `<blockquote>${children(node, ctx)}</blockquote>`;
    case "codeBlock":
      return `<pre>${children(node, ctx)}</pre>`;
    case "horizontalRule":
      return "<hr>";
    case "hardBreak":
      return "<br>";
    case "table":
      return `<table class="doc">${children(node, ctx)}</table>`;
    case "tableRow":
      return `<tr>${children(node, ctx)}</tr>`;
    case "tableHeader":
      return `<th>${children(node, ctx)}</th>`;
    case "tableCell":
      return `<td>${children(node, ctx)}</td>`;
    case "inlineMath":
      return tex(latexOf(node));
    case "blockMath":
      return `<div class="math">${tex(latexOf(node), true)}</div>`;
    case "solutionBlock":
      return solutionBlock(node.attrs as unknown as SolutionBlockInput, ctx);
    case "cellBlock":
      return cellBlock(node.attrs as unknown as CellBlockInput, ctx);
    default:
      return children(node, ctx);
  }
}

function solutionBlock(block: SolutionBlockInput, ctx: Context): string {
  const stored = ctx.stored[block.blockId];
  const rows = block.components
    .filter((c) => c.formula.trim())
    .map(
      (c) =>
        `<tr><td>${formulaHtml(c.formula)}</td><td>${escape(c.amount)} ${escape(c.unit)}${
          c.perAmount !== null && c.perAmount !== undefined
            ? ` per ${escape(c.perAmount)} ${escape(c.perUnit)}`
            : ""
        }</td></tr>`,
    )
    .join("");
  const head = `<div class="block"><p class="block-title">Solution · ${escape(block.name || "(unnamed)")}</p>
    <p class="meta">${escape(block.solvent || "water")}, ${escape(block.temperatureC)} °C, model requested: ${escape(block.model)}${
      block.densityGPerMl ? `, density ${escape(block.densityGPerMl)} g/mL` : ""
    }</p>
    <table class="kv"><thead><tr><th>Species</th><th>Amount</th></tr></thead><tbody>${rows}</tbody></table>`;
  if (!stored) return `${head}<p class="meta">No stored result.</p></div>`;
  const evaluation = evaluationFromStored(block, stored);
  if (evaluation.status !== "ok") {
    return `${head}<p class="meta">${evaluation.status === "error" ? `Refused by the engine: ${escape(evaluation.message)}` : "No components."}</p></div>`;
  }
  const r = evaluation.result;
  const ions = r.ions
    .map(
      (ion) =>
        `<tr><td>${formulaHtml(ion.formula)}</td><td>${formatSignificant(ion.molality)}</td><td>${formatSignificant(ion.gamma)}</td><td>${formatSignificant(ion.activity)}</td></tr>`,
    )
    .join("");
  const salts = r.salts
    .map((s) => `<li>γ±(${formulaHtml(s.formula)}) = ${formatSignificant(s.meanGamma)}</li>`)
    .join("");
  const messages = [...r.validity.messages, ...r.warnings]
    .map((m) => `<li>${escape(m)}</li>`)
    .join("");
  return `${head}
    <p class="numbers">I = ${formatSignificant(r.ionicStrength.molal)} mol/kg · I = ${formatSignificant(r.ionicStrength.molar)} mol/L · Debye length ${formatSignificant(r.debyeLengthNm)} nm${
      r.osmoticCoefficient !== undefined ? ` · φ = ${formatSignificant(r.osmoticCoefficient)}` : ""
    }</p>
    <p class="meta">Model: ${escape(r.model.label)} — ${escape(r.model.reason)}</p>
    ${r.formulaTexGeneral ? `<div class="math">${tex(r.formulaTexGeneral, true)}</div>` : ""}
    <table class="kv"><thead><tr><th>Ion</th><th>m / mol kg⁻¹</th><th>γ</th><th>a</th></tr></thead><tbody>${ions}</tbody></table>
    ${salts ? `<ul class="salts">${salts}</ul>` : ""}
    ${messages ? `<ul class="messages">${messages}</ul>` : ""}
    <p class="meta">Computed by engine ${escape(stored.engineVersion)} on ${escape(stored.computedAt.slice(0, 19))} UTC.</p>
  </div>`;
}

function cellBlock(cell: CellBlockInput, ctx: Context): string {
  const electrolyte = cell.electrolyteBlockId
    ? (ctx.solutions.get(cell.electrolyteBlockId) ?? null)
    : null;
  const stored = electrolyte ? ctx.stored[electrolyte.blockId] : undefined;
  const storedEvaluation =
    electrolyte && stored ? evaluationFromStored(electrolyte, stored) : undefined;
  const potential = computeCellPotential(cell, electrolyte, storedEvaluation);
  // The same lib/document evaluation the editor shows, from the stored electrolyte.
  const chem = evaluateCellElectrochemistry(cell, electrolyte, storedEvaluation);
  const mv = (v: number) => `${v < 0 ? "−" : "+"}${Math.abs(v * 1000).toFixed(1)} mV`;
  const chemLines = [
    chem.junction.status === "ok"
      ? `Liquid junction (${escape(chem.junction.fillingLabel)} | electrolyte, Henderson): E<sub>j</sub> = ${mv(chem.junction.junctionPotentialV)} ± ${(chem.junction.uncertaintyV * 1000).toFixed(1)} mV${chem.junction.applied ? ", included in E vs the reference" : ""}`
      : null,
    chem.conductivity.status === "ok"
      ? `Conductivity (estimate${chem.conductivity.inRange ? "" : ", outside the checked range"}): κ = ${formatSignificant(chem.conductivity.conductivityMSPerCm, 4)} mS/cm`
      : null,
    chem.resistance.status === "ok"
      ? `Uncompensated resistance of the ${formatSignificant(chem.resistance.radiusMm, 3)} mm disk (Newman, upper bound): R<sub>u</sub> = ${formatSignificant(chem.resistance.resistanceOhm, 3)} Ω`
      : null,
    chem.peak.status === "ok"
      ? `Expected reversible peak (Randles–Ševčík, ${escape(chem.peak.probeName)}, ${formatSignificant(chem.peak.scanRateVPerS * 1000, 3)} mV/s): i<sub>p</sub> = ${formatSignificant(chem.peak.peakCurrentA * 1e6, 3)} µA`
      : null,
  ].filter((line): line is string => line !== null);
  const electrode = (
    label: string,
    e: { material: string; areaCm2: number | null; pretreatment: string[] },
  ) =>
    `<tr><td>${label}</td><td>${escape(e.material)}${e.areaCm2 !== null ? `, ${escape(e.areaCm2)} cm²` : ""}${
      e.pretreatment.length ? ` — ${e.pretreatment.map(escape).join("; ")}` : ""
    }</td></tr>`;
  return `<div class="block"><p class="block-title">Cell · ${escape(cell.name || "(unnamed)")}</p>
    <table class="kv"><tbody>
      ${electrode("Working", cell.workingElectrode)}
      ${electrode("Counter", cell.counterElectrode)}
      ${electrode("Reference", cell.referenceElectrode)}
      <tr><td>Reference scale</td><td>${escape(cell.referenceElectrode.type)}</td></tr>
      <tr><td>Electrolyte</td><td>${escape(electrolyte?.name ?? "not linked")}</td></tr>
      <tr><td>Purge</td><td>${escape(cell.purgeGas)} ${cell.purgeMinutes !== null ? `${escape(cell.purgeMinutes)} min` : ""}</td></tr>
      <tr><td>Instrument</td><td>${escape(cell.instrument)} ${escape(cell.channel)}</td></tr>
    </tbody></table>
    ${
      potential.status === "ok"
        ? `<p class="numbers">${escape(potential.reaction)}: E = ${formatPotentialV(potential.vsReference)} V vs ${escape(potential.reference)}${potential.junctionV !== null ? " (junction included)" : ""} (${formatPotentialV(potential.vsShe)} V vs SHE) at ${escape(potential.temperatureC)} °C</p>`
        : `<p class="meta">${escape(potential.message)}</p>`
    }
    ${chemLines.map((line) => `<p class="numbers">${line}</p>`).join("")}
  </div>`;
}

const STYLE = `
  @page { size: A4; margin: 18mm 16mm; }
  body { font-family: "Inter Variable", "DejaVu Sans", sans-serif; font-size: 10.5pt; color: #1f2933; }
  h1 { font-size: 18pt; margin: 0 0 4pt; }
  h2, h3, h4, h5 { margin: 12pt 0 4pt; }
  .head { border-bottom: 1px solid #ccc; padding-bottom: 6pt; margin-bottom: 10pt; }
  .meta { color: #52606d; font-size: 9pt; margin: 2pt 0; }
  .numbers { font-family: "DejaVu Sans Mono", monospace; font-size: 9.5pt; margin: 4pt 0; }
  .block { border: 1px solid #cfd6dd; border-radius: 4pt; padding: 6pt 8pt; margin: 8pt 0; break-inside: avoid; }
  .block-title { font-weight: 600; margin: 0 0 2pt; }
  table { border-collapse: collapse; margin: 4pt 0; }
  table.kv td, table.kv th, table.doc td, table.doc th { border: 1px solid #dde2e7; padding: 2pt 5pt; font-size: 9pt; text-align: left; }
  .math { margin: 4pt 0; }
  /* MathML does not break lines: long equations (Pitzer's) are set smaller to fit the page. */
  .block .math math { font-size: 78%; }
  .href { color: #52606d; font-size: 8.5pt; }
  .manifest { break-before: page; }
  .manifest li { margin-bottom: 8pt; }
  code, .hash { font-family: "DejaVu Sans Mono", monospace; font-size: 8.5pt; word-break: break-all; }
  .caution { border-top: 1px solid #ccc; margin-top: 14pt; padding-top: 6pt; color: #52606d; font-size: 8.5pt; }
`;

export function printHtml(archive: EntryArchive): string {
  const solutions = new Map<string, SolutionBlockInput>();
  const stack: Node[] = [archive.revision.content as Node];
  while (stack.length) {
    const n = stack.pop()!;
    if (n.type === "solutionBlock" && n.attrs)
      solutions.set(String(n.attrs.blockId), n.attrs as unknown as SolutionBlockInput);
    for (const c of n.content ?? []) stack.push(c);
  }
  const stored = Object.fromEntries(archive.solutions.map((s) => [s.blockId, s]));
  const body = render(archive.revision.content as Node, { stored, solutions });
  const signatures = archive.signatures
    .map(
      (s) => `<li><strong>${escape(s.signerName)}</strong> countersigned revision ${s.revision}<br>
        ${escape(SIGNATURE_MEANING_LABELS[s.meaning as SignatureMeaning] ?? s.meaning)}<br>
        ${s.comment ? `“${escape(s.comment)}”<br>` : ""}
        ${escape(s.signedAt.slice(0, 19).replace("T", " "))} UTC<br>
        <span class="hash">sha256 ${escape(s.contentHash)}</span> ${s.valid ? "— verifies against the stored content" : "— DOES NOT VERIFY against the stored content"}</li>`,
    )
    .join("");
  const attachments = archive.attachments
    .map((a) => `<li>${escape(a.name)} — <span class="hash">sha256 ${escape(a.sha256)}</span></li>`)
    .join("");
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escape(archive.revision.title)}</title><style>${STYLE}</style></head><body>
  <div class="head">
    <h1>${escape(archive.revision.title)}</h1>
    <p class="meta">${escape(archive.lab.name)} · project ${escape(archive.entry.projectName)} · author ${escape(archive.entry.authorName)}</p>
    <p class="meta">Revision ${archive.revision.number} saved ${escape(archive.revision.createdAt.slice(0, 19).replace("T", " "))} UTC · status ${escape(archive.entry.status)}${
      archive.revision.amends !== null
        ? ` · amends revision ${archive.revision.amends}: ${escape(archive.revision.amendmentReason)}`
        : ""
    }</p>
    <p class="meta">Content <span class="hash">sha256 ${escape(archive.revision.contentHash)}</span> — ${archive.verification.intact ? "intact" : "ALTERED"}</p>
  </div>
  ${body}
  ${attachments ? `<h2>Attachments</h2><ul>${attachments}</ul>` : ""}
  <p class="caution">Computed activities are model estimates: verify them against measurement, read the safety data sheet of every reagent and follow your institution's chemical hygiene plan and local rules.</p>
  <section class="manifest"><h2>Signature manifest</h2>
    ${signatures ? `<ul>${signatures}</ul>` : "<p>This revision is not countersigned.</p>"}
    <p class="meta">Exported ${escape(archive.exportedAt.slice(0, 19).replace("T", " "))} UTC by ${escape(archive.exportedBy)} from Ionleaf. Chain of revisions: ${archive.verification.chain.unbroken ? "unbroken" : "BROKEN"} (${archive.verification.chain.revisions} revisions).</p>
  </section>
  </body></html>`;
}
