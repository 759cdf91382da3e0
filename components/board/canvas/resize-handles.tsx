"use client";

import { useEffect, useState } from "react";
import { Group, Rect } from "react-konva";
import type { Placement, Rect as BoardRect } from "@/lib/board/types";
import type { ResizeHandle } from "@/lib/board/resize";
import { toScreen as screenOf, type View } from "@/lib/board/view";
import { COPPER, PAPER } from "./colours";

const toScreen = (v: View, x: number, y: number) => screenOf(v, { x, y });
type OnResize = (id: string, handle: ResizeHandle, dx: number, dy: number, done: boolean) => BoardRect | null;

const HANDLES: { handle: ResizeHandle; fx: number; fy: number }[] = [
  { handle: "top-left", fx: 0, fy: 0 },
  { handle: "top", fx: 0.5, fy: 0 },
  { handle: "top-right", fx: 1, fy: 0 },
  { handle: "right", fx: 1, fy: 0.5 },
  { handle: "bottom-right", fx: 1, fy: 1 },
  { handle: "bottom", fx: 0.5, fy: 1 },
  { handle: "bottom-left", fx: 0, fy: 1 },
  { handle: "left", fx: 0, fy: 0.5 },
];

export function ResizeHandles({ placement: pl, view: v, onResize }: { placement: Placement; view: View; onResize: OnResize }) {
  const a = toScreen(v, pl.x, pl.y + pl.height);
  const w = pl.width * v.scale;
  const h = pl.height * v.scale;
  const [live, setLive] = useState<BoardRect | null>(null);
  useEffect(() => setLive(null), [pl]);
  const r = live ? { a: toScreen(v, live.x, live.y + live.height), w: live.width * v.scale, h: live.height * v.scale } : { a, w, h };
  return (
    <Group>
      {live && <Rect x={r.a.x} y={r.a.y} width={r.w} height={r.h} stroke={COPPER} dash={[4, 3]} listening={false} />}
      {HANDLES.map(({ handle, fx, fy }) => {
        const hx = a.x + fx * w;
        const hy = a.y + fy * h;
        return (
          <Rect
            key={handle}
            name={`handle-${handle}`}
            x={hx - 4}
            y={hy - 4}
            width={8}
            height={8}
            fill={PAPER}
            stroke={COPPER}
            strokeWidth={1.5}
            draggable
            onMouseDown={(e) => (e.cancelBubble = true)}
            onDragMove={(e) => setLive(onResize(pl.id, handle, (e.target.x() + 4 - hx) / v.scale, -(e.target.y() + 4 - hy) / v.scale, false))}
            onDragEnd={(e) => {
              onResize(pl.id, handle, (e.target.x() + 4 - hx) / v.scale, -(e.target.y() + 4 - hy) / v.scale, true);
              e.target.position({ x: hx - 4, y: hy - 4 });
            }}
          />
        );
      })}
    </Group>
  );
}
