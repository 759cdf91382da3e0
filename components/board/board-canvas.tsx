"use client";

import { memo, useEffect, useMemo, useRef, useState } from "react";
import { Circle, Group, Image as KonvaImage, Layer, Line, Rect, Shape, Stage, Text } from "react-konva";
import type Konva from "konva";
import type { BoardOpening, Placement, Rect as BoardRect } from "@/lib/board/types";
import type { RuleBreak } from "@/lib/board/rules";
import type { SnapGuide } from "@/lib/board/snap";
import type { ResizeHandle } from "@/lib/board/resize";
import { panelPattern, visibleDetail } from "@/lib/board/pattern";
import type { BoardView } from "@/lib/services/boards";
import { pinchZoomFactor, toScreen as screenOf, toWorld as worldOf, wheelZoomFactor, type View } from "@/lib/board/view";

export type ViewTransform = View;
export type CanvasMode = "select" | "draw" | "pin" | "scale";

const INK = "#1a2740";
const COPPER = "#b0602f";
const FAULT = "#a8281f";
const CAUTION = "#c98a12";

const toScreen = (v: View, x: number, y: number) => screenOf(v, { x, y });
const toWorld = (v: View, px: number, py: number) => worldOf(v, { x: px, y: py });

type Facing = BoardView["buildUps"][number];

type Props = {
  width: number;
  height: number;
  view: ViewTransform;
  surface: { width: number; height: number; openings: readonly BoardOpening[] };
  gridModule: number;
  placements: readonly Placement[];
  selected: ReadonlySet<string>;
  buildUps: ReadonlyMap<string, Facing>;
  breaks: ReadonlyMap<string, RuleBreak[]>;
  guides: readonly SnapGuide[];
  pins: BoardView["pins"];
  focusPin: number | null;
  drawing: { image: HTMLImageElement; x: number; y: number; metresPerPixel: number; opacity: number } | null;
  scalePoints: { x: number; y: number }[];
  mode: CanvasMode;
  editable: boolean;
  onSelect: (ids: string[], additive: boolean) => void;
  onDragStart: (id: string) => void;
  onDragMove: (id: string, rect: BoardRect) => BoardRect;
  onDragEnd: (id: string, rect: BoardRect) => void;
  onResize: (id: string, handle: ResizeHandle, dx: number, dy: number, done: boolean) => BoardRect | null;
  onDrawn: (rect: BoardRect) => void;
  onPinAt: (x: number, y: number) => void;
  onPinSelect: (n: number) => void;
  onScalePick: (x: number, y: number) => void;
  onZoom: (factor: number, px: number, py: number) => void;
  onPan: (dx: number, dy: number) => void;
  onMarquee: (rect: BoardRect, additive: boolean) => void;
};

