import type { MarkSvgOptions } from "./mark";

/**
 * Every image file made from the mark by `scripts/icons.ts` (`npm run icons`). The manifest lists the
 * `public/icons/` ones; Next.js links `app/icon.svg`, `app/apple-icon.png` and `app/favicon.ico` itself.
 */
export interface IconFile {
  /** Path in the repository. */
  file: string;
  /** Width and height in pixels (the SVG has none). */
  sizePx?: number;
  format: "svg" | "png" | "ico";
  svg: MarkSvgOptions;
  /** URL it is served at, and how a web app manifest uses it (only for `public/icons/`). */
  manifest?: { src: string; purpose: "any" | "maskable" };
}

/** The drawing's share of a home-screen icon; a maskable icon keeps inside the middle circle (80 %). */
export const ANY_ICON_SCALE = 0.86;
export const MASKABLE_ICON_SCALE = 0.76;
/** Sizes packed into `app/favicon.ico`, for clients that do not read the SVG. */
export const FAVICON_ICO_SIZES_PX = [16, 32, 48];

export const ICON_FILES: IconFile[] = [
  { file: "app/icon.svg", format: "svg", svg: { tone: "auto", halo: true } },
  { file: "app/favicon.ico", format: "ico", svg: { tone: "onLight", halo: true } },
  { file: "app/apple-icon.png", sizePx: 180, format: "png", svg: { tone: "onDark", tile: true, scale: 0.8 } },
  ...[192, 512].flatMap((sizePx): IconFile[] => [
    {
      file: `public/icons/icon-${sizePx}.png`,
      sizePx,
      format: "png",
      svg: { tone: "onDark", tile: true, scale: ANY_ICON_SCALE },
      manifest: { src: `/icons/icon-${sizePx}.png`, purpose: "any" },
    },
    {
      file: `public/icons/maskable-${sizePx}.png`,
      sizePx,
      format: "png",
      svg: { tone: "onDark", tile: true, scale: MASKABLE_ICON_SCALE },
      manifest: { src: `/icons/maskable-${sizePx}.png`, purpose: "maskable" },
    },
  ]),
];
