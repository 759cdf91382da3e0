import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { moveBy } from "@/lib/board/edits";
import { begin, cancel, canRedo, canUndo, commit, createHistory, type History, push, redo, redoLabel, undo, undoLabel } from "@/lib/board/history";
import type { Placement } from "@/lib/board/types";

describe("undo and redo", () => {
  it("steps back and forth, and a new change clears what could be redone", () => {
    let h = createHistory("A");
    expect([canUndo(h), canRedo(h)]).toEqual([false, false]);
    h = push(h, "B", "add P-001");
    h = push(h, "C", "move P-001");
    expect(undoLabel(h)).toBe("move P-001");
    h = undo(h);
    expect(h.present.state).toBe("B");
    expect(redoLabel(h)).toBe("move P-001");
    h = undo(h);
    expect(h.present.state).toBe("A");
    expect(canUndo(h)).toBe(false);
    expect(undo(h)).toBe(h);
    h = redo(h);
    expect(h.present.state).toBe("B");
    h = push(h, "D", "delete P-001");
    expect(canRedo(h)).toBe(false);
    expect(redo(h)).toBe(h);
    expect([h.past.map((e) => e.state), h.present.state]).toEqual([["A", "B"], "D"]);
  });

  it("pushing the same state again records no step", () => {
    const h = push(createHistory("A"), "A");
    expect(canUndo(h)).toBe(false);
  });

  it("keeps at most `limit` steps, dropping the oldest", () => {
    let h = createHistory(0, { limit: 3 });
    for (let i = 1; i <= 5; i++) h = push(h, i);
    expect(h.past.map((e) => e.state)).toEqual([2, 3, 4]);
  });
});

describe("a drag is one step", () => {
  it("every move inside begin … commit becomes a single undo", () => {
    let h = push(createHistory("start"), "before drag", "add");
    h = begin(h);
    for (const s of ["m1", "m2", "m3"]) h = push(h, s);
    expect(h.present.state).toBe("m3");
    expect(canRedo(h)).toBe(false);
    h = commit(h, "move P-003");
    expect(h.past.map((e) => e.state)).toEqual(["start", "before drag"]);
    expect(undoLabel(h)).toBe("move P-003");
    h = undo(h);
    expect(h.present.state).toBe("before drag");
    expect(redo(h).present.state).toBe("m3");
  });

  it("a drag that ends where it began records nothing; cancel puts the start back", () => {
    let h = begin(createHistory("A"));
    h = push(h, "B");
    h = push(h, "A");
    h = commit(h);
    expect(canUndo(h)).toBe(false);
    h = cancel(push(begin(h), "X"));
    expect(h.present.state).toBe("A");
    expect(h.base).toBeNull();
  });

  it("undo in the middle of a drag abandons the drag, and only the drag", () => {
    let h = push(createHistory("A"), "B");
    h = push(begin(h), "B moving");
    h = undo(h);
    expect(h.present.state).toBe("B");
    expect(h.base).toBeNull();
    expect(undo(h).present.state).toBe("A");
  });
});

describe("memory of a board's history", () => {
  it("steps share every placement that did not change", () => {
    const board: Placement[] = Array.from({ length: 500 }, (_, i) => ({ id: `p${i}`, buildUpId: "b", x: i, y: 0, width: 0.6, height: 0.6 }));
    let h: History<readonly Placement[]> = createHistory(board as readonly Placement[]);
    for (let step = 0; step < 200; step++) h = push(h, moveBy(h.present.state, new Set([`p${step}`]), 0.01, 0));
    const distinct = new Set<Placement>();
    for (const e of [...h.past, h.present]) for (const p of e.state) distinct.add(p);
    // 500 originals and one new object per step: 700, not 200 · 500 = 100 000.
    expect(distinct.size).toBe(700);
  });
});

describe("properties (fast-check)", () => {
  const op = fc.oneof(
    fc.integer({ min: 0, max: 1000 }).map((n) => ({ kind: "push" as const, n })),
    fc.constant({ kind: "undo" as const }),
    fc.constant({ kind: "redo" as const }),
    fc.integer({ min: 0, max: 1000 }).map((n) => ({ kind: "drag" as const, n })),
  );
  type Op = { kind: "push" | "drag"; n: number } | { kind: "undo" | "redo" };
  const run = (ops: Op[]) => {
    let h = createHistory(-1, { limit: 20 });
    for (const o of ops) {
      if (o.kind === "push") h = push(h, o.n);
      else if (o.kind === "drag") h = commit(push(push(begin(h), o.n + 0.5), o.n));
      else h = o.kind === "undo" ? undo(h) : redo(h);
    }
    return h;
  };

  it("undo after redo, and redo after undo, return the same state", () => {
    fc.assert(
      fc.property(fc.array(op, { maxLength: 60 }), (ops) => {
        const h = run(ops);
        if (canRedo(h)) expect(undo(redo(h)).present.state).toBe(h.present.state);
        if (canUndo(h)) expect(redo(undo(h)).present.state).toBe(h.present.state);
      }),
      { numRuns: 300 },
    );
  });

  it("undoing everything and redoing everything comes back to the same state", () => {
    fc.assert(
      fc.property(fc.array(op, { maxLength: 60 }), (ops) => {
        const h = run(ops);
        let back = h;
        let steps = 0;
        while (canUndo(back)) {
          back = undo(back);
          steps++;
        }
        for (let i = 0; i < steps; i++) back = redo(back);
        expect(back.present.state).toBe(h.present.state);
      }),
      { numRuns: 200 },
    );
  });
});
