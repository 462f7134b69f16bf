import { readFile } from "node:fs/promises";
import path from "node:path";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import manifest from "@/app/manifest";
import { FAVICON_ICO_SIZES_PX, ICON_FILES, MASKABLE_ICON_SCALE } from "@/lib/brand/icons";
import { MARK_TILE_COLOUR, markSvg } from "@/lib/brand/mark";
import { iconContents, renderIconPng } from "@/scripts/icons";

const ROOT = path.resolve(__dirname, "../..");
const read = (file: string) => readFile(path.join(ROOT, file));

async function rgba(png: Buffer) {
  const { data, info } = await sharp(png).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}

/** Mean absolute difference per channel, 0–255, between two PNGs of the same size. */
async function meanDifference(a: Buffer, b: Buffer) {
  const [x, y] = await Promise.all([rgba(a), rgba(b)]);
  expect([x.width, x.height]).toEqual([y.width, y.height]);
  let sum = 0;
  for (let i = 0; i < x.data.length; i++) sum += Math.abs(x.data[i]! - y.data[i]!);
  return sum / x.data.length;
}

/** The PNGs inside an .ico, read from its directory. */
function unpackIco(ico: Buffer) {
  expect(ico.readUInt16LE(0)).toBe(0);
  expect(ico.readUInt16LE(2)).toBe(1);
  return Array.from({ length: ico.readUInt16LE(4) }, (_, i) => {
    const entry = 6 + 16 * i;
    const sizePx = ico.readUInt8(entry) || 256;
    const length = ico.readUInt32LE(entry + 8);
    const offset = ico.readUInt32LE(entry + 12);
    return { sizePx, png: ico.subarray(offset, offset + length) };
  });
}

describe("icons drawn from the mark", () => {
  it("the SVG favicon is the drawing itself", async () => {
    const icon = ICON_FILES.find((i) => i.format === "svg")!;
    expect((await read(icon.file)).toString()).toBe((await iconContents(icon)).toString());
    expect(markSvg({ tone: "auto" })).toContain("prefers-color-scheme: dark");
  });

  for (const icon of ICON_FILES.filter((i) => i.format === "png")) {
    it(`${icon.file} is ${icon.sizePx} px and matches the drawing (run npm run icons after changing it)`, async () => {
      const committed = await read(icon.file);
      const meta = await sharp(committed).metadata();
      expect([meta.format, meta.width, meta.height]).toEqual(["png", icon.sizePx, icon.sizePx]);
      expect(await meanDifference(committed, await renderIconPng(icon, icon.sizePx!))).toBeLessThan(0.5);
    });
  }

  it("app/favicon.ico holds the drawing at 16, 32 and 48 px", async () => {
    const icon = ICON_FILES.find((i) => i.format === "ico")!;
    const images = unpackIco(await read(icon.file));
    expect(images.map((i) => i.sizePx)).toEqual(FAVICON_ICO_SIZES_PX);
    for (const { sizePx, png } of images) {
      const meta = await sharp(png).metadata();
      expect([meta.format, meta.width]).toEqual(["png", sizePx]);
      expect(await meanDifference(png, await renderIconPng(icon, sizePx))).toBeLessThan(0.5);
    }
  });

  it("the drawing stays inside its box, with a margin, on a transparent background", async () => {
    const { data, width } = await rgba(await renderIconPng({ svg: { tone: "onLight" } }, 96));
    let inkOnEdge = 0;
    let inkInside = 0;
    for (let y = 0; y < width; y++)
      for (let x = 0; x < width; x++) {
        const alpha = data[(y * width + x) * 4 + 3]!;
        if (x < 2 || y < 2 || x >= width - 2 || y >= width - 2) inkOnEdge += alpha;
        else inkInside += alpha > 128 ? 1 : 0;
      }
    expect(inkOnEdge).toBe(0);
    expect(inkInside / (width * width)).toBeGreaterThan(0.2);
  });

  it("a maskable icon keeps the drawing inside the middle circle the phone never crops", async () => {
    expect(MASKABLE_ICON_SCALE).toBeLessThan(1);
    const icon = ICON_FILES.find((i) => i.manifest?.purpose === "maskable" && i.sizePx === 512)!;
    const { data, width } = await rgba(await read(icon.file));
    const tile = [1, 3, 5].map((i) => parseInt(MARK_TILE_COLOUR.slice(i, i + 2), 16));
    const safeR = 0.4 * width;
    let outside = 0;
    let offTile = 0;
    for (let y = 0; y < width; y++)
      for (let x = 0; x < width; x++) {
        if (Math.hypot(x + 0.5 - width / 2, y + 0.5 - width / 2) <= safeR) continue;
        outside++;
        const at = (y * width + x) * 4;
        if (tile.some((c, k) => Math.abs(data[at + k]! - c) > 2) || data[at + 3] !== 255) offTile++;
      }
    expect(outside).toBeGreaterThan(0);
    expect(offTile).toBe(0);
  });
});

describe("the web app manifest", () => {
  const m = manifest();

  it("names the product, opens standalone and lists 192 and 512 px icons, one of them maskable", () => {
    expect(m).toMatchObject({ name: "Chillwright", short_name: "Chillwright", display: "standalone" });
    expect(m.start_url).toMatch(/^\//);
    const sizes = (m.icons ?? []).map((i) => `${i.sizes} ${i.purpose}`);
    expect(sizes).toEqual(
      expect.arrayContaining(["192x192 any", "512x512 any", "192x192 maskable", "512x512 maskable"]),
    );
  });

  it("points every icon at a file in public/ of the size it claims", async () => {
    for (const icon of m.icons ?? []) {
      const meta = await sharp(await read(path.join("public", icon.src))).metadata();
      expect(`${meta.width}x${meta.height}`).toBe(icon.sizes);
      expect(`image/${meta.format}`).toBe(icon.type);
    }
  });
});
