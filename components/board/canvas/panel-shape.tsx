"use client";

import { memo, useMemo, useRef } from "react";
import { Group, Line, Rect, Shape, Text } from "react-konva";
import type Konva from "konva";
import type { Placement, Rect as BoardRect } from "@/lib/board/types";
import type { RuleBreak } from "@/lib/board/rules";
import { panelPattern, visibleDetail } from "@/lib/board/pattern";
import { toScreen as screenOf, toWorld as worldOf, type View } from "@/lib/board/view";
import type { BoardView } from "@/lib/services/boards";
import { CAUTION, COPPER, FAULT, INK, SAGE, SAGE_SOFT } from "./colours";

type Facing = BoardView["buildUps"][number];
const toScreen = (v: View, x: number, y: number) => screenOf(v, { x, y });
const toWorld = (v: View, px: number, py: number) => worldOf(v, { x: px, y: py });

type PanelProps = {
  placement: Placement;
  view: View;
  viewport: BoardRect;
  facing: Facing | undefined;
  selected: boolean;
  broken: RuleBreak[] | undefined;
  /** marked installed on site: sage fill and a tick, so the consultant sees what is built */
  installed: boolean;
  draggable: boolean;
  /** placing a pin: a press on the panel goes to the board, which puts the pin there */
  pinMode: boolean;
  onSelect: (ids: string[], additive: boolean) => void;
  onDragStart: (id: string) => void;
  onDragMove: (id: string, rect: BoardRect) => BoardRect;
  onDragEnd: (id: string, rect: BoardRect) => void;
  dragLayer: React.RefObject<Konva.Layer | null>;
};

// One panel. Memoised on its placement object, so moving one panel redraws one panel.
export const PanelShape = memo(function PanelShape({ placement: pl, view: v, viewport, facing, selected, broken, installed, draggable, pinMode, onSelect, onDragStart, onDragMove, onDragEnd, dragLayer }: PanelProps) {
  const home = useRef<Konva.Container | null>(null);
  const a = toScreen(v, pl.x, pl.y + pl.height);
  // A panel refused for a size of nothing still shows as a mark, not a vanished line.
  const w = Math.max(2, pl.width * v.scale);
  const h = Math.max(2, pl.height * v.scale);
  const detail = facing ? visibleDetail(v.scale, facing.facing) : null;
  const marks = detail?.mode === "marks";
  // The pattern is worked out once per panel and view, not on every redraw of the layer.
  const pattern = useMemo(
    () => (facing ? panelPattern(facing.facing, pl, { borderX: facing.borderX, borderY: facing.borderY }, { scale: v.scale, clip: viewport }) : null),
    [facing, pl, v.scale, viewport],
  );
  const stroke = broken?.length ? (broken.some((b) => b.rule === "overlap" || b.rule === "outside" || b.rule === "over-opening") ? FAULT : CAUTION) : selected ? COPPER : INK;
  const toRect = (node: Konva.Node): BoardRect => {
    const world = toWorld(v, node.x(), node.y());
    return { x: world.x, y: world.y - pl.height, width: pl.width, height: pl.height };
  };
  return (
    <Group
      x={a.x}
      y={a.y}
      draggable={draggable}
      name="panel"
      data-id={pl.id}
      onMouseDown={(e) => {
        if (pinMode) return;
        e.cancelBubble = true;
        onSelect([pl.id], e.evt.shiftKey);
      }}
      onDragStart={(e) => {
        home.current = e.target.getParent();
        if (dragLayer.current) e.target.moveTo(dragLayer.current);
        onDragStart(pl.id);
      }}
      onDragMove={(e) => {
        const snapped = onDragMove(pl.id, toRect(e.target));
        const at = toScreen(v, snapped.x, snapped.y + snapped.height);
        e.target.position(at);
      }}
      onDragEnd={(e) => {
        const rect = toRect(e.target);
        if (home.current) e.target.moveTo(home.current);
        onDragEnd(pl.id, rect);
      }}
    >
      <Rect width={w} height={h} fill={selected ? "#f3e3d6" : installed ? SAGE_SOFT : "#efe9dc"} stroke={installed && !selected && !broken?.length ? SAGE : stroke} strokeWidth={selected || broken?.length || installed ? 2 : 1} />
      {facing && pattern && (
        <Shape
          listening={false}
          sceneFunc={(ctx) => {
            // Zoomed out: a tone over the perforated field as dark as its open area; zoomed in:
            // the holes or slots at true scale, only those on screen.
            const fx = (pattern.field.x - pl.x) * v.scale;
            const fy = (pl.y + pl.height - pattern.field.y - pattern.field.height) * v.scale;
            if (!marks || (!pattern.holes && !pattern.slots)) {
              ctx.fillStyle = `rgba(26,39,64,${(0.15 + 0.85 * pattern.detail.tone).toFixed(3)})`;
              ctx.fillRect(fx, fy, pattern.field.width * v.scale, pattern.field.height * v.scale);
              return;
            }
            ctx.beginPath();
            if (pattern.holes) {
              const r = (facing.facing.kind === "slots" ? 0 : (facing.facing.holeDiameter ?? 0)) * 0.5 * v.scale;
              const holes = pattern.holes;
              for (let i = 0; i < holes.length; i += 2) {
                const hx = (holes[i] - pl.x) * v.scale;
                const hy = (pl.y + pl.height - holes[i + 1]) * v.scale;
                ctx.moveTo(hx + r, hy);
                ctx.arc(hx, hy, r, 0, Math.PI * 2);
              }
            }
            if (pattern.slots) {
              const slots = pattern.slots;
              for (let i = 0; i < slots.length; i += 4) {
                ctx.rect((slots[i] - pl.x) * v.scale, (pl.y + pl.height - slots[i + 1] - slots[i + 3]) * v.scale, slots[i + 2] * v.scale, slots[i + 3] * v.scale);
              }
            }
            ctx.fillStyle = INK;
            ctx.fill();
          }}
        />
      )}
      {w > 34 && h > 16 && <Text x={4} y={4} text={pl.code ?? ""} fontSize={10} fill={INK} listening={false} />}
      {installed && w > 16 && h > 16 && <Line points={[w - 15, h - 9, w - 11, h - 5, w - 4, h - 13]} stroke={SAGE} strokeWidth={2.5} listening={false} />}
      {broken?.length ? <Text x={w - 14} y={2} text="!" fontSize={13} fontStyle="bold" fill={stroke} listening={false} /> : null}
    </Group>
  );
});

