import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { createAutosave, retryDelayMs, type AutosaveSnapshot, type Outcome } from "@/lib/board/autosave";

class Refusal extends Error {
  constructor(readonly outcome: Outcome) {
    super(outcome);
  }
}

function harness(answers: (Outcome | "ok")[]) {
  const sent: { doc: string; version: number }[] = [];
  const states: AutosaveSnapshot<string>[] = [];
  let version = 3;
  const saver = createAutosave<string>({
    version,
    classify: (e) => (e as Refusal).outcome,
    onChange: (s) => states.push(s),
    send: async (doc, v) => {
      sent.push({ doc, version: v });
      const answer = answers.shift() ?? "ok";
      if (answer !== "ok") throw new Refusal(answer);
      return { version: ++version };
    },
  });
  return { saver, sent, states, last: () => states.at(-1)! };
}

describe("the board's autosave", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it("sends a change after the pause, naming the version it started from", async () => {
    const h = harness(["ok"]);
    h.saver.schedule("a");
    h.saver.schedule("b");
    await vi.advanceTimersByTimeAsync(599);
    expect(h.sent).toEqual([]);
    await vi.advanceTimersByTimeAsync(1);
    expect(h.sent).toEqual([{ doc: "b", version: 3 }]);
    expect(h.last()).toMatchObject({ state: "saved", version: 4 });
  });

  it("never sends a refused document again", async () => {
    const h = harness(["refused"]);
    h.saver.schedule("width 0");
    await vi.advanceTimersByTimeAsync(600);
    await vi.advanceTimersByTimeAsync(120_000);
    expect(h.sent.map((s) => s.doc)).toEqual(["width 0"]);
    expect(h.last()).toMatchObject({ state: "refused", refused: "width 0" });
    // The person's next change is sent, and a save clears the refusal.
    h.saver.schedule("width 600");
    await vi.advanceTimersByTimeAsync(600);
    expect(h.sent.map((s) => s.doc)).toEqual(["width 0", "width 600"]);
    expect(h.last()).toMatchObject({ state: "saved", refused: null, error: null });
  });

  it("sends again after a network or server fault, waiting longer each time", async () => {
    const h = harness(["retry", "retry", "ok"]);
    h.saver.schedule("a");
    await vi.advanceTimersByTimeAsync(600);
    expect(h.last().state).toBe("error");
    await vi.advanceTimersByTimeAsync(999);
    expect(h.sent).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(1);
    expect(h.sent).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(1999);
    expect(h.sent).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(1);
    expect(h.sent.map((s) => s.doc)).toEqual(["a", "a", "a"]);
    expect(h.last()).toMatchObject({ state: "saved", version: 4 });
  });

  it("stops on a conflict until the person reloads", async () => {
    const h = harness(["conflict"]);
    h.saver.schedule("a");
    await vi.advanceTimersByTimeAsync(600);
    h.saver.schedule("b");
    await vi.advanceTimersByTimeAsync(60_000);
    expect(h.sent.map((s) => s.doc)).toEqual(["a"]);
    expect(h.last().state).toBe("conflict");
    h.saver.reset(9);
    h.saver.schedule("c");
    await vi.advanceTimersByTimeAsync(600);
    expect(h.sent.at(-1)).toEqual({ doc: "c", version: 9 });
  });

  it("waits 1, 2, 4 … seconds between attempts, never more than 30", () => {
    expect([1, 2, 3, 4, 5, 6, 7, 20].map(retryDelayMs)).toEqual([1000, 2000, 4000, 8000, 16000, 30000, 30000, 30000]);
  });
});