// The board, drawn to scale with Konva: the surface with its openings and dimension lines, the
// grid, the reference drawing underneath, the panels with their facing pattern, rule marks,
// snap guides and review pins. Pointer work is kept inside Konva while a drag lasts; React
// hears of it only through the callbacks, so 500 panels stay smooth.
export default function BoardCanvas(p: Props) {
  const stageRef = useRef<Konva.Stage>(null);
  // While a panel is dragged it sits on a layer of its own, so each frame redraws one panel
  // and not the other 499 (Konva redraws the whole layer a moving node is on).
  const dragLayer = useRef<Konva.Layer>(null);
  const [marquee, setMarquee] = useState<{ x0: number; y0: number; x1: number; y1: number } | null>(null);
  const panning = useRef<{ x: number; y: number } | null>(null);
  const pinch = useRef<number | null>(null);
  const v = p.view;
  const s = (x: number, y: number) => toScreen(v, x, y);
  const origin = s(0, 0);
  const corner = s(p.surface.width, p.surface.height);

  const viewport = useMemo(() => {
    const a = toWorld(v, 0, p.height);
    const b = toWorld(v, p.width, 0);
    return { x: a.x, y: a.y, width: b.x - a.x, height: b.y - a.y };
  }, [v, p.width, p.height]);

  const gridLines = useMemo(() => {
    const m = p.gridModule;
    if (!(m > 0) || m * v.scale < 6) return [];
    const lines: number[][] = [];
    for (let x = m; x < p.surface.width - 1e-9; x += m) lines.push([s(x, 0).x, corner.y, s(x, 0).x, origin.y]);
    for (let y = m; y < p.surface.height - 1e-9; y += m) lines.push([origin.x, s(0, y).y, corner.x, s(0, y).y]);
    return lines;
  }, [p.gridModule, p.surface.width, p.surface.height, v]); // eslint-disable-line react-hooks/exhaustive-deps

  function pointerWorld() {
    const pos = stageRef.current?.getPointerPosition();
    return pos ? { ...toWorld(v, pos.x, pos.y), px: pos.x, py: pos.y } : null;
  }

  function onMouseDown(e: Konva.KonvaEventObject<MouseEvent>) {
    const onEmpty = e.target === e.target.getStage() || e.target.name() === "surface" || e.target.name() === "drawing";
    const w = pointerWorld();
    if (!w) return;
    if (e.evt.button === 1 || (e.evt.button === 0 && e.evt.altKey)) {
      panning.current = { x: w.px, y: w.py };
      return;
    }
    if (p.mode === "pin" && onEmpty) return p.onPinAt(w.x, w.y);
    if (p.mode === "scale") return p.onScalePick(w.x, w.y);
    if (onEmpty && (p.mode === "select" || p.mode === "draw")) setMarquee({ x0: w.x, y0: w.y, x1: w.x, y1: w.y });
  }

  function onMouseMove() {
    const w = pointerWorld();
    if (!w) return;
    if (panning.current) {
      p.onPan(w.px - panning.current.x, w.py - panning.current.y);
      panning.current = { x: w.px, y: w.py };
      return;
    }
    if (marquee) setMarquee({ ...marquee, x1: w.x, y1: w.y });
  }

  function onMouseUp(e: Konva.KonvaEventObject<MouseEvent>) {
    panning.current = null;
    if (!marquee) return;
    const rect = { x: Math.min(marquee.x0, marquee.x1), y: Math.min(marquee.y0, marquee.y1), width: Math.abs(marquee.x1 - marquee.x0), height: Math.abs(marquee.y1 - marquee.y0) };
    setMarquee(null);
    const tiny = rect.width * v.scale < 4 && rect.height * v.scale < 4;
    if (p.mode === "draw" && p.editable && !tiny) return p.onDrawn(rect);
    if (tiny) return p.onSelect([], e.evt.shiftKey);
    p.onMarquee(rect, e.evt.shiftKey);
  }

  return (
    <Stage
      ref={stageRef}
      width={p.width}
      height={p.height}
      onMouseDown={onMouseDown}
      onMouseMove={onMouseMove}
      onMouseUp={onMouseUp}
      onWheel={(e) => {
        e.evt.preventDefault();
        const pos = stageRef.current?.getPointerPosition();
        if (pos) p.onZoom(wheelZoomFactor(e.evt.deltaY), pos.x, pos.y);
      }}
      onTouchMove={(e) => {
        // Two fingers: pinch to zoom about their midpoint.
        const t = e.evt.touches;
        if (t.length !== 2) return;
        e.evt.preventDefault();
        const box = stageRef.current?.container().getBoundingClientRect();
        const d = Math.hypot(t[0].clientX - t[1].clientX, t[0].clientY - t[1].clientY);
        if (pinch.current !== null && box) p.onZoom(pinchZoomFactor(pinch.current, d), (t[0].clientX + t[1].clientX) / 2 - box.left, (t[0].clientY + t[1].clientY) / 2 - box.top);
        pinch.current = d;
      }}
      onTouchEnd={() => (pinch.current = null)}
      style={{ cursor: p.mode === "pin" ? "crosshair" : p.mode === "draw" || p.mode === "scale" ? "copy" : "default" }}
    >
      <Layer listening={true}>
        <Rect name="surface" x={origin.x} y={corner.y} width={corner.x - origin.x} height={origin.y - corner.y} fill="#fffdf8" stroke={INK} strokeWidth={1.5} />
        {p.drawing && (
          <KonvaImage
            name="drawing"
            image={p.drawing.image}
            x={s(p.drawing.x, p.drawing.y).x}
            y={s(p.drawing.x, p.drawing.y).y}
            width={p.drawing.image.naturalWidth * p.drawing.metresPerPixel * v.scale}
            height={p.drawing.image.naturalHeight * p.drawing.metresPerPixel * v.scale}
            opacity={p.drawing.opacity}
          />
        )}
        {gridLines.map((pts, i) => (
          <Line key={i} points={pts} stroke={INK} strokeWidth={0.5} opacity={0.12} listening={false} />
        ))}
        {p.surface.openings.map((o, i) => {
          const a = s(o.x, o.y + o.height);
          return (
            <Group key={i} listening={false}>
              <Rect x={a.x} y={a.y} width={o.width * v.scale} height={o.height * v.scale} fill="#ece5d6" stroke={INK} strokeWidth={1} dash={[5, 3]} />
              <Line points={[a.x, a.y, a.x + o.width * v.scale, a.y + o.height * v.scale]} stroke={INK} strokeWidth={0.5} opacity={0.4} />
              <Line points={[a.x + o.width * v.scale, a.y, a.x, a.y + o.height * v.scale]} stroke={INK} strokeWidth={0.5} opacity={0.4} />
              <Text x={a.x + 4} y={a.y + 4} text={o.name || o.kind} fontSize={11} fill="#44506a" />
            </Group>
          );
        })}
        <Dimensions origin={origin} corner={corner} width={p.surface.width} height={p.surface.height} />
      </Layer>
      <Layer>
        {p.placements.map((pl) => (
          <PanelShape
            key={pl.id}
            placement={pl}
            view={v}
            viewport={viewport}
            facing={p.buildUps.get(pl.buildUpId)}
            selected={p.selected.has(pl.id)}
            broken={p.breaks.get(pl.id)}
            draggable={p.editable && p.mode === "select"}
            onSelect={p.onSelect}
            onDragStart={p.onDragStart}
            onDragMove={p.onDragMove}
            onDragEnd={p.onDragEnd}
            dragLayer={dragLayer}
          />
        ))}
        {p.editable &&
          p.mode === "select" &&
          p.selected.size === 1 &&
          p.placements
            .filter((pl) => p.selected.has(pl.id))
            .map((pl) => <ResizeHandles key={pl.id} placement={pl} view={v} onResize={p.onResize} />)}
      </Layer>
      <Layer ref={dragLayer} />
      {/* Guides, the marquee and pins change on every pointer move: a layer of their own, so
          the panels' layer is not redrawn with them. */}
      <Layer>
        {p.guides.map((g, i) => {
          const a = g.axis === "x" ? s(g.at, g.from) : s(g.from, g.at);
          const b = g.axis === "x" ? s(g.at, g.to) : s(g.to, g.at);
          return <Line key={i} points={[a.x, a.y, b.x, b.y]} stroke={COPPER} strokeWidth={1} dash={[4, 3]} listening={false} />;
        })}
        {marquee && (
          <Rect
            x={Math.min(s(marquee.x0, 0).x, s(marquee.x1, 0).x)}
            y={Math.min(s(0, marquee.y0).y, s(0, marquee.y1).y)}
            width={Math.abs(marquee.x1 - marquee.x0) * v.scale}
            height={Math.abs(marquee.y1 - marquee.y0) * v.scale}
            stroke={COPPER}
            dash={[4, 3]}
            fill={p.mode === "draw" ? "rgba(176,96,47,0.10)" : "rgba(26,39,64,0.05)"}
            listening={false}
          />
        )}
        {p.scalePoints.map((pt, i) => (
          <Circle key={i} x={s(pt.x, pt.y).x} y={s(pt.x, pt.y).y} radius={5} stroke={COPPER} strokeWidth={2} listening={false} />
        ))}
        {p.pins.map((pin) => {
          const at = s(pin.x, pin.y);
          const focus = p.focusPin === pin.number;
          return (
            <Group key={pin.id} x={at.x} y={at.y} onMouseDown={(e) => (e.cancelBubble = true)} onClick={() => p.onPinSelect(pin.number)} name="pin">
              <Line points={[0, 0, 0, -14]} stroke={INK} strokeWidth={1.5} />
              <Circle y={-20} radius={focus ? 10 : 8} fill={pin.resolved ? "#7c8598" : COPPER} stroke={focus ? INK : "#fffdf8"} strokeWidth={2} />
              <Text x={-8} y={-25} width={16} align="center" text={String(pin.number)} fontSize={10} fontStyle="bold" fill="#fffdf8" />
            </Group>
          );
        })}
      </Layer>
    </Stage>
  );
}

