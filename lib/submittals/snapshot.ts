/**
 * The snapshot of a submittal revision: every value the submittal, its decision record and its
 * shop pack show, frozen when the revision is issued and stored as canonical JSON beside its
 * SHA-256. Documents render from this alone, never from the live design, so a re-download is
 * the same file.
 *
 * The types below are the stored format, version 1. They are written out here rather than
 * borrowed from the engine's or the check's types, so that a later change to those cannot
 * silently change what an old snapshot means; a new format gets a new version number and the
 * renderers keep reading the old one. Lengths in metres, areas in m², frequencies in Hz, times
 * in seconds, as everywhere in Cavitas.
 */
import type { EvaluateInput, EvaluateOutput } from "@/lib/acoustics/contract";
import type { FireFinding, FireStandard } from "@/lib/fire";
import type { ChangeList } from "./changes";

export const SNAPSHOT_FORMAT = "cavitas/submittal-snapshot";
export const SNAPSHOT_VERSION = 1;

/** What the elevation of a surface needs: its size, openings and finish. */
export interface SnapshotSurface {
  key: string;
  name: string;
  kind: "wall" | "ceiling" | "floor";
  width: number;
  height: number;
  grossArea: number;
  netArea: number;
  finish: { key: string; name: string };
  openings: { kind: "door" | "window" | "glazing" | "vent" | "other"; name: string; x: number; y: number; width: number; height: number; material: { key: string; name: string } }[];
}

/** The hole or slot layout of one panel size (lib/board/pattern-layout.ts), from the panel's lower-left corner. */
export type SnapshotPattern =
  | {
      kind: "holes";
      holeDiameter: number;
      pitch: number;
      grid: "square" | "staggered";
      rows: number;
      rowPitch: number;
      columnsEven: number;
      columnsOdd: number;
      oddShift: number;
      firstX: number;
      firstY: number;
      holeCount: number;
    }
  | { kind: "slots"; slotWidth: number; slotPitch: number; direction: "vertical" | "horizontal"; slotCount: number; first: number; slotLength: number };

export interface SnapshotBuildUp {
  id: string;
  /** the short code drawings use ("T1", "T2" …), by build-up name */
  code: string;
  name: string;
  /** the calculation contract's evaluate input */
  spec: EvaluateInput;
  module: { width: number; height: number };
  borders: { x: number; y: number };
  facingMaterial: string;
  notes: string;
  fire: { standard: FireStandard; declared: string; report: string | null };
  /** the contract's evaluate output for `spec` */
  evaluation: EvaluateOutput;
}

/** One size of panel of one build-up: what the shop drawing draws and the cut list counts. */
export interface SnapshotPanelType {
  /** "T1", or "T1-2" when a build-up is placed in more than one size */
  code: string;
  buildUpId: string;
  width: number;
  height: number;
  /** placements of this size */
  count: number;
  /** the perforated field: the panel less its border margins, from the panel's lower-left corner */
  field: { x: number; y: number; width: number; height: number };
  pattern: SnapshotPattern;
  /** open area over the whole panel, borders included (the facing's own is the build-up's evaluation.openArea) */
  panelOpenArea: number;
}

export interface SnapshotPlacement {
  id: string;
  code: string;
  surfaceKey: string;
  buildUpId: string;
  /** the panel type's code */
  type: string;
  /** lower-left corner from the surface's lower-left datum, m */
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A line of the panel schedule: one build-up in this room. */
export interface ScheduleRow {
  buildUpId: string;
  code: string;
  name: string;
  /** panels placed on the boards */
  count: number;
  placedArea: number;
  /** treated area entered by area, not laid out on a board */
  areaOnly: number;
  area: number;
  /** keys of the surfaces it is on, in the room's order */
  surfaces: string[];
}

export interface SnapshotRoomState {
  sabine: number;
  eyring: number;
  status: "within" | "over" | "under" | "no target";
  /** m² sabins lacking to reach the band's upper limit; null where it has none */
  shortfall: number | null;
}

export interface SnapshotOctave {
  f: number;
  target: { seconds: number | null; low: number | null; high: number | null; indicative: boolean };
  before: SnapshotRoomState | null;
  after: SnapshotRoomState | null;
  status: "within" | "over" | "under" | "no target" | "no data";
}

export type SnapshotCheck =
  | {
      ok: true;
      method: "sabine" | "eyring";
      treated: boolean;
      octaves: SnapshotOctave[];
      mean: { octaves: number[]; nominal: number; low: number | null; high: number | null; before: number | null; after: number | null; status: string } | null;
      sentences: string[];
    }
  | { ok: false; issues: { field: string; message: string }[] };

export interface SnapshotTarget {
  label: string;
  source: string;
  provenance: string;
  note: string;
  kind: "band" | "limit";
  nominal: number | null;
  warnings: string[];
}

export interface SnapshotPin {
  surfaceKey: string;
  number: number;
  x: number;
  y: number;
  body: string;
  author: string | null;
}

export interface SubmittalSnapshot {
  format: typeof SNAPSHOT_FORMAT;
  version: typeof SNAPSHOT_VERSION;
  engine: { version: string; limits: string[] };
  revision: {
    letter: string;
    /** ISO 8601; null for a draft that has not been issued */
    issuedAt: string | null;
    previous: { letter: string; hash: string } | null;
  };
  consultant: { name: string; firm: string | null; email: string | null };
  project: { id: string; name: string; reference: string | null; site: string | null; edgeClearance: number };
  room: {
    id: string;
    name: string;
    use: string;
    shape: "shoebox" | "free";
    length: number | null;
    width: number | null;
    height: number | null;
    volume: number;
    air: { temperature: number; humidity: number; pressure: number };
  };
  target: SnapshotTarget | null;
  surfaces: SnapshotSurface[];
  /** the finishes and opening materials the surfaces name, by key, with the values the check used */
  materials: { key: string; name: string; alpha: Record<string, number>; source: string }[];
  /** only the build-ups this room uses, by code */
  buildUps: SnapshotBuildUp[];
  panelTypes: SnapshotPanelType[];
  placements: SnapshotPlacement[];
  /** treated area entered by area (not laid out on a board), per surface and build-up */
  areaTreatments: { surfaceKey: string; buildUpId: string; area: number }[];
  schedule: ScheduleRow[];
  check: SnapshotCheck;
  fire: {
    /** the class the room requires, as entered; null when none is */
    required: string | null;
    requiredFrom: "room" | "project" | null;
    findings: { buildUpId: string; finding: FireFinding }[];
  };
  /** review pins still open on this room's boards */
  pins: SnapshotPin[];
  cautions: {
    /** ceiling surfaces that carry panels */
    ceilings: string[];
    /** codes of wall panels whose top is above `highLevel` m */
    highLevelPanels: string[];
    highLevel: number;
  };
  /** warnings about the room's input that still let the check run */
  warnings: { field: string; message: string }[];
  /** what changed since the previous revision; null for the first */
  changes: ChangeList | null;
}
