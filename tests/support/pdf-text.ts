import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** The text of every page of a PDF, page by page (pdfjs-dist, Mozilla's PDF reader). */
export async function pdfPageTexts(bytes: Uint8Array): Promise<string[]> {
  const doc = await getDocument({ data: bytes, useSystemFonts: false, isEvalSupported: false })
    .promise;
  const pages: string[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const content = await (await doc.getPage(n)).getTextContent();
    pages.push(
      content.items
        // Items split words at ligatures ("veri" "ﬁ" "es"): join them as written, breaking
        // only at the ends of lines.
        .map((item) => ("str" in item ? item.str + (item.hasEOL ? " " : "") : ""))
        .join("")
        .normalize("NFKC")
        .replace(/\s+/g, " "),
    );
  }
  await doc.destroy();
  return pages;
}
