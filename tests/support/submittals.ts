import sharp from "sharp";
import { actorOf } from "./actors";
import { makeBuildUp } from "./factories";

// A room ready to issue, made through the services as a consultant would: a 10 × 8 × 3 m hall
// with a bass build-up laid out on wall A (panels P-001 … P-00n at 0.7 m centres) and, when
// asked, a review pin left open.
export async function designedRoom(consultantCookie: string, projectId: string, opts: { panels?: number; name?: string; buildUpId?: string; pinBy?: string } = {}) {
  const { createRoom } = await import("@/lib/services/rooms");
  const { saveBoard, createPin } = await import("@/lib/services/boards");
  const actor = await actorOf(consultantCookie);
  const buildUpId = opts.buildUpId ?? makeBuildUp(projectId, `Bass panel ${Math.random().toString(36).slice(2, 6)}`).id;
  const room = createRoom(actor, projectId, { name: opts.name ?? "Hall", use: "music", shape: "shoebox", length: 10, width: 8, height: 3 });
  const placements = Array.from({ length: opts.panels ?? 4 }, (_, i) => panelAt(i, buildUpId, room.id));
  saveBoard(actor, projectId, room.id, "wall-a", { version: 0, placements });
  if (opts.pinBy) await createPin(await actorOf(opts.pinBy), projectId, room.id, "wall-a", { x: 8, y: 2.5, body: "Check the sprinkler head above." });
  return { roomId: room.id, buildUpId };
}

/** Panel i of a room's wall A: 0.6 × 1.2 m at 0.7 m centres, 0.5 m above the floor. */
export function panelAt(i: number, buildUpId: string, roomId: string) {
  return { id: `pl-${roomId.slice(0, 8)}-${i}`, buildUpId, code: `P-${String(i + 1).padStart(3, "0")}`, x: 0.3 + i * 0.7, y: 0.5, width: 0.6, height: 1.2 };
}

/** Issue the room's next revision, confirming whatever it asks to be confirmed. */
export async function issueConfirmed(consultantCookie: string, projectId: string, roomId: string) {
  const { issueReadiness, issueSubmittal } = await import("@/lib/services/submittals");
  const actor = await actorOf(consultantCookie);
  const { items, letter } = issueReadiness(actor, projectId, roomId);
  return issueSubmittal(actor, projectId, { roomId, letter, confirm: items.map((i) => i.key) });
}

/** The SHA-256 of the issued PDF of a revision, as a client's decision must cite it. */
export async function pdfHashOf(cookie: string, projectId: string, submittalId: string) {
  const { getSubmittal } = await import("@/lib/services/submittals");
  return getSubmittal(await actorOf(cookie), projectId, submittalId).pdf!.sha256;
}

/** A small JPEG carrying a camera make and model and a GPS position in its EXIF block. */
export async function photoWithLocation(): Promise<Uint8Array<ArrayBuffer>> {
  const bytes = await sharp({ create: { width: 320, height: 240, channels: 3, background: { r: 176, g: 96, b: 47 } } })
    .jpeg()
    .withExif({
      IFD0: { Make: "FictionalCam", Model: "Site Model 1" },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 0/1" },
    })
    .toBuffer();
  return new Uint8Array(bytes);
}

/** True when the bytes carry an EXIF block (a JPEG APP1 segment that starts "Exif"). */
export const hasExif = (bytes: Uint8Array) => Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).includes("Exif\0\0", 0, "latin1");
