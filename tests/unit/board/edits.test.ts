import { describe, expect, it } from "vitest";
import { addPlacements, moveBy, removePlacements, updatePlacement } from "@/lib/board/edits";
import type { Placement } from "@/lib/board/types";

const board: Placement[] = ["a", "b", "c"].map((id, i) => ({ id, buildUpId: "b1", x: i, y: 0, width: 0.6, height: 0.6 }));

describe("edits share what they do not change", () => {
  it("a move makes new objects only for the panels moved", () => {
    const next = moveBy(board, new Set(["b"]), 0.1, -0.2);
    expect(next[0]).toBe(board[0]);
    expect(next[2]).toBe(board[2]);
    expect(next[1]).toEqual({ ...board[1], x: 1.1, y: -0.2 });
    expect(board[1].x).toBe(1);
  });

  it("returns the same array when nothing changes", () => {
    expect(moveBy(board, new Set(["b"]), 0, 0)).toBe(board);
    expect(moveBy(board, new Set(["zz"]), 1, 0)).toBe(board);
    expect(updatePlacement(board, "a", { x: 0, width: 0.6 })).toBe(board);
    expect(updatePlacement(board, "zz", { x: 3 })).toBe(board);
    expect(removePlacements(board, new Set(["zz"]))).toBe(board);
    expect(addPlacements(board, [])).toBe(board);
  });

  it("numeric entry sets the fields given and leaves the rest", () => {
    const next = updatePlacement(board, "c", { x: 2.5, height: 1.2, width: undefined });
    expect(next[2]).toEqual({ id: "c", buildUpId: "b1", x: 2.5, y: 0, width: 0.6, height: 1.2 });
    expect(next[0]).toBe(board[0]);
  });

  it("removes and adds", () => {
    expect(removePlacements(board, new Set(["a", "c"])).map((p) => p.id)).toEqual(["b"]);
    const d = { ...board[0], id: "d" };
    expect(addPlacements(board, [d]).map((p) => p.id)).toEqual(["a", "b", "c", "d"]);
  });
});
