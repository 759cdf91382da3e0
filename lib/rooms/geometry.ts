/**
 * A room's geometry as surfaces: a shoebox (length × width × height) gives six rectangles; any
 * other room is a volume with its list of surfaces. Openings sit on a surface, placed from its
 * lower-left corner, and are subtracted from its area. Lengths in metres.
 */

export const SURFACE_KINDS = ["wall", "ceiling", "floor"] as const;
export type SurfaceKind = (typeof SURFACE_KINDS)[number];

export const OPENING_KINDS = ["door", "window", "glazing", "vent", "other"] as const;
export type OpeningKind = (typeof OPENING_KINDS)[number];

export interface Opening {
  kind: OpeningKind;
  /** shown in messages and results ("Door to corridor"); the kind's word when absent */
  name?: string;
  width: number;
  height: number;
  /** lower-left corner, from the surface's lower-left corner, m */
  x: number;
  y: number;
  /** material key (library or project) */
  material: string;
}

export interface SurfaceShape {
  key: string;
  name: string;
  kind: SurfaceKind;
  /** along the surface, m (a wall's length; a ceiling's or floor's room length) */
  width: number;
  /** up the surface, m (a wall's room height; a ceiling's or floor's room width) */
  height: number;
}

export interface Surface extends SurfaceShape {
  /** material key of the finish */
  finish: string;
  openings: Opening[];
}

export interface Shoebox {
  length: number;
  width: number;
  height: number;
}

/** "free": a volume with a surface list entered by hand (the room table's `shape`). */
export type RoomGeometry = ({ kind: "shoebox" } & Shoebox) | { kind: "free"; volume: number };

/**
 * The six surfaces of a shoebox, walls lettered round the room: A and C run along its length,
 * B and D along its width. Keys are stable, so finishes and panels stay attached when the
 * dimensions change.
 */
export function shoeboxSurfaces(box: Shoebox): SurfaceShape[] {
  const wall = (letter: string, along: "length" | "width"): SurfaceShape => ({
    key: `wall-${letter.toLowerCase()}`,
    name: `Wall ${letter} (${along})`,
    kind: "wall",
    width: box[along],
    height: box.height,
  });
  return [
    wall("A", "length"),
    wall("B", "width"),
    wall("C", "length"),
    wall("D", "width"),
    { key: "ceiling", name: "Ceiling", kind: "ceiling", width: box.length, height: box.width },
    { key: "floor", name: "Floor", kind: "floor", width: box.length, height: box.width },
  ];
}

export function roomVolume(geometry: RoomGeometry): number {
  return geometry.kind === "shoebox" ? geometry.length * geometry.width * geometry.height : geometry.volume;
}

export const grossArea = (shape: { width: number; height: number }) => shape.width * shape.height;

export const openingsArea = (openings: readonly Opening[]) => openings.reduce((sum, o) => sum + grossArea(o), 0);

/** The surface's own area, openings taken out, m². */
export function netArea(surface: SurfaceShape & { openings?: readonly Opening[] }): number {
  return grossArea(surface) - openingsArea(surface.openings ?? []);
}

/** Σ of the surfaces' gross areas (openings included: they are part of the room's boundary), m². */
export const totalArea = (surfaces: readonly SurfaceShape[]) => surfaces.reduce((sum, s) => sum + grossArea(s), 0);
