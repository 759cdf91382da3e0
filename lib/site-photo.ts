/**
 * A site photo made safe to keep: its type read from its content (JPEG, PNG or WebP), its size
 * limited, decoded for real (a file that only starts like an image is refused), turned upright
 * by its orientation tag, scaled down to at most PHOTO_MAX_SIDE pixels a side, and written
 * afresh by sharp, which copies no metadata unless asked: the location (GPS), the camera's make,
 * model and serial, the time taken and any embedded preview are gone before anything is stored.
 */
import sharp from "sharp";
import { env } from "@/lib/env";
import { invalid } from "@/lib/errors";
import { sniff } from "@/lib/storage";

/** Pixels on the longer side: plenty to see a fixing on a panel, a few hundred kB to keep. */
export const PHOTO_MAX_SIDE = 2400;
/** What a decoder is allowed to open (a 100-megapixel frame), so a crafted file cannot exhaust memory. */
const MAX_INPUT_PIXELS = 100_000_000;

export type CleanPhoto = { bytes: Uint8Array; kind: "jpeg" | "png" | "webp"; width: number; height: number };

export async function cleanSitePhoto(bytes: Uint8Array | null, field = "file"): Promise<CleanPhoto> {
  if (!bytes || bytes.byteLength === 0) throw invalid([{ field, message: "Choose a photo to upload." }]);
  const limit = env().uploadLimitBytes;
  if (bytes.byteLength > limit) {
    throw invalid([{ field, message: `The photo is ${(bytes.byteLength / 1048576).toFixed(1)} MB; the limit is ${(limit / 1048576).toFixed(0)} MB.` }]);
  }
  const kind = sniff(bytes);
  if (kind !== "jpeg" && kind !== "png" && kind !== "webp") {
    throw invalid([{ field, message: "This file is not a JPEG, PNG or WebP photo (its content was checked, not its name). Set the camera to JPEG, or export the photo as JPEG." }]);
  }
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" })
      .rotate()
      .resize({ width: PHOTO_MAX_SIDE, height: PHOTO_MAX_SIDE, fit: "inside", withoutEnlargement: true });
    const out = kind === "jpeg" ? image.jpeg({ quality: 85 }) : kind === "png" ? image.png() : image.webp({ quality: 85 });
    const { data, info } = await out.toBuffer({ resolveWithObject: true });
    return { bytes: new Uint8Array(data.buffer, data.byteOffset, data.byteLength), kind, width: info.width, height: info.height };
  } catch {
    throw invalid([{ field, message: "This photo could not be read: the file is damaged or is not a complete image." }]);
  }
}
