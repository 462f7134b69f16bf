// npm run icons: draws the favicon and the home-screen icons from the mark in lib/brand/mark.ts.
// Run it after changing the drawing and commit what it writes; tests/unit/brand-icons.test.ts fails
// while a committed icon no longer matches the drawing.
import { writeFile, mkdir } from "node:fs/promises";
import path from "node:path";
import sharp from "sharp";
import { markSvg } from "@/lib/brand/mark";
import { FAVICON_ICO_SIZES_PX, ICON_FILES, type IconFile } from "@/lib/brand/icons";

/** A PNG of the mark at one size, straight from the SVG. */
export async function renderIconPng(icon: Pick<IconFile, "svg">, sizePx: number): Promise<Buffer> {
  const svg = markSvg({ ...icon.svg, sizePx });
  return sharp(Buffer.from(svg)).png({ compressionLevel: 9 }).toBuffer();
}

/** An .ico holding one PNG per size (the PNG-in-ICO form every current browser reads). */
export function packIco(pngs: { sizePx: number; png: Buffer }[]): Buffer {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2);
  header.writeUInt16LE(pngs.length, 4);
  const entries: Buffer[] = [];
  let offset = 6 + 16 * pngs.length;
  for (const { sizePx, png } of pngs) {
    const entry = Buffer.alloc(16);
    entry.writeUInt8(sizePx >= 256 ? 0 : sizePx, 0);
    entry.writeUInt8(sizePx >= 256 ? 0 : sizePx, 1);
    entry.writeUInt8(0, 2);
    entry.writeUInt8(0, 3);
    entry.writeUInt16LE(1, 4);
    entry.writeUInt16LE(32, 6);
    entry.writeUInt32LE(png.length, 8);
    entry.writeUInt32LE(offset, 12);
    offset += png.length;
    entries.push(entry);
  }
  return Buffer.concat([header, ...entries, ...pngs.map((p) => p.png)]);
}

export async function iconContents(icon: IconFile): Promise<Buffer> {
  switch (icon.format) {
    case "svg":
      return Buffer.from(markSvg(icon.svg) + "\n");
    case "png":
      return renderIconPng(icon, icon.sizePx!);
    case "ico":
      return packIco(
        await Promise.all(
          FAVICON_ICO_SIZES_PX.map(async (sizePx) => ({ sizePx, png: await renderIconPng(icon, sizePx) })),
        ),
      );
  }
}

async function main() {
  const root = path.resolve(__dirname, "..");
  for (const icon of ICON_FILES) {
    const target = path.join(root, icon.file);
    await mkdir(path.dirname(target), { recursive: true });
    const contents = await iconContents(icon);
    await writeFile(target, contents);
    console.log(`${icon.file.padEnd(32)} ${(contents.length / 1024).toFixed(1).padStart(6)} kB`);
  }
}

if (require.main === module) {
  main().catch((error) => {
    console.error(error);
    process.exit(1);
  });
}
