"use client";

import { useEffect, useState } from "react";
import type { BoardView } from "@/lib/services/boards";
import { uploadFile } from "@/lib/queries/build-ups";
import { putDrawing } from "@/lib/queries/boards";
import { ApiError } from "@/lib/queries/api";
import type { UnitPreference } from "@/lib/units";
import { MeasureField } from "@/components/ui/measure-field";
import { Sheet } from "@/components/ui/sheet";
import type { CanvasMode } from "./board-canvas";

export function useDrawingImage(url: string | null): HTMLImageElement | null {
  const [image, setImage] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    if (!url) return setImage(null);
    const img = new window.Image();
    img.onload = () => setImage(img);
    img.src = url;
  }, [url]);
  return image;
}

type Props = {
  board: BoardView;
  scalePoints: { x: number; y: number }[];
  setScalePoints: (p: { x: number; y: number }[]) => void;
  mode: CanvasMode;
  setMode: (m: CanvasMode) => void;
  units: UnitPreference;
  onChanged: (b: BoardView) => void;
  surfaceWidth: number;
};

// A reference drawing under the board: an image of the elevation, set to scale by two points
// and the known distance between them; the first point can be put on the surface's datum.
export function DrawingPanel({ board, scalePoints, setScalePoints, mode, setMode, units, onChanged, surfaceWidth }: Props) {
  const [error, setError] = useState<string | null>(null);
  const [distance, setDistance] = useState(surfaceWidth);
  const [toDatum, setToDatum] = useState(true);
  const d = board.drawing;

  async function send(body: Record<string, unknown>) {
    try {
      setError(null);
      onChanged(await putDrawing(board, body));
    } catch (e) {
      setError(e instanceof ApiError ? (e.issues[0]?.message ?? e.message) : "The drawing could not be saved.");
    }
  }

  function setOpacity(opacity: number) {
    if (d && opacity !== d.opacity) void send({ attachmentId: d.attachmentId, x: d.x, y: d.y, metresPerPixel: d.metresPerPixel, opacity });
  }

  function applyScale() {
    if (!d || scalePoints.length < 2) return;
    const [a, b] = scalePoints;
    const worldDistance = Math.hypot(b.x - a.x, b.y - a.y);
    if (!(worldDistance > 0)) return setError("Pick two different points.");
    const pixels = worldDistance / d.metresPerPixel;
    const mpp = distance / pixels;
    // Keep the first point where it is on the drawing, then move it onto the datum if asked.
    const u = (a.x - d.x) / d.metresPerPixel;
    const v = (d.y - a.y) / d.metresPerPixel;
    let x = a.x - u * mpp;
    let y = a.y + v * mpp;
    if (toDatum) {
      x -= a.x;
      y -= a.y;
    }
    setScalePoints([]);
    setMode("select");
    return send({ attachmentId: d.attachmentId, x, y, metresPerPixel: mpp, opacity: d.opacity });
  }

  return (
    <Sheet title="Reference drawing">
      <div className="flex flex-wrap items-start gap-6 text-xs">
        <div className="flex flex-col gap-1">
          <label htmlFor="drawing-file" className="font-semibold uppercase tracking-wider text-ink-soft">
            Image of the elevation (PNG or JPEG)
          </label>
          <input
            id="drawing-file"
            type="file"
            accept="image/png,image/jpeg"
            onChange={async (e) => {
              const file = e.target.files?.[0];
              if (!file) return;
              try {
                const up = await uploadFile(board.projectId, "drawing", file);
                const img = new window.Image();
                img.src = up.url;
                await img.decode().catch(() => undefined);
                // First placed across the surface's width, its top on the surface's top edge.
                const mpp = img.naturalWidth ? surfaceWidth / img.naturalWidth : 0.01;
                const surfaceTop = img.naturalHeight ? img.naturalHeight * mpp : 0;
                await send({ attachmentId: up.id, x: 0, y: surfaceTop, metresPerPixel: mpp, opacity: 0.5 });
              } catch (err) {
                setError(err instanceof ApiError ? (err.fieldMessage("file") ?? err.message) : "The upload failed.");
              }
            }}
          />
          {d && <span className="text-ink-faint">{d.name}</span>}
        </div>
        {d && (
          <>
            <div className="flex w-40 flex-col gap-1">
              <label htmlFor="drawing-opacity" className="font-semibold uppercase tracking-wider text-ink-soft">
                Opacity {Math.round(d.opacity * 100)} %
              </label>
              <input
                id="drawing-opacity"
                type="range"
                min={0}
                max={1}
                step={0.05}
                defaultValue={d.opacity}
                // Sent when the pointer lets go or an arrow key is released, not on every step.
                onMouseUp={(e) => setOpacity(Number(e.currentTarget.value))}
                onTouchEnd={(e) => setOpacity(Number(e.currentTarget.value))}
                onKeyUp={(e) => setOpacity(Number(e.currentTarget.value))}
              />
            </div>
            <div className="flex flex-col gap-2">
              <button type="button" className="rounded-sheet border border-ink/30 px-2 py-1 hover:bg-white" aria-pressed={mode === "scale"} onClick={() => { setScalePoints([]); setMode(mode === "scale" ? "select" : "scale"); }}>
                {mode === "scale" ? `Pick points on the drawing (${scalePoints.length}/2)` : "Set scale by two points"}
              </button>
              {scalePoints.length === 2 && (
                <div className="flex items-end gap-2">
                  <div className="w-32">
                    <MeasureField label="Distance between them" metres={distance} units={units} small={false} onChange={setDistance} />
                  </div>
                  <label className="flex items-center gap-1">
                    <input type="checkbox" checked={toDatum} onChange={(e) => setToDatum(e.target.checked)} /> first point is the datum
                  </label>
                  <button type="button" className="font-semibold text-copper-deep hover:underline" onClick={applyScale}>
                    Apply
                  </button>
                </div>
              )}
            </div>
            <button type="button" className="text-fault hover:underline" onClick={() => send({ attachmentId: null })}>
              Remove drawing
            </button>
          </>
        )}
      </div>
      {error && <p className="mt-2 text-xs text-fault">{error}</p>}
    </Sheet>
  );
}
