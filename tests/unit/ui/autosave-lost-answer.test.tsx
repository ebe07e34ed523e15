import { act, renderHook } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { useAutosave } from "@/components/entries/use-autosave";
import { prepareRevision } from "@/lib/document/prepare-revision";

// A save the server committed but never answered (it died between the commit and the reply)
// comes back as a 409 on the next save. When that 409 names base + 1 with the hash of a save
// this editor sent and lost, it is the editor's own save: it builds on it without asking.
const doc = (text: string) => ({
  type: "doc",
  content: [{ type: "paragraph", content: [{ type: "text", text }] }],
});
const conflict = (currentRevision: number, currentContentHash: string) =>
  new Response(
    JSON.stringify({
      error: {
        code: "conflict",
        message: "This entry was saved elsewhere since you opened it.",
        details: { currentRevision, baseRevision: currentRevision - 1, currentContentHash },
      },
    }),
    { status: 409, headers: { "content-type": "application/json" } },
  );
const saved = (revision: number) =>
  new Response(JSON.stringify({ revision }), {
    status: 200,
    headers: { "content-type": "application/json" },
  });

describe("autosave after a lost answer", () => {
  const fetchMock = vi.fn<typeof fetch>();
  const sentBases = () =>
    fetchMock.mock.calls.map(
      ([, init]) => (JSON.parse(init?.body as string) as { baseRevision: number }).baseRevision,
    );

  beforeEach(() => {
    vi.useFakeTimers();
    vi.stubGlobal("fetch", fetchMock);
    fetchMock.mockReset();
    window.localStorage.clear();
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  const start = { revision: 1, title: "Cell", content: doc("one"), unsaved: false };
  const flush = async (ms: number) => {
    await act(async () => {
      await vi.advanceTimersByTimeAsync(ms);
    });
  };

  it("adopts its own committed save and saves the newer edit on top of it", async () => {
    const { result } = renderHook(() => useAutosave("entry-1", start));
    fetchMock.mockRejectedValueOnce(new TypeError("connection reset")); // committed as 2, unanswered
    act(() => result.current.change({ content: doc("one two") }));
    await flush(1300);
    expect(result.current.state.status).toBe("offline");
    // The lost save is remembered with the local copy, so a reload still knows it.
    const kept = JSON.parse(window.localStorage.getItem("ionleaf:entry-draft:entry-1")!) as {
      unanswered: { base: number; hashes: string[] };
    };
    const lostHash = prepareRevision("Cell", doc("one two")).contentHash;
    expect(kept.unanswered).toEqual({ base: 1, hashes: [lostHash] });

    fetchMock.mockResolvedValueOnce(conflict(2, lostHash)).mockResolvedValueOnce(saved(3));
    act(() => result.current.change({ content: doc("one two three") }));
    await flush(1300);
    expect(sentBases()).toEqual([1, 1, 2]);
    expect(result.current.state).toMatchObject({ status: "saved", revision: 3 });
    expect(window.localStorage.getItem("ionleaf:entry-draft:entry-1")).toBeNull();
  });

  it("still shows a conflict when the newer revision is someone else's", async () => {
    const { result } = renderHook(() => useAutosave("entry-2", start));
    fetchMock.mockRejectedValueOnce(new TypeError("connection reset"));
    act(() => result.current.change({ content: doc("mine") }));
    await flush(1300);
    const theirs = prepareRevision("Cell", doc("theirs")).contentHash;
    fetchMock.mockResolvedValueOnce(conflict(2, theirs));
    act(() => result.current.change({ content: doc("mine, more") }));
    await flush(1300);
    expect(result.current.state.status).toBe("conflict");
    expect(sentBases()).toEqual([1, 1]);
  });
});