function Dimensions({ origin, corner, width, height }: { origin: { x: number; y: number }; corner: { x: number; y: number }; width: number; height: number }) {
  const mm = (m: number) => `${Math.round(m * 1000)}`;
  const below = origin.y + 22;
  const left = origin.x - 22;
  return (
    <Group listening={false}>
      <Line points={[origin.x, below, corner.x, below]} stroke={INK} strokeWidth={0.8} />
      <Line points={[origin.x, below - 5, origin.x, below + 5]} stroke={INK} strokeWidth={0.8} />
      <Line points={[corner.x, below - 5, corner.x, below + 5]} stroke={INK} strokeWidth={0.8} />
      <Text x={(origin.x + corner.x) / 2 - 40} y={below + 4} width={80} align="center" text={mm(width)} fontSize={11} fill={INK} />
      <Line points={[left, origin.y, left, corner.y]} stroke={INK} strokeWidth={0.8} />
      <Line points={[left - 5, origin.y, left + 5, origin.y]} stroke={INK} strokeWidth={0.8} />
      <Line points={[left - 5, corner.y, left + 5, corner.y]} stroke={INK} strokeWidth={0.8} />
      <Text x={left - 8} y={(origin.y + corner.y) / 2 + 40} width={80} rotation={-90} align="center" text={mm(height)} fontSize={11} fill={INK} />
    </Group>
  );
}

