import { act, cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { Editor, JSONContent } from "@tiptap/core";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { NotebookEditor } from "@/editor/notebook-editor";
import { sanitizePastedHtml } from "@/editor/paste-sanitizer";
import { describeDocumentErrors, entryDocumentSchema } from "@/lib/document/document-schema";
import { extractCellBlocks, extractSolutionBlocks } from "@/lib/document/extract-blocks";
import { findTemplate } from "@/lib/document/templates";
import { preloadBlockPanels } from "../../support/preload-blocks";

afterEach(cleanup);
beforeAll(preloadBlockPanels, 60000);

// jsdom has no ClipboardEvent; the paste logic only passes the event on to paste hooks.
const pasteEvent = () => new Event("paste") as ClipboardEvent;

async function mountEditor(props: Partial<Parameters<typeof NotebookEditor>[0]> = {}) {
  let editor: Editor | undefined;
  const onChange = vi.fn<(doc: JSONContent) => void>();
  render(<NotebookEditor onChange={onChange} onEditorReady={(e) => (editor = e)} {...props} />);
  await waitFor(() => expect(editor).toBeDefined());
  return { editor: editor as Editor, onChange };
}

function marksIn(doc: JSONContent): { type: string; attrs?: Record<string, unknown> }[] {
  return [...(doc.marks ?? []), ...(doc.content ?? []).flatMap(marksIn)] as {
    type: string;
    attrs?: Record<string, unknown>;
  }[];
}
function typesIn(doc: JSONContent): string[] {
  return [doc.type ?? "", ...(doc.content ?? []).flatMap(typesIn)];
}

describe("NotebookEditor", () => {
  it("shows the initial content and the toolbar", async () => {
    await mountEditor({
      initialContent: {
        type: "doc",
        content: [
          {
            type: "heading",
            attrs: { level: 1 },
            content: [{ type: "text", text: "Cyclic voltammetry, day 3" }],
          },
        ],
      },
    });
    expect(await screen.findByText("Cyclic voltammetry, day 3")).toBeInTheDocument();
    expect(screen.getByRole("toolbar", { name: "Entry formatting" })).toBeInTheDocument();
  });

  it("inserts a solution block from the toolbar and reports a document the server schema accepts", async () => {
    const user = userEvent.setup();
    const { onChange } = await mountEditor();
    await user.click(screen.getByRole("button", { name: "Insert solution block" }));
    await waitFor(() => expect(onChange).toHaveBeenCalled());
    const doc = onChange.mock.lastCall![0];
    const block = doc.content!.find((node) => node.type === "solutionBlock");
    expect(block?.attrs?.blockId).toMatch(/^[0-9a-f-]{36}$/);
    expect(entryDocumentSchema.safeParse(doc).success).toBe(true);
  });

  it("writes every kind of content in a form the server schema accepts", async () => {
    const { editor } = await mountEditor();
    act(() => {
      editor
        .chain()
        .setContent(
          "<h2>Setup</h2><p>text <strong>b</strong> <em>i</em> <s>s</s> <u>u</u> <code>c</code></p>",
        )
        .focus("end")
        .insertContent(
          '<blockquote><p>quoted</p></blockquote><ol start="3"><li><p>three</p></li></ol><ul><li><p>dot</p></li></ul><pre><code class="language-python">print(1)</code></pre><hr>',
        )
        .run();
      editor.chain().focus("end").insertTable({ rows: 2, cols: 2, withHeaderRow: true }).run();
      editor.chain().focus("end").insertContent("<p>task</p>").toggleTaskList().run();
      editor
        .chain()
        .focus("end")
        .insertInlineMath({ latex: "E^\\circ" })
        .insertBlockMath({ latex: "I=\\tfrac12\\sum m_i z_i^2" })
        .run();
      // Two in one chain: the second must land after the first, not replace the selected block.
      editor.chain().focus("end").insertSolutionBlock().insertCellBlock().run();
    });
    const doc = editor.getJSON();
    for (const type of [
      "heading",
      "blockquote",
      "orderedList",
      "codeBlock",
      "horizontalRule",
      "table",
      "tableHeader",
      "taskItem",
      "inlineMath",
      "blockMath",
      "cellBlock",
      "solutionBlock",
    ]) {
      expect(typesIn(doc)).toContain(type);
    }
    // A new cell block links to the entry's last solution block.
    const solution = doc.content.find((n) => n.type === "solutionBlock")!;
    const cell = doc.content.find((n) => n.type === "cellBlock")!;
    expect(cell.attrs!.electrolyteBlockId).toBe(solution.attrs!.blockId);
    const parsed = entryDocumentSchema.safeParse(doc);
    expect(parsed.success ? [] : describeDocumentErrors(parsed.error)).toEqual([]);
  });

  it("adds a link from the toolbar and refuses a javascript: address", async () => {
    const user = userEvent.setup();
    const { editor } = await mountEditor({
      initialContent: {
        type: "doc",
        content: [{ type: "paragraph", content: [{ type: "text", text: "SDS of KCl" }] }],
      },
    });
    act(() => {
      editor.commands.setTextSelection({ from: 1, to: 4 });
    });
    await user.click(screen.getByRole("button", { name: "Link" }));
    const address = screen.getByRole("textbox", { name: "Address" });
    await user.type(address, "javascript:alert(1)");
    expect(screen.getByRole("button", { name: "Add link" })).toBeDisabled();
    expect(screen.getByText(/Only http, https and mailto/)).toBeInTheDocument();
    await user.clear(address);
    await user.type(address, "example.org/kcl-sds{Enter}");
    const hrefs = marksIn(editor.getJSON())
      .filter((m) => m.type === "link")
      .map((m) => m.attrs?.href);
    expect(hrefs).toEqual(["https://example.org/kcl-sds"]);
  });

  it("moves between toolbar buttons with the arrow keys", async () => {
    const user = userEvent.setup();
    await mountEditor();
    screen.getByRole("button", { name: "Heading 1" }).focus();
    await user.keyboard("{ArrowRight}");
    expect(screen.getByRole("button", { name: "Heading 2" })).toHaveFocus();
    await user.keyboard("{End}");
    expect(screen.getByRole("button", { name: "Insert cell block" })).toHaveFocus();
    await user.keyboard("{ArrowRight}");
    expect(screen.getByRole("button", { name: "Heading 1" })).toHaveFocus();
  });

  it("hides the toolbar when read-only", async () => {
    await mountEditor({ editable: false });
    expect(screen.queryByRole("toolbar")).not.toBeInTheDocument();
  });

  it("drops scripts, handlers and javascript: links from pasted HTML", async () => {
    const { editor } = await mountEditor();
    act(() => {
      editor.view.pasteHTML(
        '<p>safe <a href="javascript:alert(1)">bad</a> <a href="https://example.org/sds">good</a><img src=x onerror="alert(2)"></p><script>alert(3)</script><iframe src="https://x"></iframe>',
        pasteEvent(),
      );
    });
    const doc = editor.getJSON();
    const hrefs = marksIn(doc)
      .filter((m) => m.type === "link")
      .map((m) => m.attrs?.href);
    expect(hrefs).toEqual(["https://example.org/sds"]);
    // A link stores only its href; rel and target are drawn by the app.
    expect(
      marksIn(doc)
        .filter((m) => m.type === "link")
        .map((m) => m.attrs),
    ).toEqual([{ href: "https://example.org/sds" }]);
    const anchor = editor.view.dom.querySelector("a[href='https://example.org/sds']");
    expect(anchor?.getAttribute("rel")).toBe("noopener noreferrer nofollow");
    expect(anchor?.getAttribute("target")).toBe("_blank");
    expect(JSON.stringify(doc)).not.toMatch(/alert/);
    expect(typesIn(doc)).not.toContain("image");
    const parsed = entryDocumentSchema.safeParse(doc);
    expect(parsed.success ? [] : describeDocumentErrors(parsed.error)).toEqual([]);
  });

  it("gives a pasted copy of a solution block its own id", async () => {
    const { editor } = await mountEditor();
    act(() => {
      editor.commands.insertSolutionBlock({ name: "Stock" });
    });
    const original = editor.getJSON().content.find((n) => n.type === "solutionBlock")!;
    act(() => {
      editor.commands.insertContentAt(editor.state.doc.content.size, original);
    });
    const ids = editor
      .getJSON()
      .content.filter((n) => n.type === "solutionBlock")
      .map((n) => n.attrs!.blockId);
    expect(ids).toHaveLength(2);
    expect(new Set(ids).size).toBe(2);
    expect(ids).toContain(original.attrs!.blockId);
  });
});

describe("templates in the editor", () => {
  it.each(["cell-preparation", "electrolyte-stock"])(
    "round-trips %s with its block inputs unchanged",
    async (id) => {
      const template = findTemplate(id)!.build();
      const { editor } = await mountEditor({ initialContent: template });
      const doc = editor.getJSON();
      const parsed = entryDocumentSchema.safeParse(doc);
      expect(parsed.success ? [] : describeDocumentErrors(parsed.error)).toEqual([]);
      expect(extractSolutionBlocks(doc)).toEqual(extractSolutionBlocks(template));
      expect(extractCellBlocks(doc)).toEqual(extractCellBlocks(template));
    },
  );
});

describe("copy and paste of live blocks", () => {
  it("keeps a copied solution block's inputs through the clipboard and gives the copy a new id", async () => {
    const { editor } = await mountEditor({
      initialContent: findTemplate("electrolyte-stock")!.build(),
    });
    const original = editor.getJSON().content.find((n) => n.type === "solutionBlock")!;
    let clipboardHtml = "";
    editor.state.doc.descendants((node, pos) => {
      if (node.type.name !== "solutionBlock") return true;
      const slice = editor.state.doc.slice(pos, pos + node.nodeSize);
      const serialised = editor.view.serializeForClipboard(slice);
      clipboardHtml = serialised.dom.innerHTML;
      return false;
    });
    act(() => {
      editor.commands.focus("end");
      editor.view.pasteHTML(clipboardHtml, pasteEvent());
    });
    const blocks = editor.getJSON().content.filter((n) => n.type === "solutionBlock");
    expect(blocks).toHaveLength(2);
    expect(blocks[1].attrs!.components).toEqual(original.attrs!.components);
    expect(blocks[1].attrs!.name).toBe(original.attrs!.name);
    expect(blocks[1].attrs!.blockId).not.toBe(original.attrs!.blockId);
  });

  it("refuses smuggled attributes in a pasted block", async () => {
    const { editor } = await mountEditor();
    const forged = JSON.stringify({
      blockId: "forged-id-1",
      name: "x",
      solvent: "water",
      temperatureC: 25,
      model: "auto",
      components: [],
      computedIonicStrength: 99,
    });
    act(() => {
      editor.view.pasteHTML(
        `<div data-type="solution-block" data-block='${forged.replace(/'/g, "&#39;")}'></div>`,
        pasteEvent(),
      );
    });
    const block = editor.getJSON().content.find((n) => n.type === "solutionBlock")!;
    expect(block.attrs).not.toHaveProperty("computedIonicStrength");
    // The forged inputs fail the block schema as a whole, so the pasted block starts empty.
    expect(block.attrs!.name).toBe("");
  });
});

describe("read-only", () => {
  it("shows the blocks' numbers with every input disabled", async () => {
    render(
      <NotebookEditor
        initialContent={findTemplate("cell-preparation")!.build()}
        editable={false}
      />,
    );
    const solution = await screen.findByRole(
      "region",
      { name: /Solution block/ },
      { timeout: 10000 },
    );
    expect(within(solution).getByTestId("result-Ionic strength (molal)")).toHaveTextContent(
      /mol\/kg/,
    );
    for (const input of within(solution).getAllByRole("textbox")) expect(input).toBeDisabled();
    expect(within(solution).queryByRole("button", { name: /Remove row/ })).not.toBeInTheDocument();
    const cell = screen.getByRole("region", { name: /Cell block/ });
    expect(within(cell).getByTestId("potential-vs-she")).toBeInTheDocument();
  });
});

describe("sanitizePastedHtml", () => {
  it("keeps tables, lists and math markup but strips styles and event handlers", () => {
    const html = sanitizePastedHtml(
      '<table style="color:red"><tr><td onclick="x()">1</td></tr></table><ul data-type="taskList"><li data-checked="true">a</li></ul><span data-type="inline-math" data-latex="x^2"></span>',
    );
    expect(html).toContain("<td>1</td>");
    expect(html).toContain('data-checked="true"');
    expect(html).toContain('data-latex="x^2"');
    expect(html).not.toMatch(/onclick|style=/);
  });

  it("drops scripts with their content, unwraps unknown tags and disarms links", () => {
    const html = sanitizePastedHtml(
      '<div><font color="red">kept text</font><script>alert(1)</script><svg onload="alert(2)"><a href="javascript:x">s</a></svg>' +
        '<a href=" javascript:alert(3)" onmouseover="x">link</a><a href="https://example.org">ok</a><!-- c --><img src=x onerror=alert(4)></div>',
    );
    expect(html).toContain("kept text");
    expect(html).not.toMatch(/alert|script|svg|font|onmouseover|onerror|<img|<!--/);
    expect(html).toContain("<a>link</a>");
    expect(html).toContain('<a href="https://example.org">ok</a>');
  });

  it("keeps only a pasted link's href: no class, style, target, rel or title", () => {
    const html = sanitizePastedHtml(
      '<p><a href="https://example.org" class="fixed inset-0" style="position:fixed" target="_self" rel="opener" title="t">x</a><a href="/\\evil.example">y</a></p>',
    );
    expect(html).toBe('<p><a href="https://example.org">x</a><a>y</a></p>');
  });
});
