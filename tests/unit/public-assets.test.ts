import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// The files public/ serves as they are: the web manifest's icons exist with the sizes it
// claims (read from each PNG's own header: width and height are the IHDR chunk's first two
// big-endian 32-bit words, bytes 16-23, PNG specification, W3C 2003, section 11.2.2).
const PUBLIC = path.join(process.cwd(), "public");

function pngSize(file: string): { width: number; height: number } {
  const bytes = fs.readFileSync(file);
  expect(bytes.subarray(1, 4).toString("ascii")).toBe("PNG");
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

describe("public/", () => {
  const manifest = JSON.parse(fs.readFileSync(path.join(PUBLIC, "manifest.webmanifest"), "utf8")) as {
    name: string;
    start_url: string;
    icons: { src: string; sizes: string; type: string }[];
  };

  it("has a web manifest whose icons exist at the sizes it names", () => {
    expect(manifest.name).toBe("Cavitas");
    expect(manifest.icons.map((i) => i.sizes)).toEqual(["any", "192x192", "512x512"]);
    for (const icon of manifest.icons) {
      const file = path.join(PUBLIC, icon.src);
      expect(fs.existsSync(file), icon.src).toBe(true);
      if (icon.type === "image/png") {
        const { width, height } = pngSize(file);
        expect(`${width}x${height}`).toBe(icon.sizes);
      } else expect(fs.readFileSync(file, "utf8")).toMatch(/^<svg /);
    }
  });

  it("has the touch icon the layout names, and a robots.txt", () => {
    expect(pngSize(path.join(PUBLIC, "apple-touch-icon.png"))).toEqual({ width: 180, height: 180 });
    expect(fs.readFileSync(path.join(PUBLIC, "robots.txt"), "utf8")).toMatch(/^Disallow: \/$/m);
  });
});