type PanelProps = {
  placement: Placement;
  view: ViewTransform;
  viewport: BoardRect;
  facing: Facing | undefined;
  selected: boolean;
  broken: RuleBreak[] | undefined;
  draggable: boolean;
  onSelect: Props["onSelect"];
  onDragStart: Props["onDragStart"];
  onDragMove: Props["onDragMove"];
  onDragEnd: Props["onDragEnd"];
  dragLayer: React.RefObject<Konva.Layer | null>;
};

// One panel. Memoised on its placement object, so moving one panel redraws one panel.
const PanelShape = memo(function PanelShape({ placement: pl, view: v, viewport, facing, selected, broken, draggable, onSelect, onDragStart, onDragMove, onDragEnd, dragLayer }: PanelProps) {
  const home = useRef<Konva.Container | null>(null);
  const a = toScreen(v, pl.x, pl.y + pl.height);
  const w = pl.width * v.scale;
  const h = pl.height * v.scale;
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
      <Rect width={w} height={h} fill={selected ? "#f3e3d6" : "#efe9dc"} stroke={stroke} strokeWidth={selected || broken?.length ? 2 : 1} />
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
      {broken?.length ? <Text x={w - 14} y={2} text="!" fontSize={13} fontStyle="bold" fill={stroke} listening={false} /> : null}
    </Group>
  );
});

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

function ResizeHandles({ placement: pl, view: v, onResize }: { placement: Placement; view: ViewTransform; onResize: Props["onResize"] }) {
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
            fill="#fffdf8"
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
