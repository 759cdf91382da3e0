"use client";

import { useMemo, useRef, useState } from "react";
import { Circle, Group, Image as KonvaImage, Layer, Line, Rect, Stage, Text } from "react-konva";
import type Konva from "konva";
import type { BoardOpening, Placement, Rect as BoardRect } from "@/lib/board/types";
import type { RuleBreak } from "@/lib/board/rules";
import type { SnapGuide } from "@/lib/board/snap";
import type { ResizeHandle } from "@/lib/board/resize";
import { panelSetOut, surfaceDimensions } from "@/lib/board/set-out";
import type { BoardView } from "@/lib/services/boards";
import type { UnitPreference } from "@/lib/units";
import { pinchZoomFactor, toScreen as screenOf, toWorld as worldOf, wheelZoomFactor, type View } from "@/lib/board/view";
import { COPPER, COPPER_DEEP, INK, INK_SOFT, OPENING_FILL, PAPER, PIN_RESOLVED } from "./canvas/colours";
import { DimensionLines, dimensionText } from "./canvas/dimension-lines";
import { PanelShape } from "./canvas/panel-shape";
import { ResizeHandles } from "./canvas/resize-handles";

export type CanvasMode = "select" | "draw" | "pin" | "scale";

const toScreen = (v: View, x: number, y: number) => screenOf(v, { x, y });
const toWorld = (v: View, px: number, py: number) => worldOf(v, { x: px, y: py });

type Facing = BoardView["buildUps"][number];

type Props = {
  width: number;
  height: number;
  view: View;
  units: UnitPreference;
  surface: { width: number; height: number; openings: readonly BoardOpening[] };
  gridModule: number;
  placements: readonly Placement[];
  selected: ReadonlySet<string>;
  /** the selected panel, or the selection's outline, to dimension from the datum */
  setOut: BoardRect | null;
  buildUps: ReadonlyMap<string, Facing>;
  breaks: ReadonlyMap<string, RuleBreak[]>;
  /** panels marked installed on the room's approved revision in force */
  installed: ReadonlySet<string>;
  guides: readonly SnapGuide[];
  pins: BoardView["pins"];
  focusPin: number | null;
  drawing: { image: HTMLImageElement; x: number; y: number; metresPerPixel: number; opacity: number } | null;
  scalePoints: { x: number; y: number }[];
  mode: CanvasMode;
  editable: boolean;
  /** what a box drawn in draw mode becomes (snapped to the module and the grid) */
  snapDrawn: (rect: BoardRect) => BoardRect;
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

// The board, drawn to scale with Konva: the surface with its openings and set-out dimensions,
// the grid, the reference drawing underneath, the panels with their facing pattern, rule marks,
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

  const dimensions = useMemo(() => surfaceDimensions(p.surface), [p.surface]);
  const setOut = useMemo(() => (p.setOut ? panelSetOut(p.setOut, p.surface) : []), [p.setOut, p.surface]);
  const drawnBox = marquee && {
    x: Math.min(marquee.x0, marquee.x1),
    y: Math.min(marquee.y0, marquee.y1),
    width: Math.abs(marquee.x1 - marquee.x0),
    height: Math.abs(marquee.y1 - marquee.y0),
  };
  const shownBox = drawnBox && p.mode === "draw" && p.editable ? p.snapDrawn(drawnBox) : drawnBox;

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
    // A pin goes where the person points, on bare surface or on a panel (pins themselves
    // stop the press, so clicking one opens it).
    if (p.mode === "pin") return p.onPinAt(w.x, w.y);
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
    if (p.mode === "draw" && p.editable && !tiny) return p.onDrawn(p.snapDrawn(rect));
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
        <Rect name="surface" x={origin.x} y={corner.y} width={corner.x - origin.x} height={origin.y - corner.y} fill={PAPER} stroke={INK} strokeWidth={1.5} />
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
              <Rect x={a.x} y={a.y} width={o.width * v.scale} height={o.height * v.scale} fill={OPENING_FILL} stroke={INK} strokeWidth={1} dash={[5, 3]} />
              <Line points={[a.x, a.y, a.x + o.width * v.scale, a.y + o.height * v.scale]} stroke={INK} strokeWidth={0.5} opacity={0.4} />
              <Line points={[a.x + o.width * v.scale, a.y, a.x, a.y + o.height * v.scale]} stroke={INK} strokeWidth={0.5} opacity={0.4} />
              <Text x={a.x + 4} y={a.y + 4} width={Math.max(40, o.width * v.scale - 8)} text={`${o.name || o.kind}\n${dimensionText(o.width, p.units)} × ${dimensionText(o.height, p.units)}`} fontSize={11} lineHeight={1.3} fill={INK_SOFT} />
            </Group>
          );
        })}
        <DimensionLines lines={dimensions} view={v} units={p.units} />
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
            installed={p.installed.has(pl.id)}
            draggable={p.editable && p.mode === "select"}
            pinMode={p.mode === "pin"}
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
      <Layer listening={false}>
        <DimensionLines lines={setOut} view={v} units={p.units} colour={COPPER_DEEP} />
      </Layer>
      {/* Guides, the marquee and pins change on every pointer move: a layer of their own, so
          the panels' layer is not redrawn with them. */}
      <Layer>
        {p.guides.map((g, i) => {
          const a = g.axis === "x" ? s(g.at, g.from) : s(g.from, g.at);
          const b = g.axis === "x" ? s(g.at, g.to) : s(g.to, g.at);
          return <Line key={i} points={[a.x, a.y, b.x, b.y]} stroke={COPPER} strokeWidth={1} dash={[4, 3]} listening={false} />;
        })}
        {shownBox && (
          <Rect
            x={s(shownBox.x, 0).x}
            y={s(0, shownBox.y + shownBox.height).y}
            width={shownBox.width * v.scale}
            height={shownBox.height * v.scale}
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
              <Circle y={-20} radius={focus ? 10 : 8} fill={pin.resolved ? PIN_RESOLVED : COPPER_DEEP} stroke={focus ? INK : PAPER} strokeWidth={2} />
              <Text x={-8} y={-25} width={16} align="center" text={String(pin.number)} fontSize={10} fontStyle="bold" fill={PAPER} />
            </Group>
          );
        })}
      </Layer>
    </Stage>
  );
}
